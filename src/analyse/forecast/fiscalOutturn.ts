import {fiscalYearOf} from '../../time/fiscal.js';
import type {Frequency} from '../../time/period.js';
import {fillGaps} from '../numeric/fillGaps.js';
import type {ForecastResult, Outturn} from './types.js';

/**
 * Fiscal-year outturn: for the fiscal year containing the last period of the series, the actual to date plus
 * the forecast for the remaining periods. Flows add up (actual sum + forecast sum); stocks take the value at the
 * year-end period (the last actual when the year is complete, else the forecast for the year-end period).
 *
 * Interval (flows): the forecast's running-total interval for the remaining periods when it has one (ETS sample
 * paths, Theta's closed form, their combinations), which accounts for how the errors of the remaining periods
 * move together. Otherwise the sum of the lower and of the upper per-period bounds: this treats the errors as
 * perfectly correlated, an upper bound on the width (never too narrow). Stocks use the interval of the year-end
 * forecast. The level is 80 when requested, else the lowest requested level.
 *
 * The target total uses the target series over the same fiscal-year periods (sum for flows, year-end value for
 * stocks); gapPct = (total − target)/target × 100.
 *
 * Complexity: O(periods per year). NaN policy: interior NaN in the actuals of the year are filled by linear
 * interpolation; a target with a missing period in the year gives target null. Returns null when the forecast
 * does not reach the end of the fiscal year or no actual value exists.
 */
export function fiscalOutturn({
  values,
  start,
  frequency,
  fiscalYearStart,
  kind,
  forecast,
  target,
}: {
  values: Float64Array;
  start: number;
  frequency: Frequency;
  fiscalYearStart: number;
  kind: 'flow' | 'stock';
  forecast: ForecastResult;
  target: {start: number; values: Float64Array} | null;
}): Outturn | null {
  if (values.length === 0) return null;
  const lastIndex = start + values.length - 1;
  const fy = fiscalYearOf(frequency, lastIndex, fiscalYearStart);
  const periodsActual = lastIndex - fy.first + 1;
  const periodsRemaining = fy.last - lastIndex;
  // The forecast's first period is start + forecast.startOffset.
  const firstForecast = start + forecast.startOffset;
  const steps = fy.last - firstForecast + 1;
  if (periodsRemaining > 0 && steps > forecast.mean.length) return null;
  const filled = fillGaps(values).values;
  const actual: number[] = [];
  for (let p = Math.max(fy.first, start); p <= lastIndex; p++) actual.push(filled[p - start]);
  if (actual.some((v) => Number.isNaN(v)) || actual.length === 0) return null;
  const level = forecast.levels.includes(80) ? 80 : forecast.levels[0];
  const lo = forecast.lower[String(level)];
  const hi = forecast.upper[String(level)];
  let actualToDate: number;
  let forecastRemaining: number;
  let lower: number;
  let upper: number;
  if (kind === 'flow') {
    actualToDate = actual.reduce((a, b) => a + b, 0);
    forecastRemaining = 0;
    lower = actualToDate;
    upper = actualToDate;
    for (let i = 0; i < periodsRemaining; i++) {
      const j = lastIndex + 1 + i - firstForecast;
      forecastRemaining += forecast.mean[j];
      lower += lo[j];
      upper += hi[j];
    }
    const totals = forecast.runningTotals;
    if (totals && periodsRemaining > 0 && firstForecast === lastIndex + 1) {
      lower = actualToDate + totals.lower[String(level)][periodsRemaining - 1];
      upper = actualToDate + totals.upper[String(level)][periodsRemaining - 1];
    }
  } else {
    actualToDate = actual[actual.length - 1];
    const j = fy.last - firstForecast;
    forecastRemaining = periodsRemaining > 0 ? forecast.mean[j] : 0;
    lower = periodsRemaining > 0 ? lo[j] : actualToDate;
    upper = periodsRemaining > 0 ? hi[j] : actualToDate;
  }
  let total = actualToDate + forecastRemaining;
  if (kind === 'stock') total = periodsRemaining > 0 ? forecastRemaining : actualToDate;
  const targetTotal = targetOver(target, fy.first, fy.last, kind);
  return {
    fiscalYear: fy.label,
    actualToDate,
    periodsActual,
    forecastRemaining,
    periodsRemaining,
    total,
    level,
    lower,
    upper,
    target: targetTotal,
    gapPct: targetTotal !== null && targetTotal !== 0 ? ((total - targetTotal) / Math.abs(targetTotal)) * 100 : null,
  };
}

function targetOver(
  target: {start: number; values: Float64Array} | null,
  first: number,
  last: number,
  kind: 'flow' | 'stock',
): number | null {
  if (!target) return null;
  const end = target.start + target.values.length;
  const at = (p: number): number => (p >= target.start && p < end ? target.values[p - target.start] : NaN);
  if (kind === 'stock') {
    const v = at(last);
    return Number.isNaN(v) ? null : v;
  }
  let sum = 0;
  for (let p = first; p <= last; p++) {
    const v = at(p);
    if (Number.isNaN(v)) return null;
    sum += v;
  }
  return sum;
}

/**
 * Whether {@link fiscalOutturn} will read the forecast's running totals for this series: a flow whose fiscal year
 * is not complete at its last period. Forecasting skips simulating them otherwise (they are costly for ETS).
 */
export function outturnUsesRunningTotals({
  values,
  start,
  frequency,
  fiscalYearStart,
  kind,
}: {
  values: Float64Array;
  start: number;
  frequency: Frequency;
  fiscalYearStart: number;
  kind: 'flow' | 'stock';
}): boolean {
  if (kind !== 'flow' || values.length === 0) return false;
  const lastIndex = start + values.length - 1;
  return fiscalYearOf(frequency, lastIndex, fiscalYearStart).last > lastIndex;
}
