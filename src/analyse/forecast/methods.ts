import {averageForecasts} from './averageForecasts.js';
import {reseasonalise} from './adjustedForecast.js';
import {forecastBenchmarks} from './benchmarks.js';
import {akaikeWeights} from './akaikeWeights.js';
import {arimaRunningTotals, fitArima, forecastArima, type ArimaFit, type ArimaOrder} from './arima.js';
import {selectArima} from './arimaSelect.js';
import {fitEts} from './etsFit.js';
import {forecastEtsMixture, simulateEtsMixture} from './etsMixture.js';
import type {EtsParams, EtsSpec} from './etsModel.js';
import {inSampleSeasonal} from './inSampleSeasonal.js';
import {runningTotalIntervals} from './runningTotalIntervals.js';
import {selectEts} from './etsSelect.js';
import type {Forecast} from './model.js';
import {forecastNaive, forecastSeasonalNaive} from './naive.js';
import {seasonalAdjustment, type SeasonalAdjustment} from './seasonalAdjustment.js';
import {stlSeasonalAdjustment} from './stlSeasonalAdjustment.js';
import {fitTheta, forecastTheta, type ThetaFit} from './theta.js';

/**
 * One forecasting method applied to a complete (gap-free) series: the dispatch shared by the pack, the
 * back-test and the M3 benchmark, so all three measure the same code.
 *
 * - `ets`: automatic ETS (AICc). Seasonal models only with m ≤ 24 and at least two full years; for longer
 *   periods (weekly data, m = 52) the series is seasonally adjusted first (classical decomposition, when the
 *   seasonality test finds a pattern) and non-seasonal ETS forecasts the adjusted series.
 * - `theta`: the Theta method (seasonal adjustment as in Theta's definition, any m).
 * - `arima`: automatic non-seasonal ARIMA (arimaSelect.ts) on robust-STL-adjusted data (stlSeasonalAdjustment.ts).
 * - `ets-theta-arima`: weighted mean of Akaike-weighted ETS (every model of automatic ETS with a weight of at
 *   least 1%, see akaikeWeights.ts) and Theta on STL-adjusted data, 45% each, and ARIMA on the same adjusted
 *   data, 10% — the most accurate of the combinations measured on M3 (test/bench/m3.ts: monthly sMAPE 13.48 and
 *   MASE 0.827, against 14.14 for ETS, 13.86 for Theta, 13.59 for the mean of the single best ETS model and
 *   Theta, 13.47 and 0.832 without ARIMA; quarterly 8.75 against 9.69, 9.20, 8.92 and 8.81). Equal thirds
 *   measured 13.73 / 0.823 (monthly), 20% ARIMA 13.58 / 0.825: the ARIMA member lowers MASE and raises sMAPE,
 *   and 10% is the largest share that kept monthly sMAPE below the Theta-and-ETS pair's level of 13.5.
 *   The weights were chosen on the M3 data itself, so the measured figures flatter them a little.
 * - `combination`: ETS, Theta on STL-adjusted data and damped trend on adjusted data, equally weighted.
 *   Combination intervals average the members' bounds and widen them about the mean by
 *   {@link combinationIntervalScale} (see averageForecasts).
 * - `seasonal-naive`, `naive` and the M3 benchmarks (`naive2`, `ses`, `holt`, `damped`, `comb-shd`).
 *
 * ETS, Theta and their combinations also give intervals for running totals of the forecasts (simulated ETS
 * sample paths, seeded; Theta's closed form), which the fiscal-year outturn uses.
 *
 * Complexity: dominated by automatic ETS (up to 15 fits; a back-test origin refits only the models kept).
 * NaN policy: rejects NaN. Needs n ≥ 4 except for the naive methods.
 */
export type MethodName =
  | 'ets'
  | 'theta'
  | 'arima'
  | 'combination'
  | 'ets-theta-arima'
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
  /** The ETS models used (by `ets` and the combinations) with their estimates, so a back-test can refit them. */
  etsModels?: EtsStart[];
  /** The ARIMA order chosen (by `arima` and `ets-theta-arima`), so a back-test can refit it. */
  arimaOrder?: ArimaOrder;
}

