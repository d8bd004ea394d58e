import {reseasonalise} from './adjustedForecast.js';
import {inSampleSeasonal} from './inSampleSeasonal.js';
import {akaikeWeights} from './akaikeWeights.js';
import {fitEts, type EtsFit, type EtsFitOptions} from './etsFit.js';
import {forecastEtsMixture, simulateEtsMixture} from './etsMixture.js';
import type {EtsParams, EtsSpec} from './etsModel.js';
import {selectEtsScreened} from './etsScreen.js';
import {selectEts} from './etsSelect.js';
import type {MethodFit, MethodForecastOptions} from './method.js';
import {forecastNaive} from './naive.js';
import {runningTotalIntervals} from './runningTotalIntervals.js';
import type {Forecast} from './model.js';
import {seasonalAdjustment, type SeasonalAdjustment} from './seasonalAdjustment.js';

/** An ETS model class to refit, optionally with estimates to warm-start from. */
interface EtsStart {
  spec: EtsSpec;
  params?: EtsParams;
  initialStates?: Float64Array;
  /** A gradient fit's inverse Hessian (etsFit.ts). */
  inverseHessian?: Float64Array;
}

type EtsOptimizer = NonNullable<EtsFitOptions['optimizer']>;

/** How the weighted selection searches: each search's budget, and whether the pool has ETS(A,Ad,A) and ETS(M,Ad,A). */
export interface EtsSelectionOptions {
  maxEvaluations: number;
  dampedAdditiveSeason: boolean;
}

/** The reference implementation's selection: 2,000 evaluations a search, every model of the stable subset. */
const REFERENCE_SELECTION: EtsSelectionOptions = {maxEvaluations: 2000, dampedAdditiveSeason: true};

/** Weights under this share are dropped from the Akaike-weighted ETS forecast (see akaikeWeights.ts). */
const MIN_WEIGHT = 0.01;
/** Evaluation budget of a warm-started refit (the start is already close to the optimum). */
const WARM_EVALUATIONS = 300;

/**
 * Automatic ETS as a method fit (method.ts): every model of the stable subset is fitted (selectEts); `weighted`
 * averages the forecasts of those with an Akaike weight of at least 1% by weight (the models that cannot reach
 * that cut are given up early, see etsScreen.ts; `selection` sets each search's budget and the pool, by default
 * 2,000 evaluations and every model, as in the reference), otherwise the model with the smallest AICc is kept.
 * Seasonal models only with m ≤ 24 and at least two full years; for longer periods (weekly data, m = 52) the
 * series is seasonally adjusted first (classical decomposition, when the seasonality test finds a pattern) and
 * non-seasonal ETS forecasts the adjusted series.
 * Running totals come from simulated sample paths of the mixture (seeded).
 *
 * A refit keeps the model classes kept here and re-estimates them, warm-started from these estimates when asked
 * (at most 300 evaluations), re-weighted by their AICc on the new stretch of data; when none of them can be
 * fitted there, the full selection runs again. With `optimizer: 'gradient'` (the `auto` forecast) a refit
 * estimates by projected BFGS on the likelihood's gradient (etsFit.ts), a warm refit also from the inverse Hessian
 * the fit before ended with (about 12 evaluations warm, 31 without that curvature, 210 cold from two starts;
 * measured on seasonal refits of the scale benchmark's series, never ending at a lower likelihood), against up to
 * 300 and 2,000 for Nelder-Mead, which it mostly beats on likelihood. The selection on the full series stays
 * with Nelder-Mead: selecting with the gradient fits (better likelihoods) measured worse on M3 (monthly sMAPE
 * 13.60 against 13.48, quarterly 8.79 against 8.75, test/bench/m3.ts).
 *
 * Complexity: up to 15 fits (selection) or one fit per model kept (refit). NaN policy: rejects NaN. When no
 * model can be fitted the fit forecasts with the naive method (`details.fallback`).
 */
