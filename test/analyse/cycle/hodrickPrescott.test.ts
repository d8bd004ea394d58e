import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {hodrickPrescott} from '../../../src/analyse/cycle/hodrickPrescott.js';
import {defaultHpLambda} from '../../../src/analyse/cycle/lambda.js';
import {oneSidedHodrickPrescott} from '../../../src/analyse/cycle/oneSidedHodrickPrescott.js';
import {maxRelativeError, reference, type ReferenceSeries} from './reference.js';

interface HpCase {
  series: ReferenceSeries;
  call: string;
  lambda: number;
  trend: number[];
}
const hp = reference<{cases: HpCase[]}>('hp.json');

describe('hodrickPrescott', () => {
  // Confirmed with statsmodels 0.13.5: statsmodels.tsa.filters.hp_filter.hpfilter(x, lamb=λ) (call kept in hp.json).
  // Data: macrodata real GDP (FRED via statsmodels.datasets.macrodata) and elnino (NOAA via statsmodels.datasets).
  for (const c of hp.cases) {
    it(`matches ${c.call} within 1e-8 relative`, () => {
      const trend = hodrickPrescott(Float64Array.from(c.series.values), {lambda: c.lambda});
      expect(maxRelativeError(trend, c.trend)).toBeLessThan(1e-8);
    });
  }

  it('returns a straight line unchanged (the penalty is zero on a line)', () => {
    fc.assert(
      fc.property(
        fc.integer({min: 3, max: 300}),
        fc.double({min: -1e3, max: 1e3, noNaN: true}),
        fc.double({min: -10, max: 10, noNaN: true}),
        fc.constantFrom(1, 1600, 129600, 1e8),
        (n, a, b, lambda) => {
          const line = Float64Array.from({length: n}, (_, t) => a + b * t);
          const trend = hodrickPrescott(line, {lambda});
          // Tolerance grows with the conditioning of I + λ·DᵀD (about λ for long series).
          const scale = 1 + Math.abs(a) + Math.abs(b) * n;
          for (let t = 0; t < n; t++) expect(Math.abs(trend[t] - line[t])).toBeLessThan(1e-7 * scale);
        },
      ),
    );
  });

  it('keeps the mean (residuals sum to zero, since DᵀD annihilates constants)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({min: -100, max: 100, noNaN: true}), {minLength: 3, maxLength: 80}), (xs) => {
        const x = Float64Array.from(xs);
        const trend = hodrickPrescott(x, {lambda: 1600});
        let residual = 0;
        for (let t = 0; t < x.length; t++) residual += x[t] - trend[t];
        expect(Math.abs(residual)).toBeLessThan(1e-8 * (1 + x.length * 100));
      }),
    );
  });

  it('is the identity for λ = 0 and for one or two values', () => {
    expect(Array.from(hodrickPrescott(Float64Array.of(1, 5, 2, 8), {lambda: 0}))).toEqual([1, 5, 2, 8]);
    expect(Array.from(hodrickPrescott(Float64Array.of(7), {lambda: 1600}))).toEqual([7]);
    expect(Array.from(hodrickPrescott(Float64Array.of(7, 9), {lambda: 1600}))).toEqual([7, 9]);
    expect(hodrickPrescott(new Float64Array(0), {lambda: 1600}).length).toBe(0);
  });

  it('rejects NaN and a bad lambda by message', () => {
    expect(() => hodrickPrescott(Float64Array.of(1, NaN, 3), {lambda: 1600})).toThrow(/rejects NaN/);
    expect(() => hodrickPrescott(Float64Array.of(1, 2, 3), {lambda: -1})).toThrow(/invalid lambda/);
  });
});

describe('defaultHpLambda', () => {
  // Ravn & Uhlig (2002), REStat 84(2):371–376: λ scales with the fourth power of the observation frequency.
  it('is 1600 quarterly, 129600 monthly and 1600·13⁴ weekly', () => {
    expect(defaultHpLambda('quarterly')).toBe(1600);
    expect(defaultHpLambda('monthly')).toBe(129600);
    expect(defaultHpLambda('weekly')).toBe(1600 * 13 ** 4);
  });
});

describe('oneSidedHodrickPrescott', () => {
  const gdp = Float64Array.from(hp.cases[0].series.values);

  it('ends where the two-sided trend ends and uses no later data', () => {
    const oneSided = oneSidedHodrickPrescott(gdp, {lambda: 1600, from: 100});
    const twoSided = hodrickPrescott(gdp, {lambda: 1600});
    expect(oneSided[gdp.length - 1]).toBeCloseTo(twoSided[gdp.length - 1], 6);
    expect(oneSided[120]).toBeCloseTo(hodrickPrescott(gdp.subarray(0, 121), {lambda: 1600})[120], 6);
    expect(Number.isNaN(oneSided[99])).toBe(true);
  });
});
