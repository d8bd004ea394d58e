import type {AnalysisOptions} from '../../config/plan.js';
import type {Note} from '../../words/index.js';
import {easterRegressor, holidayRegressor, workingDayRegressor} from '../../time/calendar.js';
import {daysFromCivil, periodStartDay, civilFromDays, seasonOf, type Frequency} from '../../time/period.js';
import {fillGaps} from '../numeric/fillGaps.js';
import {regressCalendar, type RegressorColumn} from './calendarRegression.js';
import {chooseModel} from './chooseModel.js';
import {classicalDecomposition} from './classical.js';
import {residualSeasonality, seasonalStability, varianceShares} from './diagnostics.js';
import {detectOutliers, levelShiftSizes} from './outliers.js';
import {constantValue} from '../numeric/constantValue.js';
import {median} from '../numeric/median.js';
import {stl} from './stl.js';
import type {Adjustment, CalendarRegressor, Outlier} from './types.js';
import {weeklyFourier} from './weeklyFourier.js';

export interface AdjustContext {
  frequency: Frequency;
  /** Period index of values[0]. */
  start: number;
  kind: 'flow' | 'stock';
  options: AnalysisOptions['decomposition'];
  calendar: AnalysisOptions['calendar'];
  outliers: boolean;
  /** Threshold in robust sigmas for outliers. */
  residualSigma: number;
}

export type AdjustOutcome = {ok: true; adjustment: Adjustment} | {ok: false; reason: Note};

type Model = 'additive' | 'multiplicative';

interface Parts {
  trend: Float64Array;
  seasonal: Float64Array;
  /** Resolved parameters of the decomposition. */
  options: Record<string, unknown>;
}

/** Seasonal period in whole observations (weekly: 52, used for lags; the weekly method uses 365.2425/7). */
const PERIOD: Record<Frequency, number> = {monthly: 12, quarterly: 4, weekly: 52};
/** Fewest observations: two full years (common practice), plus one for STL, which needs more than two cycles. */
const MIN_WEEKS = 105;
const CALENDAR_ROUNDS = 3;
const FILL_ROUNDS = 2;
/** Concurrent adjustments compared with the full-sample one for the revision diagnostic. */
const REVISION_ENDS: Record<Frequency, number> = {monthly: 12, quarterly: 8, weekly: 26};

/**
 * Seasonally adjust one series: the engine behind `adjustSeries` (see index.ts for the pipeline it follows), as
 * named steps: observed span and length check → model → (constant: nothing to remove) → fill gaps → calendar
 * rounds and final decomposition → components → outliers → diagnostics → the result with its resolved options.
 * Never throws for data reasons: poor data gives `{ok: false, reason}` with a coded note (src/words/notes.ts).
 */
