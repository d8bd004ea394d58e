import {averageForecasts} from './averageForecasts.js';
import {reseasonalise} from './adjustedForecast.js';
import {forecastBenchmarks} from './benchmarks.js';
import {forecastEts} from './etsForecast.js';
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
 * - `combination`: equal-weight mean of automatic ETS, Theta and damped trend on adjusted data, intervals by
 *   averaging the members' bounds and scaling them by factors measured on the M3 data (see averageForecasts).
 * - `seasonal-naive`, `naive` and the M3 benchmarks (`naive2`, `ses`, `holt`, `damped`, `comb-shd`).
 *
 * Complexity: dominated by automatic ETS (up to 15 fits). NaN policy: rejects NaN. Needs n ≥ 4 except for
 * the naive methods.
 */
export type MethodName =
  | 'ets'
  | 'theta'
  | 'combination'
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
}

/**
 * Interval scale factors of the combination, by level: measured on the M3 monthly and quarterly series
 * (test/bench/m3.ts) so that the average of the members' bounds covers close to its nominal rate.
 */
export const COMBINATION_INTERVAL_SCALE: Record<number, number> = {};

export function runMethod(
  name: MethodName,
  values: Float64Array,
  {period, h, levels}: {period: number; h: number; levels: number[]},
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
      const label = ({naive2: 'Naive2', ses: 'SES', holt: 'Holt', damped: 'Damped', 'comb-shd': 'Comb S-H-D'} as const)[name];
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
      return runEts(values, period, options);
    case 'combination': {
      const ets = runEts(values, period, options);
      const theta = runMethod('theta', values, {period, h, levels});
      const damped = forecastBenchmarks(values, period, options, ['Damped']).get('Damped')!;
      const forecast = averageForecasts(
        [ets.forecast, theta.forecast, damped],
        `Combination (${ets.forecast.method}, Theta, Damped)`,
        COMBINATION_INTERVAL_SCALE,
      );
      return {forecast, details: {members: [ets.forecast.method, 'Theta', 'Damped'], ets: ets.details, theta: theta.details}};
    }
  }
}

function runEts(values: Float64Array, period: number, options: {h: number; levels: number[]}): MethodRun {
  const n = values.length;
  if (period <= 24) {
    const selection = selectEts(values, {period, seasonal: n >= 2 * period});
    if (!selection) return {forecast: forecastNaive(values, options), details: {fallback: 'naive'}};
    const fit = selection.best;
    return {forecast: forecastEts(fit, options), details: {model: fit.method, params: fit.params, aicc: fit.aicc}};
  }
  const sa = seasonalAdjustment(values, period);
  const selection = selectEts(sa.adjusted, {period: 1, seasonal: false});
  if (!selection) return {forecast: forecastNaive(values, options), details: {fallback: 'naive'}};
  const fit = selection.best;
  const method = sa.seasonal ? `${fit.method} on seasonally adjusted data` : fit.method;
  return {
    forecast: reseasonalise(forecastEts(fit, options), sa, method),
    details: {model: fit.method, params: fit.params, aicc: fit.aicc, seasonalAdjustment: sa.kind},
  };
}
