import {periodsPerYear} from '../time/period.js';
import {adjustSeries} from './decompose/index.js';
import {analyseCycle} from './cycle/index.js';
import {fiscalOutturn, forecastSeries} from './forecast/index.js';
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
  const notes: string[] = [];
  const values = finiteOrMissing(input.values, notes);
  const range = magnitudeProblem(values);
  const usable = range === null;
  if (range) notes.push(range);
  const constant = usable ? constantValue(values, 2) : null;
  if (constant !== null) {
    notes.push(`The series is constant at ${constant}: there is no seasonal pattern, trend or cycle to estimate.`);
  }

  const adjusted = usable
    ? guarded(notes, 'seasonal adjustment', () =>
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
  const notAdjustedReason = adjusted?.ok ? null : adjusted ? adjusted.reason : (range ?? 'The seasonal adjustment failed.');
  const sa = adjustment ? Float64Array.from(adjustment.adjusted) : Float64Array.from(values);
  const irregular = adjustment ? Float64Array.from(adjustment.irregular) : undefined;

  const cycled = usable
    ? guarded(notes, 'trend and cycle', () => analyseCycle(sa, {frequency, options: options.cycle, irregular}))
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
  if (usable && !enough) notes.push('Too few values to forecast.');
  const forecast =
    usable && enough ? guarded(notes, 'forecast', () => forecastSeries(values, {frequency, options: options.forecast})) : null;
  const outturn = forecast
    ? guarded(notes, 'fiscal-year outturn', () =>
        fiscalOutturn({values, start, frequency, fiscalYearStart: input.fiscalYearStart, kind, forecast, target: input.target}),
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
function guarded<T>(notes: string[], what: string, run: () => T): T | null {
  try {
    return run();
  } catch (e) {
    notes.push(`The ${what} could not be computed for this series (${e instanceof Error ? e.message : String(e)}).`);
    return null;
  }
}

/** ±Infinity becomes missing, with a note; the input is not changed. */
function finiteOrMissing(values: Float64Array, notes: string[]): Float64Array {
  let infinite = 0;
  const out = Float64Array.from(values, (v) => {
    if (v === Infinity || v === -Infinity) {
      infinite++;
      return NaN;
    }
    return v;
  });
  if (infinite > 0) {
    notes.push(
      infinite === 1
        ? '1 value was not a finite number and is treated as missing.'
        : `${infinite} values were not finite numbers and are treated as missing.`,
    );
  }
  return out;
}

function magnitudeProblem(values: Float64Array): string | null {
  let largest = 0;
  for (const v of values) if (Math.abs(v) > largest) largest = Math.abs(v);
  return largest > MAX_MAGNITUDE
    ? `Values reach ${largest.toExponential(2)}, beyond the ±1e15 the analysis handles reliably; rescale the series (for example to thousands or millions) to analyse it.`
    : null;
}

function hasData(values: Float64Array, minimum: number): boolean {
  let count = 0;
  for (const v of values) if (Number.isFinite(v)) count++;
  return count >= minimum;
}