export function adjust(values: Float64Array, ctx: AdjustContext): AdjustOutcome {
  const {frequency} = ctx;
  const period = PERIOD[frequency];
  const observed = observedSpan(values);
  if (observed === null) return {ok: false, reason: {code: 'noValues', values: {}}};
  const {first, last, span} = observed;
  const method = frequency === 'weekly' ? 'fourier' : ctx.options.method;
  const minimum = frequency === 'weekly' ? MIN_WEEKS : method === 'stl' ? 2 * period + 1 : 2 * period;
  const short = tooShort(span, minimum, period, frequency);
  if (short !== null) return {ok: false, reason: short};
  const chosen = chooseModel(span, period, ctx.options.model);
  const scale = modelScale(chosen.model);
  if (constantValue(span) !== null) {
    return {ok: true, adjustment: constantAdjustment(values, first, last, ctx, chosen.model, period)};
  }
  const start = ctx.start + first;
  const decompose = (x: Float64Array): Parts =>
    decomposeOnce(x, {frequency, start, model: chosen.model, options: ctx.options, period});
  const missing = span.map((v) => (Number.isNaN(v) ? 1 : 0));
  const x = fillMissing(span, missing, decompose, scale);
  const regressors = calendarRegressors(ctx, start, span.length);
  const unusual = (p: ReturnType<typeof components>) =>
    ctx.outliers
      ? detectOutliers(p.irregularModel, p.adjustedModel, ctx.residualSigma, outlierFloor(p.adjustedModel, scale.mult))
      : [];
  let calendar = calendarRounds(x, missing, regressors, decompose, scale);
  let parts = components(span, missing, calendar.fit, calendar, scale);
  let found = unusual(parts);
  // Level shifts are taken out before decomposing again and given back to the trend-cycle (see levelSteps).
  const shifts = levelSteps(parts.adjustedModel, found);
  if (shifts !== null) {
    const {step} = shifts;
    const level = x.map((v, i) => scale.fromModel(scale.toModel(v) - step[i]));
    const rounds = calendarRounds(level, missing, regressors, decompose, scale);
    const trend = rounds.fit.trend.map((v, i) => scale.fromModel(scale.toModel(v) + step[i]));
    calendar = {...rounds, fit: {...rounds.fit, trend}};
    parts = components(span, missing, calendar.fit, calendar, scale);
    found = unusual(parts);
  }
  const {fit, anyCalendar} = calendar;
  const outliers = found.map((o) => ({...o, index: o.index + first}));
  const step = shifts?.step ?? new Float64Array(span.length);
  const revision = revisionDiagnostic(x, span, parts.adjusted, (sub) => {
    const cal = calendar.model.subarray(0, sub.length);
    const f = decompose(
      sub.map((v, i) => scale.fromModel(scale.toModel(v) - (anyCalendar ? cal[i] : 0) - step[i])),
    );
    return sub.map((v, i) => scale.remove(scale.remove(v, f.seasonal[i]), calendar.at(i)));
  }, REVISION_ENDS[frequency], minimum, scale.mult);

  const full = <T>(part: ArrayLike<T>, fill: T): T[] => {
    const out = new Array<T>(values.length).fill(fill);
    for (let i = 0; i < span.length; i++) out[first + i] = part[i];
    return out;
  };
  const model = chosen.model;
  const filledCount = missing.reduce((a, b) => a + b, 0);
  const adjustment: Adjustment = {
    method: method === 'classical' ? 'classical' : 'stl',
    model,
    modelReason: frequency === 'weekly' ? `${chosen.reason} ${WEEKLY_NOTE}` : chosen.reason,
    trend: full(fit.trend, NaN),
    seasonal: full(fit.seasonal, NaN),
    irregular: full(parts.irregular, NaN),
    adjusted: full(parts.adjusted.map((v, i) => (missing[i] ? NaN : v)), NaN),
    calendar: anyCalendar ? {effect: full(calendar.factor, NaN), regressors: calendar.estimates!} : null,
    outliers,
    filled: full(Array.from(missing, (v) => v === 1), false),
    diagnostics: {
      varianceShares: varianceShares(fit.trend.map(scale.toModel), fit.seasonal.map(scale.toModel), parts.irregularModel),
      residualSeasonality: residualSeasonality(
        parts.adjustedModel,
        seasonGroups(frequency, start, span.length),
        frequency === 'weekly' ? 12 : period,
      ),
      seasonalStability: seasonalStability(fit.seasonal.map(scale.toModel), period),
      revision,
    },
    options: {
      ...fit.options,
      model,
      requestedModel: ctx.options.model,
      autoModelRule: 'multiplicative when all values > 0, yearly level varies ≥ 10% and log-log slope of yearly range on level > 0.5',
      calendar: {
        regressors: regressors.map((r) => r.name),
        estimated: calendar.estimates,
        rounds: regressors.length > 0 ? CALENDAR_ROUNDS : 0,
        significanceLevel: 0.05,
        easterWindowDays: 8,
        scale: scale.mult ? 'log' : 'level',
      },
      missing: {filled: filledCount, method: `linear interpolation, then trend and seasonal of the fit (${FILL_ROUNDS} rounds)`},
      outliers: {
        enabled: ctx.outliers,
        thresholdSigmas: ctx.residualSigma,
        sigma: '1.4826 × MAD of the irregular',
        levelShiftsRemoved: (shifts?.shifts ?? []).map(({index, size}) => ({index: index + first, size})),
        levelShiftRule: 'removed before the final decomposition (model scale) and restored to the trend-cycle',
      },
      minimumObservations: minimum,
      revisionEnds: revision?.periodsTested ?? 0,
      calendarInIrregular: !anyCalendar,
    },
  };
  if (!anyCalendar && calendar.estimates !== null) {
    adjustment.options.calendarNote = 'no calendar effect was significant at 5%';
  }
  return {ok: true, adjustment};
}

/** Arithmetic of the model's scale: logs for multiplicative models, levels for additive ones. */
interface Scale {
  mult: boolean;
  toModel: (v: number) => number;
  fromModel: (v: number) => number;
  /** trend ⊕ seasonal: × or +. */
  combine: (a: number, b: number) => number;
  /** value ⊖ component: ÷ or −. */
  remove: (a: number, b: number) => number;
}

