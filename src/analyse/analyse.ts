import {periodsPerYear} from '../time/period.js';
import {adjustSeries} from './decompose/index.js';
import {analyseCycle} from './cycle/index.js';
import {fiscalOutturn, forecastSeries} from './forecast/index.js';
import {computeChanges} from './changes.js';
import type {SeriesAnalysis, SeriesInput} from './types.js';

/**
 * Everything ebbflow computes for one series, as one pure function (no I/O, seeded randomness only), so it can
 * run in a worker thread:
 *
 *   values ──► seasonal adjustment (calendar, decomposition, outliers, diagnostics)
 *          ├─► trend/cycle on the adjusted series (gap, phase, turning points, stationarity)
 *          ├─► changes (year-on-year, adjusted period-on-period, trend-cycle)
 *          └─► forecast with back-test ──► fiscal-year outturn against the target
 */
export function analyseSeries(input: SeriesInput): SeriesAnalysis {
  const {id, frequency, start, values, kind, options} = input;
  const notes: string[] = [];
  const adjusted = adjustSeries(values, {
    frequency,
    start,
    kind,
    options: options.decomposition,
    calendar: options.calendar,
    outliers: options.outliers.enabled,
    residualSigma: input.residualSigma,
  });
  const adjustment = adjusted.ok ? adjusted.adjustment : null;
  const sa = adjustment ? Float64Array.from(adjustment.adjusted) : Float64Array.from(values);
  const irregular = adjustment ? Float64Array.from(adjustment.irregular) : undefined;

  const cycled = analyseCycle(sa, {frequency, options: options.cycle, irregular});
  if (!cycled.ok) notes.push(cycled.reason);
  const cycle = cycled.ok ? cycled.cycle : null;

  const trend = Float64Array.from(adjustment?.trend ?? cycle?.trend ?? new Array<number>(values.length).fill(NaN));
  const changes = computeChanges({
    frequency,
    start,
    original: values,
    adjusted: sa,
    trend,
    kind,
    fiscalYearStart: input.fiscalYearStart,
  });

  const forecast = hasData(values, periodsPerYear[frequency] > 12 ? 4 : 2)
    ? forecastSeries(values, {frequency, options: options.forecast})
    : null;
  if (!forecast) notes.push('Too few values to forecast.');
  const outturn = forecast
    ? fiscalOutturn({values, start, frequency, fiscalYearStart: input.fiscalYearStart, kind, forecast, target: input.target})
    : null;

  return {
    id,
    frequency,
    start,
    end: start + values.length - 1,
    original: Array.from(values),
    adjustment,
    notAdjustedReason: adjusted.ok ? null : adjusted.reason,
    changes,
    cycle,
    forecast,
    outturn,
    notes,
    options,
  };
}

function hasData(values: Float64Array, minimum: number): boolean {
  let count = 0;
  for (const v of values) if (Number.isFinite(v)) count++;
  return count >= minimum;
}
