import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {akaikeWeights} from '../../../src/analyse/forecast/akaikeWeights.js';

describe('akaikeWeights', () => {
  it('follows wᵢ = exp(−Δᵢ/2) / Σ exp(−Δⱼ/2) (Burnham & Anderson 2002, §2.9), worked by hand', () => {
    // Δ = 0, 2, 4: weights 1, e⁻¹, e⁻² over their sum 1.5032147…
    const w = akaikeWeights([310, 312, 314]);
    const sum = 1 + Math.exp(-1) + Math.exp(-2);
    expect(w[0]).toBeCloseTo(1 / sum, 14);
    expect(w[1]).toBeCloseTo(Math.exp(-1) / sum, 14);
    expect(w[2]).toBeCloseTo(Math.exp(-2) / sum, 14);
    expect(1 / sum).toBeCloseTo(0.66524095577, 10);
  });

  it('drops weights under the threshold and rescales the rest; non-finite criteria get 0', () => {
    const w = akaikeWeights([100, 101, 120, Infinity, NaN], 0.01);
    expect(w[2]).toBe(0); // Δ = 20: weight about 3e-5
    expect(w[3]).toBe(0);
    expect(w[4]).toBe(0);
    expect(w[0] + w[1]).toBeCloseTo(1, 15);
    expect(w[0] / w[1]).toBeCloseTo(Math.exp(0.5), 12);
    expect(Array.from(akaikeWeights([Infinity, NaN]))).toEqual([0, 0]);
  });

  it('sums to 1, favours smaller criteria and ignores a common shift (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({min: -1e4, max: 1e4, noNaN: true}), {minLength: 1, maxLength: 15}),
        fc.double({min: -1e3, max: 1e3, noNaN: true}),
        (c, shift) => {
          const w = akaikeWeights(c);
          expect(w.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
          const best = c.indexOf(Math.min(...c));
          expect(w[best]).toBe(Math.max(...w));
          const shifted = akaikeWeights(c.map((v) => v + shift));
          shifted.forEach((v, i) => expect(v).toBeCloseTo(w[i], 9));
        },
      ),
    );
  });
});
