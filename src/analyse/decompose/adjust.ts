import type {AnalysisOptions} from '../../config/plan.js';
import type {Note} from '../../words/index.js';
import {easterRegressor, holidayRegressor, workingDayRegressor} from '../../time/calendar.js';
import {daysFromCivil, periodStartDay, civilFromDays, seasonOf, type Frequency} from '../../time/period.js';
import {fillGaps} from '../numeric/fillGaps.js';
import {regressCalendar, type RegressorColumn} from './calendarRegression.js';
import {chooseModel} from './chooseModel.js';
import {classicalDecomposition} from './classical.js';
import {residualSeasonality, seasonalStability, varianceShares} from './diagnostics.js';
import {detectOutliers} from './outliers.js';
import {median} from '../numeric/median.js';
import {stl} from './stl.js';
import type {Adjustment, CalendarRegressor} from './types.js';
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
 * Seasonally adjust one series: the engine behind `adjustSeries` (see index.ts for the pipeline it follows).
 * Never throws for data reasons: poor data gives `{ok: false, reason}` with one plain sentence.
 */
export function adjust(values: Float64Array, ctx: AdjustContext): AdjustOutcome {
  const {frequency} = ctx;
  const period = PERIOD[frequency];
  const n = values.length;
  const clean = values.map((v) => (Number.isFinite(v) ? v : NaN));
  let first = 0;
  while (first < n && Number.isNaN(clean[first])) first++;
  let last = n - 1;
  while (last >= 0 && Number.isNaN(clean[last])) last--;
  if (first > last) return {ok: false, reason: {code: 'noValues', values: {}}};
  const span = clean.subarray(first, last + 1);
  const m = span.length;
  let observed = 0;
  for (const v of span) if (!Number.isNaN(v)) observed++;
  const method = frequency === 'weekly' ? 'fourier' : ctx.options.method;
  const minimum = frequency === 'weekly' ? MIN_WEEKS : method === 'stl' ? 2 * period + 1 : 2 * period;
  if (m < minimum || observed < 2 * period) {
    return {ok: false, reason: {code: 'tooShortToAdjust', values: {minimum, observed, frequency}}};
  }
  const missing = span.map((v) => (Number.isNaN(v) ? 1 : 0));
  const filledCount = missing.reduce((a, b) => a + b, 0);
  const chosen = chooseModel(span, period, ctx.options.model);
  const model: Model = chosen.model;
  const mult = model === 'multiplicative';
  const toModel = (v: number): number => (mult ? Math.log(v) : v);
  const fromModel = (v: number): number => (mult ? Math.exp(v) : v);
  const combine = (a: number, b: number): number => (mult ? a * b : a + b);
  const remove = (a: number, b: number): number => (mult ? a / b : a - b);
  const start = ctx.start + first;

  if (isConstant(span)) return {ok: true, adjustment: constantAdjustment(values, first, last, ctx, model, period)};

  const decompose = (x: Float64Array): Parts =>
    decomposeOnce(x, {frequency, start, model, options: ctx.options, period});

  // Gaps: straight lines first, then (FILL_ROUNDS times) the fitted trend and seasonal at the missing points.
  const x = fillGaps(span).values;
  if (filledCount > 0) {
    for (let round = 0; round < FILL_ROUNDS; round++) {
      const fit = decompose(x);
      for (let i = 0; i < m; i++) {
        const v = combine(fit.trend[i], fit.seasonal[i]);
        if (missing[i] && Number.isFinite(v)) x[i] = v;
      }
    }
  }

  // Calendar: decompose → regress the irregular (model scale) on the regressors → remove → decompose again.
  const regressors = calendarRegressors(ctx, start, m);
  const xm = x.map(toModel);
  let estimates: CalendarRegressor[] | null = null;
  let calendarModel: Float64Array = new Float64Array(m);
  let fit = decompose(x);
  if (regressors.length > 0) {
    for (let round = 0; round < CALENDAR_ROUNDS; round++) {
      const e = xm.map((v, i) => (missing[i] ? NaN : v - toModel(fit.trend[i]) - toModel(fit.seasonal[i])));
      estimates = regressCalendar(e, regressors, mult);
      if (estimates === null) break;
      calendarModel = effectOf(regressors, estimates, m, false);
      fit = decompose(xm.map((v, i) => fromModel(v - calendarModel[i])));
    }
    if (estimates !== null) {
      const significant = effectOf(regressors, estimates, m, true);
      const anySignificant = estimates.some((r) => r.significant);
      if (anySignificant) fit = decompose(xm.map((v, i) => fromModel(v - significant[i])));
      else fit = decompose(x);
      calendarModel = significant;
    }
  }
  const anyCalendar = estimates !== null && estimates.some((r) => r.significant);
  const calendarFactor = calendarModel.map(fromModel);

  const full = <T>(part: ArrayLike<T>, fill: T): T[] => {
    const out = new Array<T>(n).fill(fill);
    for (let i = 0; i < m; i++) out[first + i] = part[i];
    return out;
  };
  const calendarAt = (i: number): number => (anyCalendar ? calendarFactor[i] : fromModel(0));
  const irregular = span.map((v, i) =>
    missing[i] ? NaN : remove(remove(remove(v, fit.trend[i]), fit.seasonal[i]), calendarAt(i)),
  );
  const adjusted = span.map((v, i) => remove(remove(v, fit.seasonal[i]), calendarAt(i)));
  const irregularModel = irregular.map(toModel);
  const adjustedModel = adjusted.map(toModel);
  const outliers = ctx.outliers
    ? detectOutliers(irregularModel, adjustedModel, ctx.residualSigma, outlierFloor(adjustedModel, mult)).map((o) => ({
        ...o,
        index: o.index + first,
      }))
    : [];
  const seasonGroup = Int32Array.from({length: m}, (_, i) =>
    frequency === 'weekly'
      ? civilFromDays(periodStartDay('weekly', start + i) + 3).month - 1
      : seasonOf(frequency, start + i),
  );
  const revision = revisionDiagnostic(x, span, adjusted, (sub) => {
    const cal = calendarModel.subarray(0, sub.length);
    const f = decompose(sub.map((v, i) => fromModel(toModel(v) - (anyCalendar ? cal[i] : 0))));
    return sub.map((v, i) => remove(remove(v, f.seasonal[i]), calendarAt(i)));
  }, REVISION_ENDS[frequency], minimum, mult);

  const adjustment: Adjustment = {
    method: method === 'classical' ? 'classical' : 'stl',
    methodLabel: METHOD_LABEL[method],
    model,
    modelReason: frequency === 'weekly' ? `${chosen.reason} ${WEEKLY_NOTE}` : chosen.reason,
    trend: full(fit.trend, NaN),
    seasonal: full(fit.seasonal, NaN),
    irregular: full(irregular, NaN),
    adjusted: full(adjusted.map((v, i) => (missing[i] ? NaN : v)), NaN),
    calendar: anyCalendar ? {effect: full(calendarFactor, NaN), regressors: estimates!} : null,
    outliers,
    filled: full(Array.from(missing, (v) => v === 1), false),
    diagnostics: {
      varianceShares: varianceShares(fit.trend.map(toModel), fit.seasonal.map(toModel), irregularModel),
      residualSeasonality: residualSeasonality(adjustedModel, seasonGroup, frequency === 'weekly' ? 12 : period),
      seasonalStability: seasonalStability(fit.seasonal.map(toModel), period),
      revision,
    },
    options: {
      ...fit.options,
      model,
      requestedModel: ctx.options.model,
      autoModelRule: 'multiplicative when all values > 0, yearly level varies ≥ 10% and log-log slope of yearly range on level > 0.5',
      calendar: {
        regressors: regressors.map((r) => r.name),
        estimated: estimates,
        rounds: regressors.length > 0 ? CALENDAR_ROUNDS : 0,
        significanceLevel: 0.05,
        easterWindowDays: 8,
        scale: mult ? 'log' : 'level',
      },
      missing: {filled: filledCount, method: `linear interpolation, then trend and seasonal of the fit (${FILL_ROUNDS} rounds)`},
      outliers: {enabled: ctx.outliers, thresholdSigmas: ctx.residualSigma, sigma: '1.4826 × MAD of the irregular'},
      minimumObservations: minimum,
      revisionEnds: revision?.periodsTested ?? 0,
      calendarInIrregular: !anyCalendar,
    },
  };
  if (!anyCalendar && estimates !== null) adjustment.options.calendarNote = 'no calendar effect was significant at 5%';
  return {ok: true, adjustment};
}

const METHOD_LABEL = {
  stl: 'STL (seasonal-trend decomposition by LOESS)',
  classical: 'classical decomposition by moving averages',
  fourier: 'yearly Fourier seasonal with a LOESS trend (weekly)',
};

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

/** True when every non-NaN value is the same. */
function isConstant(values: Float64Array): boolean {
  let seen = NaN;
  for (const v of values) {
    if (Number.isNaN(v)) continue;
    if (Number.isNaN(seen)) seen = v;
    else if (v !== seen) return false;
  }
  return true;
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
