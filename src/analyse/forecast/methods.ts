import {averageForecasts} from './averageForecasts.js';
import {forecastBenchmarks} from './benchmarks.js';
import type {ArimaFit, ArimaOrder} from './arima.js';
import {fitArimaMember, type ArimaMember} from './arimaMethod.js';
import {fitEtsMethod, type EtsSelectionOptions} from './etsMethod.js';
import type {MethodFit, MethodForecastOptions, MethodRun} from './method.js';
import {forecastNaive, forecastSeasonalNaive} from './naive.js';
import {stlSeasonalAdjustment} from './stlSeasonalAdjustment.js';
import {fitTheta, forecastTheta, type ThetaFit} from './theta.js';

export type {MethodFit, MethodRun};

/**
 * One forecasting method fitted to a complete (gap-free) series, in the fit → forecast → refit shape of method.ts:
 * the dispatch shared by the pack, the back-test and the M3 benchmark, so all three measure the same code.
 *
 * - `ets`: automatic ETS (AICc). Seasonal models only with m ≤ 24 and at least two full years; for longer
 *   periods (weekly data, m = 52) the series is seasonally adjusted first (classical decomposition, when the
 *   seasonality test finds a pattern) and non-seasonal ETS forecasts the adjusted series.
 * - `theta`: the Theta method (seasonal adjustment as in Theta's definition, any m).
 * - `arima`: automatic non-seasonal ARIMA (arimaMethod.ts) on robust-STL-adjusted data (stlSeasonalAdjustment.ts).
 * - `ets-theta-arima`: weighted mean of Akaike-weighted ETS (every model of automatic ETS with a weight of at
 *   least 1%, see akaikeWeights.ts, from a pool of 13, see AUTO_SELECTION) and Theta on STL-adjusted data, 45%
 *   each, and ARIMA on the same adjusted data, 10% — the most accurate of the combinations measured on M3
 *   (test/bench/m3.ts: monthly sMAPE 13.48 and MASE 0.827, against 14.14 for ETS, 13.86 for Theta, 13.59 for
 *   the mean of the single best ETS model and Theta, 13.47 and 0.832 without ARIMA; quarterly 8.75 against 9.69,
 *   9.20, 8.92 and 8.81). Equal thirds measured 13.73 / 0.823 (monthly), 20% ARIMA 13.58 / 0.825: the ARIMA
 *   member lowers MASE and raises sMAPE, and 10% is the largest share that kept monthly sMAPE below the
 *   Theta-and-ETS pair's level of 13.5.
 *   The weights were chosen on the M3 data itself, so the measured figures flatter them a little.
 * - `combination`: ETS, Theta on STL-adjusted data and damped trend on adjusted data, equally weighted.
 *   Combination intervals average the members' bounds and widen them about the mean by
 *   {@link combinationIntervalScale} (see averageForecasts).
 * - `seasonal-naive`, `naive` and the M3 benchmarks (`naive2`, `ses`, `holt`, `damped`, `comb-shd`).
 *
 * ETS, Theta and their combinations also give intervals for running totals of the forecasts (simulated ETS
 * sample paths, seeded; Theta's closed form), which the fiscal-year outturn uses.
 *
 * Complexity: dominated by automatic ETS (up to 15 fits, 13 in `auto`; a refit re-estimates only the models kept).
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

/**
 * Widening factor for combination intervals at a level: 1.05 at 80% and 1.15 at 95%, linear in between and
 * beyond, kept within [1, 1.25]. Measured on the 2184 M3 monthly and quarterly series (test/bench/m3.ts): the
 * plain average of the ETS and Theta bounds covered 78.6% / 77.0% (80% level) and 92.8% / 89.8% (95% level) of
 * monthly / quarterly outcomes; with these factors 80.6% / 78.6% and 95.5% / 93.1%.
 */
export function combinationIntervalScale(level: number): number {
  return Math.min(1.25, Math.max(1, 1.05 + ((level - 80) * 0.1) / 15));
}

/**
 * How `auto`'s ETS member selects (etsMethod.ts), against the reference's 2,000 evaluations a search and 15 models.
 * Measured with npm run bench:m3 (4 December 2026; figures to more places than the bench prints):
 * - 1,000 evaluations: monthly sMAPE 13.4811, MASE 0.82720, quarterly sMAPE 8.7542, the figures of 2,000 to two
 *   decimals; 750 and 500 moved quarterly sMAPE to 8.76.
 * - Without the damped-trend models with additive season, ETS(A,Ad,A) and ETS(M,Ad,A): monthly 13.4813 and 0.82702,
 *   quarterly 8.7526, coverage 81.0/95.7% and 78.5/92.9%, with two fits fewer a series (about a tenth of auto's
 *   time). Also leaving out ETS(M,Ad,M) measured monthly 13.4734 but quarterly 8.7563; leaving out the
 *   multiplicative-error models with additive season measured 13.4870 monthly; fitting only seasonal models when
 *   the 90% seasonality test finds a pattern, 13.5055. Like the weights, the pool was chosen on M3 itself.
 */
const AUTO_SELECTION: EtsSelectionOptions = {maxEvaluations: 1000, dampedAdditiveSeason: false};

