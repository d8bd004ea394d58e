import {periodsPerYear} from '../time/period.js';
import type {Note} from '../words/index.js';
import {adjustSeries} from './decompose/index.js';
import {analyseCycle} from './cycle/index.js';
import {fiscalOutturn, forecastSeries, outturnUsesRunningTotals} from './forecast/index.js';
import {computeChanges} from './changes.js';
import {constantValue} from './numeric/constantValue.js';
import type {SeriesAnalysis, SeriesInput} from './types.js';

/**
 * Largest magnitude the engines take: 1e15. Business figures never come near it, and beyond it sums of squares
 * in the fitting routines lose all precision (1e307 overflows outright). Such a series is reported, not analysed.
 */
const MAX_MAGNITUDE = 1e15;

/**
 * Everything ebbflow computes for one series, as one pure function (no I/O, seeded randomness only), so it can
 * run in a worker thread:
 *
 *   values ──► seasonal adjustment (calendar, decomposition, outliers, diagnostics)
 *          ├─► trend/cycle on the adjusted series (gap, phase, turning points, stationarity)
 *          ├─► changes (year-on-year, adjusted period-on-period, trend-cycle)
 *          └─► forecast with back-test ──► fiscal-year outturn against the target
 *
 * Never throws: poor data (too short, constant, non-finite, out of range) and any engine that cannot cope are
 * reported as plain notes and the rest of the analysis goes on, so one odd series never stops a batch.
 */
export function analyseSeries(input: SeriesInput): SeriesAnalysis {
  const {id, frequency, start, kind, options} = input;
  const notes: Note[] = [];
  const values = finiteOrMissing(input.values, notes);
  const range = magnitudeProblem(values);
  const usable = range === null;
  if (range) notes.push(range);
  const constant = usable ? constantValue(values, 2) : null;
  if (constant !== null) {
    notes.push({code: 'constant', values: {value: String(constant)}});
  }

  const adjusted = usable
    ? guarded(notes, 'adjustment', () =>
        adjustSeries(values, {
          frequency,
          start,
          kind,
          options: options.decomposition,
          calendar: options.calendar,
          outliers: options.outliers.enabled,
          residualSigma: input.residualSigma,
        }),
      )
    : null;
  const adjustment = adjusted?.ok ? adjusted.adjustment : null;
  const notAdjustedReason: Note | null = adjusted?.ok
    ? null
    : adjusted
      ? adjusted.reason
      : (range ?? {code: 'adjustmentFailed', values: {}});
  const sa = adjustment ? Float64Array.from(adjustment.adjusted) : Float64Array.from(values);
  const irregular = adjustment ? Float64Array.from(adjustment.irregular) : undefined;

  const cycled = usable
    ? guarded(notes, 'cycle', () => analyseCycle(sa, {frequency, options: options.cycle, irregular}))
    : null;
  if (cycled && !cycled.ok) notes.push(cycled.reason);
  const cycle = cycled?.ok ? cycled.cycle : null;

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

  const enough = hasData(values, periodsPerYear[frequency] > 12 ? 4 : 2);
  if (usable && !enough) notes.push({code: 'tooFewToForecast', values: {}});
  const {fiscalYearStart} = input;
  const runningTotals = outturnUsesRunningTotals({values, start, frequency, fiscalYearStart, kind});
  const forecast =
    usable && enough
      ? guarded(notes, 'forecast', () => forecastSeries(values, {frequency, options: options.forecast, runningTotals}))
      : null;
  const outturn = forecast
    ? guarded(notes, 'outturn', () =>
        fiscalOutturn({values, start, frequency, fiscalYearStart, kind, forecast, target: input.target}),
      )
    : null;

  return {
    id,
    frequency,
    start,
    end: start + values.length - 1,
    original: Array.from(values),
    adjustment,
    notAdjustedReason,
    changes,
    cycle,
    forecast,
    outturn,
    notes,
    options,
  };
}

/** Run one engine; if it throws, say so in the notes and go on without its result. */
function guarded<T>(notes: Note[], what: 'adjustment' | 'cycle' | 'forecast' | 'outturn', run: () => T): T | null {
  try {
    return run();
  } catch (e) {
    notes.push({code: 'failed', values: {what, error: e instanceof Error ? e.message : String(e)}});
    return null;
  }
}

/** ±Infinity becomes missing, with a note; the input is not changed. */
function finiteOrMissing(values: Float64Array, notes: Note[]): Float64Array {
  let infinite = 0;
  const out = Float64Array.from(values, (v) => {
    if (v === Infinity || v === -Infinity) {
      infinite++;
      return NaN;
    }
    return v;
  });
  if (infinite > 0) {
    notes.push({code: 'infinite', values: {count: infinite}});
  }
  return out;
}

function magnitudeProblem(values: Float64Array): Note | null {
  let largest = 0;
  for (const v of values) if (Math.abs(v) > largest) largest = Math.abs(v);
  return largest > MAX_MAGNITUDE
    ? {code: 'magnitude', values: {largest: largest.toExponential(2)}}
    : null;
}

function hasData(values: Float64Array, minimum: number): boolean {
  let count = 0;
  for (const v of values) if (Number.isFinite(v)) count++;
  return count >= minimum;
}