function modelScale(model: Model): Scale {
  const mult = model === 'multiplicative';
  return {
    mult,
    toModel: (v) => (mult ? Math.log(v) : v),
    fromModel: (v) => (mult ? Math.exp(v) : v),
    combine: (a, b) => (mult ? a * b : a + b),
    remove: (a, b) => (mult ? a / b : a - b),
  };
}

/** From the first to the last finite value (non-finite values become NaN), or null when there is none. */
function observedSpan(values: Float64Array): {first: number; last: number; span: Float64Array} | null {
  const n = values.length;
  const clean = values.map((v) => (Number.isFinite(v) ? v : NaN));
  let first = 0;
  while (first < n && Number.isNaN(clean[first])) first++;
  let last = n - 1;
  while (last >= 0 && Number.isNaN(clean[last])) last--;
  return first > last ? null : {first, last, span: clean.subarray(first, last + 1)};
}

/** The plain sentence when the span is shorter than `minimum` or has fewer than two years observed, else null. */
function tooShort(span: Float64Array, minimum: number, period: number, frequency: Frequency): Note | null {
  let observed = 0;
  for (const v of span) if (!Number.isNaN(v)) observed++;
  if (span.length >= minimum && observed >= 2 * period) return null;
  return {code: 'tooShortToAdjust', values: {minimum, observed, frequency}};
}

/** Gaps: straight lines first, then (FILL_ROUNDS times) the fitted trend and seasonal at the missing points. */
function fillMissing(
  span: Float64Array,
  missing: Float64Array,
  decompose: (x: Float64Array) => Parts,
  scale: Scale,
): Float64Array {
  const x = fillGaps(span).values;
  if (!missing.some((v) => v === 1)) return x;
  for (let round = 0; round < FILL_ROUNDS; round++) {
    const fit = decompose(x);
    for (let i = 0; i < x.length; i++) {
      const v = scale.combine(fit.trend[i], fit.seasonal[i]);
      if (missing[i] && Number.isFinite(v)) x[i] = v;
    }
  }
  return x;
}

interface CalendarRounds {
  /** The final decomposition (of the series less its significant calendar effect). */
  fit: Parts;
  estimates: CalendarRegressor[] | null;
  anyCalendar: boolean;
  /** Calendar effect on the model scale (significant regressors only, after the rounds). */
  model: Float64Array;
  /** The same as factors (or differences). */
  factor: Float64Array;
  /** The calendar effect removed at position i: the factor when any is significant, else neutral. */
  at: (i: number) => number;
}

/**
 * The level shifts among `found` as a step on the model scale (each shift's size from then on, summed), or null
 * when there is none. A decomposition's trend smooths a lasting jump over its window, so the irregular swings to
 * either side of it and the periods before and after read as one-offs; with the step taken out first and put back
 * into the trend-cycle afterwards, the seasonal and the irregular are those of the series without the jump (the
 * prior adjustment for level shifts of official seasonal adjustment practice).
 */
function levelSteps(
  adjustedModel: Float64Array,
  found: Outlier[],
): {step: Float64Array; shifts: {index: number; size: number}[]} | null {
  const at = found.filter((o) => o.kind === 'level-shift').map((o) => o.index);
  if (at.length === 0) return null;
  const sizes = levelShiftSizes(adjustedModel, at);
  const step = new Float64Array(adjustedModel.length);
  at.forEach((k, j) => {
    for (let t = k; t < step.length; t++) step[t] += sizes[j];
  });
  return {step, shifts: at.map((index, j) => ({index, size: sizes[j]}))};
}

/** Calendar: decompose → regress the irregular (model scale) on the regressors → remove → decompose again. */
function calendarRounds(
  x: Float64Array,
  missing: Float64Array,
  regressors: RegressorColumn[],
  decompose: (x: Float64Array) => Parts,
  scale: Scale,
): CalendarRounds {
  const m = x.length;
  const xm = x.map(scale.toModel);
  let estimates: CalendarRegressor[] | null = null;
  let calendarModel: Float64Array = new Float64Array(m);
  const plain = decompose(x);
  let fit = plain;
  if (regressors.length > 0) {
    for (let round = 0; round < CALENDAR_ROUNDS; round++) {
      const e = xm.map((v, i) => (missing[i] ? NaN : v - scale.toModel(fit.trend[i]) - scale.toModel(fit.seasonal[i])));
      estimates = regressCalendar(e, regressors, scale.mult);
      if (estimates === null) break;
      calendarModel = effectOf(regressors, estimates, m, false);
      fit = decompose(xm.map((v, i) => scale.fromModel(v - calendarModel[i])));
    }
    if (estimates !== null) {
      const significant = effectOf(regressors, estimates, m, true);
      // Decompositions already made are reused: with no effect significant it is the first one, with every effect
      // significant the last round's (the same effect, summed in the same order, so the same input).
      if (!estimates.some((r) => r.significant)) fit = plain;
      else if (!estimates.every((r) => r.significant)) {
        fit = decompose(xm.map((v, i) => scale.fromModel(v - significant[i])));
      }
      calendarModel = significant;
    }
  }
  const anyCalendar = estimates !== null && estimates.some((r) => r.significant);
  const factor = calendarModel.map(scale.fromModel);
  const at = (i: number): number => (anyCalendar ? factor[i] : scale.fromModel(0));
  return {fit, estimates, anyCalendar, model: calendarModel, factor, at};
}