/** An ETS model class to refit, optionally with estimates to warm-start from. */
export interface EtsStart {
  spec: EtsSpec;
  params?: EtsParams;
  initialStates?: Float64Array;
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
  {
    period,
    h,
    levels,
    etsModels,
    arimaOrder,
    runningTotals = true,
  }: {
    period: number;
    h: number;
    levels: number[];
    etsModels?: EtsStart[];
    arimaOrder?: ArimaOrder;
    runningTotals?: boolean;
  },
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
      return {forecast: forecastTheta(fit, options), details: thetaDetails(fit)};
    }
    case 'ets':
      return runEts(values, period, options, etsModels, {weighted: false, withRunningTotals: runningTotals});
    case 'arima': {
      const adjustment = stlSeasonalAdjustment(values, period);
      return (
        runArima(values, adjustment, options, arimaOrder) ?? {forecast: forecastNaive(values, options), details: {}}
      );
    }
    case 'ets-theta-arima':
    case 'combination': {
      const ets = runEts(values, period, options, etsModels, {weighted: true, withRunningTotals: runningTotals});
      const adjustment = stlSeasonalAdjustment(values, period);
      const thetaFit = fitTheta(values, {period, adjust: () => adjustment});
      const thetaForecast = forecastTheta(thetaFit, options);
      if (adjustment.seasonal) thetaForecast.method = 'Theta on STL-adjusted data';
      const runs = [ets, {forecast: thetaForecast, details: thetaDetails(thetaFit)}];
      const arima = name === 'ets-theta-arima' ? runArima(values, adjustment, options, arimaOrder) : null;
      if (arima) runs.push(arima);
      const members = runs.map((r) => r.forecast);
      if (name === 'combination') members.push(forecastBenchmarks(values, period, options, ['Damped']).get('Damped')!);
      const weights = arima ? AUTO_WEIGHTS : undefined;
      const labels = members.map((m) => m.method);
      const scale = Object.fromEntries(levels.map((l) => [l, combinationIntervalScale(l)]));
      const forecast = averageForecasts(members, `Combination (${labels.join(', ')})`, scale, weights);
      const details = {
        members: labels,
        ...(weights ? {weights: Array.from(weights)} : {}),
        intervalScale: scale,
        ets: ets.details,
        theta: runs[1].details,
        ...(arima ? {arima: arima.details} : {}),
      };
      return {forecast, details, etsModels: ets.etsModels, arimaOrder: arima?.arimaOrder};
    }
  }
}

/** Shares of ETS, Theta and ARIMA in `ets-theta-arima` (measured on M3, see above). */
const AUTO_WEIGHTS = Float64Array.of(0.45, 0.45, 0.1);

/**
 * Automatic ARIMA on the adjusted series, reseasonalised; with `order` (a back-test origin) that order is refitted
 * instead of searched. Null when the series is too short for any order.
 */
function runArima(
  values: Float64Array,
  adjustment: SeasonalAdjustment,
  options: {h: number; levels: number[]},
  order?: ArimaOrder,
): MethodRun | null {
  const fit = (order && fitArima(adjustment.adjusted, order)) || selectArima(adjustment.adjusted);
  if (!fit) return null;
  const plain = forecastArima(fit, options);
  const label = adjustment.seasonal ? `${fit.method} on STL-adjusted data` : fit.method;
  const forecast = reseasonalise(plain, adjustment, label);
  forecast.fitted = inSampleSeasonal(arimaFitted(adjustment.adjusted, fit), values, adjustment);
  if (adjustment.seasonal) {
    const factors = adjustment.kind === 'multiplicative' ? adjustment.ahead(options.h) : undefined;
    forecast.runningTotals = arimaRunningTotals(fit, forecast.mean, forecast.levels, factors);
  }
  const {p, d, q} = fit.order;
  const details = {order: [p, d, q], ar: Array.from(fit.ar), ma: Array.from(fit.ma), constant: fit.constant};
  return {
    forecast,
    details: {...details, sigma2: fit.sigma2, seasonalAdjustment: adjustment.kind},
    arimaOrder: fit.order,
  };
}

/**
 * In-sample one-step ARIMA forecasts of the series it was fitted to: yₜ − eₜ where the CSS recursion has a residual
 * (from t = p on, of the differenced series when d = 1); NaN before.
 */
function arimaFitted(y: Float64Array, fit: ArimaFit): Float64Array {
  const d = fit.order.d;
  return Float64Array.from(y, (v, t) => (t - d >= fit.order.p ? v - fit.residuals[t - d] : NaN));
}

