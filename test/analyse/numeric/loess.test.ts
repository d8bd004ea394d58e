import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {loess} from '../../../src/analyse/numeric/loess.js';

describe('loess', () => {
  it('reproduces a straight line exactly with degree 1, at every jump', () => {
    const line = Float64Array.from({length: 40}, (_, i) => 3 - 0.5 * i);
    for (const jump of [1, 2, 3, 7]) {
      const fit = loess(line, {span: 9, degree: 1, jump});
      fit.forEach((v, i) => expect(v).toBeCloseTo(line[i], 10));
    }
  });
  it('reproduces a constant with degree 0 and spans longer than the series', () => {
    const fit = loess(new Float64Array(7).fill(2.5), {span: 71, degree: 0});
    fit.forEach((v) => expect(v).toBeCloseTo(2.5, 14));
  });
  it('is a weighted mean: stays within the data range (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({min: -100, max: 100, noNaN: true}), {minLength: 5, maxLength: 60}), fc.integer({min: 1, max: 6}), (raw, half) => {
        const fit = loess(Float64Array.from(raw), {span: 2 * half + 1, degree: 0, jump: 1});
        const lo = Math.min(...raw);
        const hi = Math.max(...raw);
        fit.forEach((v) => expect(v >= lo - 1e-9 && v <= hi + 1e-9).toBe(true));
      }),
      {numRuns: 50, seed: 11},
    );
  });
  it('tricube weights: the hand-computed fit at x = 2 from points 1…3 with h = 2 (w = 0.669921875, 1, 0.669921875)', () => {
    // (1 − (1/2)³)³ = 0.669921875; a symmetric window gives the weighted mean. Span 5 over 3 points widens the
    // bandwidth from 1 to 2.
    const y = Float64Array.of(1, 4, 2);
    const fit = loess(y, {span: 5, degree: 0});
    expect(fit[1]).toBeCloseTo((0.669921875 * 1 + 4 + 0.669921875 * 2) / 2.33984375, 14);
  });
  it('keeps the data value where every weight is zero, and handles one point', () => {
    const y = Float64Array.of(1, 5, 3);
    expect(Array.from(loess(y, {span: 3, degree: 1, weights: new Float64Array(3)}))).toEqual([1, 5, 3]);
    expect(Array.from(loess(Float64Array.of(5), {span: 3}))).toEqual([5]);
    expect(loess(new Float64Array(0), {span: 3}).length).toBe(0);
  });
});