/** Irregular (NaN where missing) and adjusted series, on the data scale and on the model scale. */
function components(
  span: Float64Array,
  missing: Float64Array,
  fit: Parts,
  calendar: CalendarRounds,
  scale: Scale,
): {irregular: Float64Array; adjusted: Float64Array; irregularModel: Float64Array; adjustedModel: Float64Array} {
  const {remove} = scale;
  const irregular = span.map((v, i) =>
    missing[i] ? NaN : remove(remove(remove(v, fit.trend[i]), fit.seasonal[i]), calendar.at(i)),
  );
  const adjusted = span.map((v, i) => remove(remove(v, fit.seasonal[i]), calendar.at(i)));
  return {irregular, adjusted, irregularModel: irregular.map(scale.toModel), adjustedModel: adjusted.map(scale.toModel)};
}

/** Season of each position for the residual-seasonality test: the month (weekly: of the week's Thursday). */
function seasonGroups(frequency: Frequency, start: number, m: number): Int32Array {
  return Int32Array.from({length: m}, (_, i) =>
    frequency === 'weekly'
      ? civilFromDays(periodStartDay('weekly', start + i) + 3).month - 1
      : seasonOf(frequency, start + i),
  );
}

const WEEKLY_NOTE =
  'Weekly series: the seasonal is a yearly Fourier pattern in the date (year = 365.2425 days), so 53-week years need no special handling; the trend is a LOESS.';

function decomposeOnce(
  x: Float64Array,
  c: {frequency: Frequency; start: number; model: Model; options: AnalysisOptions['decomposition']; period: number},
): Parts {
  const mult = c.model === 'multiplicative';
  const o = c.options;
  if (c.frequency !== 'weekly' && o.method === 'classical') {
    const fit = classicalDecomposition(x, {period: c.period, model: c.model});
    return {trend: fit.trend, seasonal: fit.seasonal, options: {method: 'classical', period: c.period}};
  }
  const y = mult ? x.map(Math.log) : x;
  let trend: Float64Array;
  let seasonal: Float64Array;
  let options: Record<string, unknown>;
  if (c.frequency === 'weekly') {
    const fit = weeklyFourier(y, {start: c.start, trendWindow: o.trendWindow, robust: o.robust});
    ({trend, seasonal} = fit);
    options = {...fit.options, seasonalPeriodWeeks: 365.2425 / 7};
  } else {
    const fit = stl(y, {
      period: c.period,
      seasonalWindow: o.seasonalWindow,
      seasonalDegree: o.seasonalDegree ?? 0,
      trendWindow: o.trendWindow,
      trendDegree: o.trendDegree ?? 1,
      lowpassWindow: o.lowpassWindow,
      lowpassDegree: o.lowpassDegree,
      robust: o.robust,
      inner: o.innerIterations,
      outer: o.outerIterations,
    });
    ({trend, seasonal} = fit);
    options = {method: 'stl', ...fit.options};
  }
  return mult ? {trend: trend.map(Math.exp), seasonal: seasonal.map(Math.exp), options} : {trend, seasonal, options};
}

