import {describe, expect, it} from 'vitest';
import {fiscalOutturn, outturnUsesRunningTotals} from '../../../src/analyse/forecast/index.js';
import type {ForecastResult} from '../../../src/analyse/forecast/types.js';
import {monthIndex, quarterIndex} from '../../../src/time/period.js';

// Hand-made cases: the expected figures are plain sums worked out by hand in the comments.
function flatForecast(startOffset: number, h: number, mean: number, spread: number): ForecastResult {
  return {
    method: 'test',
    startOffset,
    mean: new Array(h).fill(mean),
    levels: [80, 95],
    lower: {'80': new Array(h).fill(mean - spread), '95': new Array(h).fill(mean - 2 * spread)},
    upper: {'80': new Array(h).fill(mean + spread), '95': new Array(h).fill(mean + 2 * spread)},
    backtest: null,
    options: {},
    notes: [],
  };
}

describe('fiscalOutturn', () => {
  // 17 months Jan 2025 … May 2026, value 5 each; fiscal year from April: FY2026/27 = Apr 2026 … Mar 2027.
  const start = monthIndex(2025, 1);
  const values = new Float64Array(17).fill(5);
  const monthlyApril = {values, start, frequency: 'monthly' as const, fiscalYearStart: 4};

  it('flows: actual to date (2 × 5) plus 10 forecast months (10 × 10), interval from summed bounds', () => {
    const o = fiscalOutturn({
      values,
      start,
      frequency: 'monthly',
      fiscalYearStart: 4,
      kind: 'flow',
      forecast: flatForecast(17, 12, 10, 1),
      target: {start, values: new Float64Array(40).fill(9)},
    })!;
    expect(o.fiscalYear).toBe('FY2026/27');
    expect(o).toMatchObject({actualToDate: 10, periodsActual: 2, forecastRemaining: 100, periodsRemaining: 10});
    expect(o.total).toBe(110);
    expect(o.level).toBe(80);
    expect(o.lower).toBe(10 + 90);
    expect(o.upper).toBe(10 + 110);
    // Target: 12 months × 9 = 108; gap (110 − 108)/108.
    expect(o.target).toBe(108);
    expect(o.gapPct).toBeCloseTo((2 / 108) * 100, 12);
  });

  it('stocks: the year-end forecast and its interval; target at year end', () => {
    const f = flatForecast(17, 12, 10, 1);
    f.mean[9] = 42; // March 2027 is the 10th forecast month
    const o = fiscalOutturn({...monthlyApril, kind: 'stock', forecast: f, target: null})!;
    expect(o).toMatchObject({actualToDate: 5, total: 42, lower: 9, upper: 11, target: null, gapPct: null});
  });

  it('labels calendar fiscal years FY2026 and handles a complete year', () => {
    const dec = new Float64Array(24).fill(2); // Jan 2025 … Dec 2026
    const forecast = flatForecast(24, 12, 10, 1);
    const calendar = {values: dec, start, frequency: 'monthly' as const, fiscalYearStart: 1};
    const o = fiscalOutturn({...calendar, kind: 'flow', forecast, target: null})!;
    expect(o.fiscalYear).toBe('FY2026');
    expect(o).toMatchObject({actualToDate: 24, periodsRemaining: 0, total: 24, lower: 24, upper: 24});
  });

  it('quarterly with interior gap filled; null when the forecast does not reach the year end', () => {
    const q = Float64Array.of(1, 2, NaN, 4, 5); // 2025-Q1 … 2026-Q1
    const base = {values: q, start: quarterIndex(2025, 1), frequency: 'quarterly' as const, fiscalYearStart: 1};
    const o = fiscalOutturn({...base, kind: 'flow', forecast: flatForecast(5, 4, 6, 1), target: null})!;
    expect(o).toMatchObject({fiscalYear: 'FY2026', actualToDate: 5, forecastRemaining: 18, total: 23});
    expect(fiscalOutturn({...base, kind: 'flow', forecast: flatForecast(5, 2, 6, 1), target: null})).toBeNull();
  });

  it('a target with a missing period in the year gives target null', () => {
    const t = new Float64Array(40).fill(9);
    t[20] = NaN;
    const forecast = flatForecast(17, 12, 10, 1);
    const o = fiscalOutturn({...monthlyApril, kind: 'flow', forecast, target: {start, values: t}})!;
    expect(o.target).toBeNull();
  });
});

describe('fiscalOutturn with running-total intervals', () => {
  it('uses the running-total bounds of the remaining periods when the forecast has them', () => {
    const values = new Float64Array(17).fill(5);
    const monthlyApril = {values, start: monthIndex(2025, 1), frequency: 'monthly' as const, fiscalYearStart: 4};
    const f = flatForecast(17, 12, 10, 1);
    // Running totals of 10 per month; bounds ±3 at ten months (narrower than the ±10 of summed bounds).
    f.runningTotals = {
      lower: {'80': Array.from({length: 12}, (_, k) => 10 * (k + 1) - 3), '95': new Array(12).fill(0)},
      upper: {'80': Array.from({length: 12}, (_, k) => 10 * (k + 1) + 3), '95': new Array(12).fill(0)},
    };
    const o = fiscalOutturn({...monthlyApril, kind: 'flow', forecast: f, target: null})!;
    expect(o).toMatchObject({total: 110, lower: 107, upper: 113});
  });
});

describe('outturnUsesRunningTotals', () => {
  const values = new Float64Array(17).fill(5);
  it('flows with months left in the fiscal year need them; a complete year or a stock does not', () => {
    // Jan 2025 … May 2026: FY from April leaves Jun 2026 … Mar 2027; the calendar year leaves Jun … Dec 2026.
    const start = monthIndex(2025, 1);
    expect(outturnUsesRunningTotals({values, start, frequency: 'monthly', fiscalYearStart: 4, kind: 'flow'})).toBe(true);
    expect(outturnUsesRunningTotals({values, start, frequency: 'monthly', fiscalYearStart: 1, kind: 'flow'})).toBe(true);
    expect(outturnUsesRunningTotals({values, start, frequency: 'monthly', fiscalYearStart: 4, kind: 'stock'})).toBe(false);
    // Ending in May 2026 with the fiscal year from June: the year is complete.
    expect(outturnUsesRunningTotals({values, start, frequency: 'monthly', fiscalYearStart: 6, kind: 'flow'})).toBe(false);
    // 8 quarters 2024 Q1 … 2025 Q4, calendar year: complete.
    const q = new Float64Array(8).fill(1);
    const qStart = quarterIndex(2024, 1);
    expect(outturnUsesRunningTotals({values: q, start: qStart, frequency: 'quarterly', fiscalYearStart: 1, kind: 'flow'})).toBe(false);
    expect(outturnUsesRunningTotals({values: q, start: qStart, frequency: 'quarterly', fiscalYearStart: 4, kind: 'flow'})).toBe(true);
  });
});
