import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {spencer} from '../../../src/analyse/cycle/spencer.js';

describe('spencer', () => {
  // Spencer's 15-term weights sum to 1 and reproduce cubics exactly (Kendall & Stuart, The Advanced Theory of
  // Statistics vol. 3, §46: a standard property of the formula).
  it('passes any cubic through unchanged away from the ends', () => {
    fc.assert(
      fc.property(fc.array(fc.double({min: -2, max: 2, noNaN: true}), {minLength: 4, maxLength: 4}), ([a, b, c, d]) => {
        const x = Float64Array.from({length: 40}, (_, t) => a + b * t + c * t * t + d * t * t * t * 0.01);
        const s = spencer(x);
        for (let t = 7; t < 33; t++) expect(Math.abs(s[t] - x[t])).toBeLessThan(1e-9 * (1 + Math.abs(x[t])));
        expect(Number.isNaN(s[6]) && Number.isNaN(s[33])).toBe(true);
      }),
    );
  });

  it('is all NaN for series shorter than 15', () => {
    expect(spencer(new Float64Array(14).fill(1)).every(Number.isNaN)).toBe(true);
  });
});
