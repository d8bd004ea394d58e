import {describe, expect, it} from 'vitest';
import {leastSquares} from '../../../src/analyse/numeric/leastSquares.js';

describe('leastSquares', () => {
  // Worked example computed by hand (normal equations): y = (1, 3, 2, 5, 4) on (1, x), x = 1…5 gives
  // slope 0.8, intercept 0.6, residuals (−0.4, 0.8, −1, 1.2, −0.6), SSR 3.6, se(slope) = √(1.2/10) ≈ 0.34641.
  it('fits the worked example', () => {
    const ones = new Float64Array(5).fill(1);
    const fit = leastSquares(Float64Array.of(1, 3, 2, 5, 4), [ones, Float64Array.of(1, 2, 3, 4, 5)]);
    expect(fit.coefficients[0]).toBeCloseTo(0.6, 12);
    expect(fit.coefficients[1]).toBeCloseTo(0.8, 12);
    expect(fit.residualSumOfSquares).toBeCloseTo(3.6, 12);
    expect(fit.standardErrors[1]).toBeCloseTo(Math.sqrt(0.12), 12);
    expect(fit.standardErrors[0]).toBeCloseTo(Math.sqrt(1.2 * (55 / 50)), 12);
  });

  it('rejects too few rows and collinear columns by message', () => {
    const square = [Float64Array.of(1, 1), Float64Array.of(1, 2)];
    expect(() => leastSquares(Float64Array.of(1, 2), square)).toThrow(/more rows/);
    expect(() =>
      leastSquares(Float64Array.of(1, 2, 3, 4), [new Float64Array(4).fill(1), new Float64Array(4).fill(2)]),
    ).toThrow(/rank deficient/);
  });
});
