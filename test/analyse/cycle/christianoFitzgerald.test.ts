import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {baxterKing} from '../../../src/analyse/cycle/baxterKing.js';
import {christianoFitzgerald} from '../../../src/analyse/cycle/christianoFitzgerald.js';
import {maxAbsoluteError, reference, type ReferenceSeries} from './reference.js';

interface CfCase {
  series: ReferenceSeries;
  call: string;
  low: number;
  high: number;
  drift: boolean;
  cycle: number[];
}
interface BkCase {
  series: ReferenceSeries;
  call: string;
  low: number;
  high: number;
  k: number;
  cycle: number[];
}

describe('christianoFitzgerald', () => {
  // Confirmed with statsmodels 0.13.5: statsmodels.tsa.filters.cf_filter.cffilter(x, low, high, drift) (calls in
  // cf.json). Data: macrodata log real GDP and inflation (FRED via statsmodels), elnino (NOAA via statsmodels).
  for (const c of reference<{cases: CfCase[]}>('cf.json').cases) {
    it(`matches ${c.call} within 1e-6`, () => {
      const cycle = christianoFitzgerald(Float64Array.from(c.series.values), c);
      const scale = Math.max(...c.cycle.map(Math.abs));
      expect(maxAbsoluteError(cycle, c.cycle) / scale).toBeLessThan(1e-6);
      expect(maxAbsoluteError(cycle, c.cycle)).toBeLessThan(1e-6);
    });
  }

  it('gives zero for a constant series and for a line when drift is removed', () => {
    fc.assert(
      fc.property(
        fc.integer({min: 2, max: 200}),
        fc.double({min: -1e4, max: 1e4, noNaN: true}),
        fc.double({min: -50, max: 50, noNaN: true}),
        (n, a, b) => {
          const constant = christianoFitzgerald(new Float64Array(n).fill(a), {low: 6, high: 32});
          const line = christianoFitzgerald(
            Float64Array.from({length: n}, (_, t) => a + b * t),
            {low: 6, high: 32},
          );
          const scale = 1e-9 * (1 + Math.abs(a) + Math.abs(b) * n);
          for (let t = 0; t < n; t++) {
            expect(Math.abs(constant[t])).toBeLessThan(scale);
            expect(Math.abs(line[t])).toBeLessThan(scale);
          }
        },
      ),
    );
  });

  it('handles one value and rejects NaN and a bad band by message', () => {
    expect(Array.from(christianoFitzgerald(Float64Array.of(3), {low: 6, high: 32}))).toEqual([0]);
    expect(() => christianoFitzgerald(Float64Array.of(1, NaN), {low: 6, high: 32})).toThrow(/rejects NaN/);
    expect(() => christianoFitzgerald(Float64Array.of(1, 2), {low: 1, high: 32})).toThrow(/invalid band/);
  });
});

describe('baxterKing', () => {
  // Confirmed with statsmodels 0.13.5: statsmodels.tsa.filters.bk_filter.bkfilter(x, low, high, K) (bk.json).
  for (const c of reference<{cases: BkCase[]}>('bk.json').cases) {
    it(`matches ${c.call} within 1e-8 relative to the cycle's size`, () => {
      const cycle = baxterKing(Float64Array.from(c.series.values), c);
      const n = c.series.values.length;
      expect(cycle.subarray(0, c.k).every(Number.isNaN)).toBe(true);
      const inner = cycle.subarray(c.k, n - c.k);
      const scale = Math.max(...c.cycle.map(Math.abs));
      expect(maxAbsoluteError(inner, c.cycle) / scale).toBeLessThan(1e-8);
    });
  }

  it('is NaN everywhere when the series is no longer than 2K', () => {
    expect(baxterKing(new Float64Array(24).fill(1), {low: 6, high: 32, k: 12}).every(Number.isNaN)).toBe(true);
  });
});
