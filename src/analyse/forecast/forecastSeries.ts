import type {AnalysisOptions} from '../../config/plan.js';
import type {Note} from '../../words/index.js';
import {periodsPerYear, type Frequency} from '../../time/period.js';
import {rollingBacktest} from './backtest.js';
import {fitMethod, type MethodFit, type MethodName, type MethodRun} from './methods.js';
import type {Forecast} from './model.js';
import {constantValue} from '../numeric/constantValue.js';
import {prepareSeries} from './prepareSeries.js';
import type {ForecastResult} from './types.js';

/**
 * What-next forecast of one series: prepare the data (trim NaN at both ends, fill interior gaps), pick the
 * method (falling back for short or constant series), forecast `horizon` periods with intervals at the
 * requested levels, and back-test the same method from rolling origins.
 *
 * Methods: `auto` (the method that measured best on the M3 data: a weighted mean of automatic ETS, Theta and
 * ARIMA, see {@link AUTO_METHOD} and methods.ts), `ets`, `theta`, `arima`, `combination` (ETS, Theta, damped),
 * `seasonal-naive`.
 * Fallbacks, each with a note: a constant series forecasts the constant;
 * fewer than 4 values use the naive method; fewer than two full years exclude seasonal models; weekly data
 * (m = 52) are seasonally adjusted before non-seasonal models.
 *
 * Running totals of the forecasts (for the fiscal-year outturn) come with the result unless `runningTotals` is
 * false; ETS simulates sample paths for them, so a caller whose outturn does not read them leaves them out.
 *
 * Complexity: one method run plus `backtestOrigins` refits of it and of two benchmarks.
 * NaN policy: skips leading/trailing NaN, fills interior NaN by linear interpolation (noted). Throws when no
 * value is present.
 */
export const AUTO_METHOD: MethodName = 'ets-theta-arima';

export function forecastSeries(
  values: Float64Array,
  {
    frequency,
    options,
    runningTotals: wantTotals = true,
  }: {frequency: Frequency; options: AnalysisOptions['forecast']; runningTotals?: boolean},
): ForecastResult {
  const notes: Note[] = [];
  const {horizon, levels: requestedLevels, backtestOrigins} = options;
  const levels = [...requestedLevels].sort((a, b) => a - b);
  const prepared = prepareSeries(values);
  const y = prepared.values;
  const n = y.length;
  if (n === 0) throw new RangeError('forecast needs at least one value');
  if (prepared.filled > 0) {
    notes.push({code: 'forecastFilled', values: {count: prepared.filled}});
  }
  if (prepared.first + n < values.length) {
    notes.push({code: 'forecastAfterEnd', values: {}});
  }
  const period = periodsPerYear[frequency];
  let method: MethodName = options.method === 'auto' ? AUTO_METHOD : options.method;
  const constant = constantValue(y) !== null;
  // Steps between the last observation and the first forecast period (trailing NaN are forecast too).
  const gap = values.length - (prepared.first + n);
  const h = horizon + gap;
  let run: MethodRun;
  let fit: MethodFit | null = null;
  if (constant) {
    notes.push({code: 'forecastConstant', values: {}});
    const mean = new Float64Array(h).fill(y[0]);
    const bounds = new Map(levels.map((l) => [l, Float64Array.from(mean)]));
    run = {forecast: {method: 'Constant', mean, levels, lower: bounds, upper: new Map(bounds)}, details: {}};
  } else if (n < 4) {
    notes.push({code: 'forecastFewValues', values: {}});
    method = 'naive';
    fit = fitMethod('naive', y, {period});
    run = fit.forecast({h, levels, runningTotals: wantTotals});
  } else {
    if (method === 'seasonal-naive' && n <= period) {
      notes.push({code: 'naiveForSeasonalNaive', values: {}});
    } else if (n < 2 * period && method !== 'seasonal-naive') {
      notes.push({code: 'noSeasonalModels', values: {}});
    }
    if (frequency === 'weekly' && (method === 'ets' || method === 'combination' || method === 'ets-theta-arima')) {
      notes.push({code: 'weeklyEts', values: {}});
    }
    fit = fitMethod(method, y, {period});
    run = fit.forecast({h, levels, runningTotals: wantTotals});
    if (!isFinitePath(run.forecast)) {
      notes.push({code: 'forecastNotFinite', values: {method: run.forecast.method}});
      method = 'naive';
      fit = fitMethod('naive', y, {period});
      run = fit.forecast({h, levels, runningTotals: wantTotals});
    }
  }
  const forecast = run.forecast;
  const cut = (a: Float64Array): number[] => Array.from(a.subarray(gap));
  const lower: Record<string, number[]> = {};
  const upper: Record<string, number[]> = {};
  for (const level of levels) {
    lower[String(level)] = cut(forecast.lower.get(level)!);
    upper[String(level)] = cut(forecast.upper.get(level)!);
  }
  const runningTotals = wantTotals && forecast.runningTotals && gap === 0 ? forecast.runningTotals : undefined;
  const totals = runningTotals
    ? {
        lower: Object.fromEntries(levels.map((l) => [String(l), Array.from(runningTotals.lower.get(l)!)])),
        upper: Object.fromEntries(levels.map((l) => [String(l), Array.from(runningTotals.upper.get(l)!)])),
      }
    : undefined;
  const backtest =
    fit === null || backtestOrigins < 1 || n < 5
      ? null
      : rollingBacktest(y, {fit, period, horizon, origins: backtestOrigins, minTrain: 4, offset: prepared.first});
  return {
    method: forecast.method,
    startOffset: values.length,
    mean: cut(forecast.mean),
    levels,
    lower,
    upper,
    backtest,
    options: {
      method: options.method,
      resolvedMethod: constant ? 'constant' : method,
      horizon,
      levels,
      backtestOrigins,
      period,
      observations: n,
      ...run.details,
    },
    notes,
    residuals: forecast.fitted ? inSampleErrors(values, forecast.fitted, prepared.first) : [],
    ...(totals ? {runningTotals: totals} : {}),
  };
}

/**
 * yₜ − ŷₜ|ₜ₋₁ on the series' own positions: the fit covers values[first …]; NaN where the value is missing (it was
 * filled for fitting) or the model has no fitted value.
 */
function inSampleErrors(values: Float64Array, fitted: Float64Array, first: number): number[] {
  return Array.from(values, (v, i) => {
    const t = i - first;
    return t >= 0 && t < fitted.length ? v - fitted[t] : NaN;
  });
}

function isFinitePath(f: Forecast): boolean {
  const ok = (a: Float64Array) => a.every((v) => Number.isFinite(v));
  return ok(f.mean) && f.levels.every((l) => ok(f.lower.get(l)!) && ok(f.upper.get(l)!));
}