/** Fit `name` to `values` (see the list above). */
export function fitMethod(name: MethodName, values: Float64Array, {period}: {period: number}): MethodFit {
  switch (name) {
    case 'naive':
    case 'seasonal-naive':
    case 'naive2':
    case 'ses':
    case 'holt':
    case 'damped':
    case 'comb-shd':
      return simpleFit(name, values, period);
    case 'theta':
      return thetaFit(values, period);
    case 'ets':
    case 'ets-theta-arima':
    case 'combination': {
      // `auto`: back-test origins re-estimate by gradient fits and the selection is AUTO_SELECTION's
      // (etsMethod.ts); `ets` and `combination` select as the reference implementation does.
      const auto = name === 'ets-theta-arima';
      const optimizer = auto ? 'gradient' : 'nelder-mead';
      const selection = auto ? AUTO_SELECTION : undefined;
      const ets = fitEtsMethod(values, period, {weighted: name !== 'ets', optimizer, selection});
      return name === 'ets' ? ets : combinationFit(name, values, period, ets);
    }
    case 'arima':
      return arimaFit(values, period);
  }
}

/** Fit and forecast in one call: `fitMethod(name, values, {period}).forecast({h, levels, runningTotals})`. */
export function runMethod(
  name: MethodName,
  values: Float64Array,
  {period, ...options}: {period: number} & MethodForecastOptions,
): MethodRun {
  return fitMethod(name, values, {period}).forecast(options);
}

/** The naive methods and the M3 benchmarks: nothing is estimated ahead, so a refit is a new fit. */
function simpleFit(
  name: 'naive' | 'seasonal-naive' | 'naive2' | 'ses' | 'holt' | 'damped' | 'comb-shd',
  values: Float64Array,
  period: number,
): MethodFit {
  const labels = {naive2: 'Naive2', ses: 'SES', holt: 'Holt', damped: 'Damped', 'comb-shd': 'Comb S-H-D'} as const;
  return {
    forecast: ({h, levels}) => {
      const options = {h, levels};
      if (name === 'naive') return {forecast: forecastNaive(values, options), details: {}};
      if (name === 'seasonal-naive') {
        return {forecast: forecastSeasonalNaive(values, period, options), details: {period}};
      }
      const label = labels[name];
      return {forecast: forecastBenchmarks(values, period, options, [label]).get(label)!, details: {}};
    },
    refit: (next) => simpleFit(name, next, period),
  };
}

function thetaFit(values: Float64Array, period: number): MethodFit {
  const fit = fitTheta(values, {period});
  return {
    forecast: ({h, levels}) => ({forecast: forecastTheta(fit, {h, levels}), details: thetaDetails(fit)}),
    refit: (next) => thetaFit(next, period),
  };
}

/**
 * `arima`: the member on robust-STL-adjusted data, the naive method when no order fits; refits keep the order and,
 * warm, start from the estimates before.
 */
function arimaFit(values: Float64Array, period: number, order?: ArimaOrder, start?: ArimaFit): MethodFit {
  const member = fitArimaMember(values, stlSeasonalAdjustment(values, period), order, start);
  return {
    forecast: (options) =>
      member
        ? {forecast: member.forecast(options), details: member.details}
        : {forecast: forecastNaive(values, {h: options.h, levels: options.levels}), details: {}},
    refit: (next, {warm}) => arimaFit(next, period, member?.order ?? order, warm ? member?.fit : undefined),
  };
}

/** Shares of ETS, Theta and ARIMA in `ets-theta-arima` (measured on M3, see above). */
const AUTO_WEIGHTS = Float64Array.of(0.45, 0.45, 0.1);

/**
 * `ets-theta-arima` and `combination` around a fitted weighted ETS: one robust STL adjustment of `values` shared
 * by the Theta and ARIMA members. A refit refits the ETS member (warm or not) and keeps the ARIMA order (warm:
 * starting from the ARIMA estimates here).
 */
function combinationFit(
  name: 'ets-theta-arima' | 'combination',
  values: Float64Array,
  period: number,
  ets: MethodFit,
  order?: ArimaOrder,
  start?: ArimaFit,
): MethodFit {
  const adjustment = stlSeasonalAdjustment(values, period);
  const theta = fitTheta(values, {period, adjust: () => adjustment});
  const arima: ArimaMember | null =
    name === 'ets-theta-arima' ? fitArimaMember(values, adjustment, order, start) : null;
  return {
    forecast: (options) => {
      const {h, levels} = options;
      const etsRun = ets.forecast(options);
      const thetaForecast = forecastTheta(theta, {h, levels});
      if (adjustment.seasonal) thetaForecast.method = 'Theta on STL-adjusted data';
      const members = [etsRun.forecast, thetaForecast];
      if (arima) members.push(arima.forecast(options));
      if (name === 'combination') {
        members.push(forecastBenchmarks(values, period, {h, levels}, ['Damped']).get('Damped')!);
      }
      const weights = arima ? AUTO_WEIGHTS : undefined;
      const labels = members.map((m) => m.method);
      const scale = Object.fromEntries(levels.map((l) => [l, combinationIntervalScale(l)]));
      const forecast = averageForecasts(members, `Combination (${labels.join(', ')})`, scale, weights);
      const details = {
        members: labels,
        ...(weights ? {weights: Array.from(weights)} : {}),
        intervalScale: scale,
        ets: etsRun.details,
        theta: thetaDetails(theta),
        ...(arima ? {arima: arima.details} : {}),
      };
      return {forecast, details};
    },
    refit: (next, {warm}) =>
      combinationFit(name, next, period, ets.refit(next, {warm}), arima?.order ?? order, warm ? arima?.fit : undefined),
  };
}

function thetaDetails(fit: ThetaFit): Record<string, unknown> {
  return {alpha: fit.alpha, drift: fit.drift, seasonalAdjustment: fit.adjustment.kind};
}
