import type {AnalysisOptions} from '../../config/plan.js';
import type {Frequency} from '../../time/period.js';
import {periodsPerYear} from '../../time/period.js';
import {fillGaps} from '../numeric/fillGaps.js';
import {amplitudeRatio} from './amplitude.js';
import {christianoFitzgerald} from './christianoFitzgerald.js';
import {gapPercent} from './gap.js';
import {hodrickPrescott} from './hodrickPrescott.js';
import {onTrendLabel, phaseLabels} from './labels.js';
import type {Note} from '../../words/index.js';
import {defaultHpLambda} from './lambda.js';
import {oneSidedHodrickPrescott} from './oneSidedHodrickPrescott.js';
import {gapPhase} from './phase.js';
import {stationarity} from './stationarity.js';
import {turningPoints} from './turningPoints.js';
import type {CycleResult} from './types.js';

/** Business-cycle band in periods: 6–32 quarters, i.e. 1.5–8 years, at every frequency. */
const BAND_YEARS = {low: 1.5, high: 8};

/**
 * Trend, gap, phase, turning points and stationarity of a seasonally adjusted series.
 *
 * 1. Missing values are filled by straight lines for filtering (noted); the gap keeps NaN where data were missing.
 * 2. Trend: Hodrick-Prescott with λ from the options or {@link defaultHpLambda}; or, for `bandpass`, the series
 *    minus its Christiano-Fitzgerald cycle (band 1.5–8 years: 6–32 quarters, 18–96 months, 78–416 weeks, drift
 *    removed).
 * 3. Gap in percent of trend ({@link gapPercent}); direction over a quarter and the four-way phase ({@link gapPhase}).
 * 4. Turning points dated on the gap, i.e. growth-cycle turns (the series' swings around its trend, which is what
 *    "where it stands in its cycle" asks), by {@link turningPoints}; periods since the last turn; amplitude of the
 *    current phase against past ones.
 * 5. Stationarity of the filled series (null when too short), variance checked on `irregular` when given.
 * 6. For HP, the one-sided trend over the latest year (two for quarterly data) and an end-point caution.
 *
 * Complexity: O(n²) for the band-pass and the one-sided trend, O(n·maxLag²) for the tests; the rest O(n).
 * NaN policy: NaN filled as above; an all-NaN or shorter-than-three series gives `{ok: false, reason}`.
 */
export function analyseCycle(
  values: Float64Array,
  ctx: {frequency: Frequency; options: AnalysisOptions['cycle']; irregular?: Float64Array},
): {ok: true; cycle: CycleResult} | {ok: false; reason: Note} {
  const {frequency, options, irregular} = ctx;
  const n = values.length;
  if (n < 3) return {ok: false, reason: {code: 'cycleTooShort', values: {}}};
  const filled = fillGaps(values);
  if (filled.values.some((v) => !Number.isFinite(v))) {
    return {ok: false, reason: {code: 'cycleNotFinite', values: {}}};
  }
  const x = filled.values;
  const perYear = periodsPerYear[frequency];
  const lambda = options.lambda ?? defaultHpLambda(frequency);
  const band = {low: BAND_YEARS.low * perYear, high: BAND_YEARS.high * perYear, drift: true};
  let trend: Float64Array;
  if (options.method === 'hp') trend = hodrickPrescott(x, {lambda});
  else {
    const cycle = christianoFitzgerald(x, band);
    trend = x.map((v, t) => v - cycle[t]);
  }
  const {gap, scale, meanAbsolute} = gapPercent(x, trend);
  const span = Math.max(1, Math.round(perYear / 4));
  const {direction, phase, moving} = gapPhase(gap, span);
  const {turns, rule} = turningPoints(gap, frequency);
  const last = turns[turns.length - 1];
  const tests = stationarity(x, irregular);
  const notes: Note[] = filled.filled > 0 ? [{code: 'cycleFilled', values: {count: filled.filled}}] : [];
  if (!tests.ok) notes.push({code: 'untested', values: {reason: tests.reason}});
  const realTimeStart = n - Math.min(n, frequency === 'quarterly' ? 8 : perYear);
  let realTime: CycleResult['realTime'];
  if (options.method === 'hp') {
    const oneSided = oneSidedHodrickPrescott(x, {lambda, from: realTimeStart}).subarray(realTimeStart);
    realTime = {
      start: realTimeStart,
      trend: Array.from(oneSided),
      gap: Array.from(oneSided, (tau, i) => {
        const divisor = scale === 'trend' ? tau : meanAbsolute;
        return (100 * (x[realTimeStart + i] - tau)) / divisor;
      }),
    };
  }
  const missing = (t: number): boolean => Number.isNaN(values[t]);
  return {
    ok: true,
    cycle: {
      method: options.method,
      trend: Array.from(trend),
      gap: Array.from(gap, (g, t) => (missing(t) ? NaN : g)),
      phase,
      phaseLabel: moving ? phaseLabels[phase] : onTrendLabel,
      direction,
      turningPoints: turns,
      periodsSinceTurn: last ? n - 1 - last.index : null,
      amplitudeRatio: amplitudeRatio(gap, turns),
      stationarity: tests.ok ? tests.result : null,
      options: {
        method: options.method,
        ...(options.method === 'hp' ? {lambda} : {band}),
        turningPointRule: rule,
        directionSpan: span,
        filledValues: filled.filled,
      },
      turningPointBasis: 'gap',
      gapScale: scale,
      realTime,
      caution: {code: 'endPoint', values: {count: n - realTimeStart}},
      notes,
    },
  };
}