function thetaDetails(fit: ThetaFit): Record<string, unknown> {
  return {alpha: fit.alpha, drift: fit.drift, seasonalAdjustment: fit.adjustment.kind};
}

/** Weights under this share are dropped from the Akaike-weighted ETS forecast (see akaikeWeights.ts). */
const MIN_WEIGHT = 0.01;
/** Evaluation budget of a warm-started refit (the start is already close to the optimum). */
const WARM_EVALUATIONS = 300;

/**
 * Automatic ETS: every model of the stable subset is fitted (selectEts); `weighted` averages the forecasts of
 * those with an Akaike weight of at least 1% by weight, otherwise the model with the smallest AICc is kept.
 * With `models` (a back-test origin) the same model classes are refitted instead, warm-started from the given
 * estimates when there are any, and re-weighted by their AICc on this stretch of data.
 */
function runEts(
  values: Float64Array,
  period: number,
  options: {h: number; levels: number[]},
  models: EtsStart[] | undefined,
  {weighted, withRunningTotals}: {weighted: boolean; withRunningTotals: boolean},
): MethodRun {
  const n = values.length;
  const seasonalOk = period <= 24 && n >= 2 * period;
  const sa = period <= 24 ? null : seasonalAdjustment(values, period);
  const y = sa ? sa.adjusted : values;
  const positive = y.every((v) => v > 0);
  const usable = (models ?? []).filter(
    (m) => (m.spec.season === 'N' || seasonalOk) && (m.spec.error === 'A' || positive),
  );
  let fits = usable.flatMap((m) => {
    const warm = m.params && m.initialStates ? {start: {params: m.params, initialStates: m.initialStates}} : {};
    return fitEts(y, m.spec, m.params ? {...warm, maxEvaluations: WARM_EVALUATIONS} : warm) ?? [];
  });
  if (fits.length === 0) fits = selectEts(y, {period: sa ? 1 : period, seasonal: !sa && seasonalOk})?.fits ?? [];
  if (fits.length === 0) return {forecast: forecastNaive(values, options), details: {fallback: 'naive'}};
  const criteria = fits.map((f) => f.aicc);
  // Not weighted: the first model with the smallest AICc, as selectEts picks it.
  const all = weighted
    ? akaikeWeights(criteria, MIN_WEIGHT)
    : Float64Array.from(criteria, (_, i) => (i === criteria.indexOf(Math.min(...criteria)) ? 1 : 0));
  const kept = fits.filter((_, i) => all[i] > 0);
  const weights = all.filter((w) => w > 0);
  const etsModels = kept.map((f) => ({spec: f.spec, params: f.params, initialStates: f.initialStates}));
  const details = {
    models: kept.map((f, i) => ({model: f.method, weight: weights[i], params: f.params, aicc: f.aicc})),
    ...(sa ? {seasonalAdjustment: sa.kind} : {}),
  };
  const mixture = forecastEtsMixture(kept, weights, options);
  const fitted = new Float64Array(n);
  kept.forEach((f, k) => {
    for (let t = 0; t < n; t++) fitted[t] += weights[k] * f.fitted[t];
  });
  mixture.fitted = fitted;
  if (!sa) {
    if (withRunningTotals) {
      const paths = simulateEtsMixture(kept, weights, {h: options.h});
      mixture.runningTotals = runningTotalIntervals(paths, options.h, mixture.levels);
    }
    return {forecast: mixture, details, etsModels};
  }
  const method = sa.seasonal ? `${mixture.method} on seasonally adjusted data` : mixture.method;
  const forecast = reseasonalise(mixture, sa, method);
  forecast.fitted = inSampleSeasonal(fitted, values, sa);
  if (withRunningTotals) {
    const paths = simulateEtsMixture(kept, weights, {h: options.h});
    const factors = sa.ahead(options.h);
    for (let i = 0; i < paths.length; i++) {
      const t = i % options.h;
      if (sa.kind === 'multiplicative') paths[i] *= factors[t];
      else if (sa.kind === 'additive') paths[i] += factors[t];
    }
    forecast.runningTotals = runningTotalIntervals(paths, options.h, forecast.levels);
  }
  return {forecast, details, etsModels};
}
