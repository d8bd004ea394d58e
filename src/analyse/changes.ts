import {type Frequency, periodsPerYear, yearAgo} from '../time/period.js';
import {fiscalYearOf} from '../time/fiscal.js';
import {trendSign} from './trendSign.js';
import type {Changes} from './types.js';

/**
 * Latest-period changes: year-on-year (original), period-on-period (seasonally adjusted, and annualised),
 * trend-cycle change (and annualised), fiscal year-to-date, and the trend direction over the last three periods.
 *
 * Percent changes need a positive base; where the base is missing or not positive the change is NaN.
 * NaN policy: NaN in → NaN out for each figure. Complexity O(n).
 *
 * @param original values, one per period, NaN where missing
 * @param adjusted seasonally adjusted values (the original when not adjusted)
 * @param trend trend-cycle (NaN where unknown)
 */
export function computeChanges(args: {
  frequency: Frequency;
  start: number;
  original: Float64Array;
  adjusted: Float64Array;
  trend: Float64Array;
  kind: 'flow' | 'stock';
  fiscalYearStart: number;
}): Changes {
  const {frequency, start, original, adjusted, trend, kind, fiscalYearStart} = args;
  const n = original.length;
  const last = n - 1;
  const perYear = periodsPerYear[frequency];
  const yearOnYearSeries = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    const j = yearAgo(frequency, start + i) - start;
    yearOnYearSeries[i] = j >= 0 ? percentChange(original[j], original[i]) : NaN;
  }
  const popRatio = ratio(adjusted[last - 1], adjusted[last]);
  const trendRatio = ratio(trend[last - 1], trend[last]);
  return {
    yearOnYear: n > 0 ? yearOnYearSeries[last] : NaN,
    periodOnPeriodAdjusted: (popRatio - 1) * 100,
    periodOnPeriodAnnualised: (popRatio ** perYear - 1) * 100,
    trend: (trendRatio - 1) * 100,
    trendAnnualised: (trendRatio ** perYear - 1) * 100,
    yearToDate: yearToDate(frequency, start, original, kind, fiscalYearStart),
    yearOnYearSeries,
    trendDirection: direction(trend),
  };
}

function ratio(before: number, after: number): number {
  return before > 0 && Number.isFinite(after) ? after / before : NaN;
}

function percentChange(before: number, after: number): number {
  return (ratio(before, after) - 1) * 100;
}

/** Fiscal year-to-date total (flows) or mean (stocks) against the same span a year earlier; NaN if any value is missing. */
function yearToDate(
  frequency: Frequency,
  start: number,
  values: Float64Array,
  kind: 'flow' | 'stock',
  fiscalYearStart: number,
): number {
  const end = start + values.length - 1;
  const fy = fiscalYearOf(frequency, end, fiscalYearStart);
  const span = end - fy.first;
  const before = yearAgo(frequency, fy.first);
  const current = aggregate(values, fy.first - start, span, kind);
  const previous = aggregate(values, before - start, span, kind);
  return percentChange(previous, current);
}

function aggregate(values: Float64Array, from: number, span: number, kind: 'flow' | 'stock'): number {
  if (from < 0 || from + span >= values.length) return NaN;
  let sum = 0;
  for (let i = from; i <= from + span; i++) sum += values[i];
  return kind === 'flow' ? sum : sum / (span + 1);
}

/** Direction of the trend-cycle over its last three periods: the average change per period by {@link trendSign}. */
function direction(trend: Float64Array): 'rising' | 'falling' | 'flat' {
  const n = trend.length;
  if (n < 4) return 'flat';
  const r = ratio(trend[n - 4], trend[n - 1]);
  if (!Number.isFinite(r)) return 'flat';
  const sign = trendSign((r ** (1 / 3) - 1) * 100);
  return sign > 0 ? 'rising' : sign < 0 ? 'falling' : 'flat';
}
