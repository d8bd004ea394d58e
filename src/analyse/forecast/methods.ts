import {averageForecasts} from './averageForecasts.js';
import {reseasonalise} from './adjustedForecast.js';
import {forecastBenchmarks} from './benchmarks.js';
import {forecastEts} from './etsForecast.js';
import {simulateEts} from './etsSimulate.js';
import {runningTotalIntervals} from './runningTotalIntervals.js';
import {fitEts} from './etsFit.js';
import type {EtsSpec} from './etsModel.js';
import {selectEts} from './etsSelect.js';
import type {Forecast} from './model.js';
import {forecastNaive, forecastSeasonalNaive} from './naive.js';
import {seasonalAdjustment} from './seasonalAdjustment.js';
import {fitTheta, forecastTheta} from './theta.js';

/**
 * One forecasting method applied to a complete (gap-free) series: the dispatch shared by the pack, the
 * back-test and the M3 benchmark, so all three measure the same code.
 *
 * - `ets`: automatic ETS (AICc). Seasonal models only with m ≤ 24 and at least two full years; for longer
 *   periods (weekly data, m = 52) the series is seasonally adjusted first (classical decomposition, when the
 *   seasonality test finds a pattern) and non-seasonal ETS forecasts the adjusted series.
 * - `theta`: the Theta method (seasonal adjustment as in Theta's definition, any m).
 * - `ets-theta`: equal-weight mean of automatic ETS and Theta — the most accurate of the combinations measured
 *   on M3 (test/bench/m3.ts: monthly sMAPE 13.59 vs 14.14 ETS and 13.86 Theta; quarterly 8.92 vs 9.69 and 9.20).
 * - `combination`: equal-weight mean of automatic ETS, Theta and damped trend on adjusted data.
 *   Combination intervals average the members' bounds and widen them about the mean by
 *   {@link combinationIntervalScale} (see averageForecasts).
 * - `seasonal-naive`, `naive` and the M3 benchmarks (`naive2`, `ses`, `holt`, `damped`, `comb-shd`).
 *
 * ETS, Theta and their combinations also give intervals for running totals of the forecasts (simulated ETS
 * sample paths, seeded; Theta's closed form), which the fiscal-year outturn uses.
 *
 * Complexity: dominated by automatic ETS (up to 15 fits). NaN policy: rejects NaN. Needs n ≥ 4 except for
 * the naive methods.
 */
export type MethodName =
  | 'ets'
  | 'theta'
  | 'combination'
  | 'ets-theta'
  | 'seasonal-naive'
  | 'naive'
  | 'naive2'
  | 'ses'
  | 'holt'
  | 'damped'
  | 'comb-shd';

export interface MethodRun {
  forecast: Forecast;
  /** Chosen model and parameters, for the result's options. */
  details: Record<string, unknown>;
  /** The ETS model used (by `ets` and the combinations), so a back-test can refit the same model class. */
  etsSpec?: EtsSpec;
}

/**
 * Widening factor for combination intervals at a level: 1.05 at 80% and 1.15 at 95%, linear in between and
 * beyond, kept within [1, 1.25]. Measured on the 2184 M3 monthly and quarterly series (test/bench/m3.ts): the
 * plain average of the ETS and Theta bounds covered 78.6% / 77.0% (80% level) and 92.8% / 89.8% (95% level) of
 * monthly / quarterly outcomes; with these factors 80.6% / 78.6% and 95.5% / 93.1%.
 */
export function combinationIntervalScale(level: number): number {
  return Math.min(1.25, Math.max(1, 1.05 + ((level - 80) * 0.1) / 15));
}

export function runMethod(
  name: MethodName,
  values: Float64Array,
  {period, h, levels, etsSpec}: {period: number; h: number; levels: number[]; etsSpec?: EtsSpec},
): MethodRun {
  const options = {h, levels};
  switch (name) {
    case 'naive':
      return {forecast: forecastNaive(values, options), details: {}};
    case 'seasonal-naive':
      return {forecast: forecastSeasonalNaive(values, period, options), details: {period}};
    case 'naive2':
    case 'ses':
    case 'holt':
    case 'damped':
    case 'comb-shd': {
      const labels = {naive2: 'Naive2', ses: 'SES', holt: 'Holt', damped: 'Damped', 'comb-shd': 'Comb S-H-D'} as const;
      const label = labels[name];
      return {forecast: forecastBenchmarks(values, period, options, [label]).get(label)!, details: {}};
    }
    case 'theta': {
      const fit = fitTheta(values, {period});
      return {
        forecast: forecastTheta(fit, options),
        details: {alpha: fit.alpha, drift: fit.drift, seasonalAdjustment: fit.adjustment.kind},
      };
    }
    case 'ets':
      return runEts(values, period, options, etsSpec);
    case 'ets-theta':
    case 'combination': {
      const ets = runEts(values, period, options, etsSpec);
      const theta = runMethod('theta', values, {period, h, levels});
      const members = [ets.forecast, theta.forecast];
      if (name === 'combination') members.push(forecastBenchmarks(values, period, options, ['Damped']).get('Damped')!);
      const labels = members.map((m) => m.method);
      const scale = Object.fromEntries(levels.map((l) => [l, combinationIntervalScale(l)]));
      const forecast = averageForecasts(members, `Combination (${labels.join(', ')})`, scale);
      const details = {members: labels, intervalScale: scale, ets: ets.details, theta: theta.details};
      return {forecast, details, etsSpec: ets.etsSpec};
    }
  }
}

/**
 * Automatic ETS, or a refit of the given model class (`spec`: smoothing parameters and states re-estimated, no
 * selection), as back-tests do to keep their cost at one fit per origin.
 */
function runEts(
  values: Float64Array,
  period: number,
  options: {h: number; levels: number[]},
  spec?: EtsSpec,
): MethodRun {
  const n = values.length;
  const seasonalOk = period <= 24 && n >= 2 * period;
  const sa = period <= 24 ? null : seasonalAdjustment(values, period);
  const y = sa ? sa.adjusted : values;
  const usable = spec && (spec.season === 'N' || seasonalOk) && !(spec.error === 'M' && y.some((v) => !(v > 0)));
  const fit =
    (usable ? fitEts(y, spec) : null) ?? selectEts(y, {period: sa ? 1 : period, seasonal: !sa && seasonalOk})?.best;
  if (!fit) return {forecast: forecastNaive(values, options), details: {fallback: 'naive'}};
  const details = {model: fit.method, params: fit.params, aicc: fit.aicc, ...(sa ? {seasonalAdjustment: sa.kind} : {})};
  if (!sa) {
    const forecast = forecastEts(fit, options);
    forecast.runningTotals = runningTotalIntervals(simulateEts(fit, {h: options.h}), options.h, forecast.levels);
    return {forecast, details, etsSpec: fit.spec};
  }
  const method = sa.seasonal ? `${fit.method} on seasonally adjusted data` : fit.method;
  const forecast = reseasonalise(forecastEts(fit, options), sa, method);
  const paths = simulateEts(fit, {h: options.h});
  const factors = sa.ahead(options.h);
  for (let i = 0; i < paths.length; i++) {
    const t = i % options.h;
    if (sa.kind === 'multiplicative') paths[i] *= factors[t];
    else if (sa.kind === 'additive') paths[i] += factors[t];
  }
  forecast.runningTotals = runningTotalIntervals(paths, options.h, forecast.levels);
  return {forecast, details, etsSpec: fit.spec};
}