function calendarRegressors(ctx: AdjustContext, start: number, m: number): RegressorColumn[] {
  if (ctx.frequency === 'weekly' || ctx.kind !== 'flow') return [];
  const out: RegressorColumn[] = [];
  if (ctx.calendar.workingDays === 'auto') {
    out.push({name: 'working-days', values: workingDayRegressor(ctx.frequency, start, m)});
  }
  if (ctx.calendar.easter === 'auto') out.push({name: 'easter', values: easterRegressor(ctx.frequency, start, m)});
  const holidays = ctx.calendar.holidays
    .map((h) => /^(\d{4})-(\d{2})-(\d{2})$/.exec(h))
    .filter((r): r is RegExpExecArray => r !== null)
    .map((r) => daysFromCivil(Number(r[1]), Number(r[2]), Number(r[3])));
  if (holidays.length > 0) out.push({name: 'holidays', values: holidayRegressor(ctx.frequency, start, m, holidays)});
  // A regressor that does not vary over the sample cannot be estimated.
  return out.filter((r) => r.values.some((v) => Math.abs(v - r.values[0]) > 1e-12));
}

/** Σ coefficient × regressor (model scale), over all regressors or only the significant ones. */
function effectOf(
  regressors: RegressorColumn[],
  estimates: CalendarRegressor[],
  m: number,
  onlySignificant: boolean,
): Float64Array {
  const out = new Float64Array(m);
  estimates.forEach((e, j) => {
    if (onlySignificant && !e.significant) return;
    for (let i = 0; i < m; i++) out[i] += e.coefficient * regressors[j].values[i];
  });
  return out;
}

/**
 * Revision of the adjusted period-on-period change: for each of the last `ends` periods t (where the series is
 * long enough), adjust the data ending at t (the concurrent adjustment, calendar coefficients held at their
 * full-sample values) and compare its change at t with the full-sample adjusted change at t. Changes are in
 * percent; when an adjusted value is not positive they are taken relative to the mean absolute level instead.
 * Returns the mean absolute difference in percentage points.
 */
function revisionDiagnostic(
  x: Float64Array,
  original: Float64Array,
  adjusted: Float64Array,
  adjustPrefix: (sub: Float64Array) => Float64Array,
  ends: number,
  minimum: number,
  mult: boolean,
): {meanAbsPp: number; periodsTested: number} | null {
  const m = x.length;
  let level = 0;
  for (const v of x) level += Math.abs(v) / m;
  const change = (a: number, b: number): number => (mult || a > 0 ? (100 * (b - a)) / a : (100 * (b - a)) / level);
  let sum = 0;
  let count = 0;
  for (let j = 1; j <= ends; j++) {
    const end = m - j;
    if (end < minimum || Number.isNaN(original[end]) || Number.isNaN(original[end - 1])) continue;
    try {
      const concurrent = adjustPrefix(x.subarray(0, end + 1));
      const d = change(concurrent[end - 1], concurrent[end]) - change(adjusted[end - 1], adjusted[end]);
      if (Number.isFinite(d)) {
        sum += Math.abs(d);
        count++;
      }
    } catch {
      continue;
    }
  }
  return count > 0 ? {meanAbsPp: sum / count, periodsTested: count} : null;
}

function constantAdjustment(
  values: Float64Array,
  first: number,
  last: number,
  ctx: AdjustContext,
  model: Model,
  period: number,
): Adjustment {
  const n = values.length;
  const inSpan = (i: number): boolean => i >= first && i <= last;
  const level = values[first];
  const neutral = model === 'multiplicative' ? 1 : 0;
  return {
    method: ctx.frequency !== 'weekly' && ctx.options.method === 'classical' ? 'classical' : 'stl',
    model,
    modelReason: 'The series is constant, so there is no seasonal pattern to remove; the adjusted series equals the original.',
    trend: Array.from({length: n}, (_, i) => (inSpan(i) ? level : NaN)),
    seasonal: Array.from({length: n}, (_, i) => (inSpan(i) ? neutral : NaN)),
    irregular: Array.from({length: n}, (_, i) => (inSpan(i) && Number.isFinite(values[i]) ? neutral : NaN)),
    adjusted: Array.from(values, (v) => (Number.isFinite(v) ? v : NaN)),
    calendar: null,
    outliers: [],
    filled: Array.from(values, (v, i) => inSpan(i) && !Number.isFinite(v)),
    diagnostics: {
      varianceShares: {trend: 0, seasonal: 0, irregular: 0},
      residualSeasonality: {test: 'none (constant series)', statistic: NaN, pValue: NaN, detected: false},
      seasonalStability: 0,
      revision: null,
    },
    options: {method: 'none', reason: 'constant series', period, model},
  };
}

/** Smallest sigma for outlier scores: 0.1% of the level (0.001 in logs for multiplicative models; common practice). */
function outlierFloor(adjustedModel: Float64Array, mult: boolean): number {
  return mult ? 1e-3 : 1e-3 * median(adjustedModel.map(Math.abs));
}