export function fitEtsMethod(
  values: Float64Array,
  period: number,
  {
    weighted,
    models,
    optimizer = 'nelder-mead',
    selection = REFERENCE_SELECTION,
  }: {weighted: boolean; models?: EtsStart[]; optimizer?: EtsOptimizer; selection?: EtsSelectionOptions},
): MethodFit {
  const gradient = optimizer === 'gradient';
  const n = values.length;
  const seasonalOk = period <= 24 && n >= 2 * period;
  const sa = period <= 24 ? null : seasonalAdjustment(values, period);
  const y = sa ? sa.adjusted : values;
  const positive = y.every((v) => v > 0);
  const usable = (models ?? []).filter(
    (m) => (m.spec.season === 'N' || seasonalOk) && (m.spec.error === 'A' || positive),
  );
  let fits = usable.flatMap((m) => {
    const {params, initialStates, inverseHessian} = m;
    const warm = params && initialStates ? {start: {params, initialStates, inverseHessian}} : {};
    if (gradient) return fitEts(y, m.spec, {...warm, optimizer}) ?? [];
    return fitEts(y, m.spec, m.params ? {...warm, maxEvaluations: WARM_EVALUATIONS} : warm) ?? [];
  });
  if (fits.length === 0) {
    const options = {period: sa ? 1 : period, seasonal: !sa && seasonalOk};
    // Weighted: only the models that can reach the 1% cut are fitted to the end (etsScreen.ts).
    fits = weighted
      ? selectEtsScreened(y, {...options, ...selection})
      : (selectEts(y, options)?.fits ?? []);
  }
  if (fits.length === 0) {
    // Nothing to keep: a refit tries the same models again, as given (or selects, when none were given).
    return {
      forecast: ({h, levels}) => ({forecast: forecastNaive(values, {h, levels}), details: {fallback: 'naive'}}),
      refit: (next) => fitEtsMethod(next, period, {weighted, models, optimizer, selection}),
    };
  }
  const criteria = fits.map((f) => f.aicc);
  // Not weighted: the first model with the smallest AICc, as selectEts picks it.
  const all = weighted
    ? akaikeWeights(criteria, MIN_WEIGHT)
    : Float64Array.from(criteria, (_, i) => (i === criteria.indexOf(Math.min(...criteria)) ? 1 : 0));
  const kept = fits.filter((_, i) => all[i] > 0);
  const weights = all.filter((w) => w > 0);
  const details = {
    models: kept.map((f, i) => ({model: f.method, weight: weights[i], params: f.params, aicc: f.aicc})),
    ...(sa ? {seasonalAdjustment: sa.kind} : {}),
  };
  const starts = (warm: boolean): EtsStart[] =>
    kept.map((f) =>
      warm
        ? {spec: f.spec, params: f.params, initialStates: f.initialStates, inverseHessian: f.inverseHessian}
        : {spec: f.spec},
    );
  return {
    forecast: (options) => ({forecast: forecastKept(values, kept, weights, sa, options), details}),
    refit: (next, {warm}) =>
      fitEtsMethod(next, period, {weighted, models: starts(warm), optimizer, selection}),
  };
}

/** The weighted mixture's forecast (reseasonalised after a seasonal adjustment), with running totals if asked. */
function forecastKept(
  values: Float64Array,
  kept: EtsFit[],
  weights: Float64Array,
  sa: SeasonalAdjustment | null,
  {h, levels, runningTotals = true}: MethodForecastOptions,
): Forecast {
  const mixture = forecastEtsMixture(kept, weights, {h, levels});
  // In-sample one-step forecasts of the mixture (forecast reconciliation estimates its error covariance from them).
  const fitted = new Float64Array(kept[0].fitted.length);
  kept.forEach((f, k) => {
    for (let t = 0; t < fitted.length; t++) fitted[t] += weights[k] * f.fitted[t];
  });
  mixture.fitted = fitted;
  if (!sa) {
    if (runningTotals) {
      const paths = simulateEtsMixture(kept, weights, {h});
      mixture.runningTotals = runningTotalIntervals(paths, h, mixture.levels);
    }
    return mixture;
  }
  const method = sa.seasonal ? `${mixture.method} on seasonally adjusted data` : mixture.method;
  const forecast = reseasonalise(mixture, sa, method);
  forecast.fitted = inSampleSeasonal(fitted, values, sa);
  if (runningTotals) {
    const paths = simulateEtsMixture(kept, weights, {h});
    const factors = sa.ahead(h);
    for (let i = 0; i < paths.length; i++) {
      const t = i % h;
      if (sa.kind === 'multiplicative') paths[i] *= factors[t];
      else if (sa.kind === 'additive') paths[i] += factors[t];
    }
    forecast.runningTotals = runningTotalIntervals(paths, h, forecast.levels);
  }
  return forecast;
}
