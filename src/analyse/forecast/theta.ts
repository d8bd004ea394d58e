import {fitEts} from './etsFit.js';
import {checkForecastOptions, type Forecast, type ForecastOptions} from './model.js';
import {normalIntervals} from './normalIntervals.js';
import {seasonalAdjustment, type SeasonalAdjustment} from './seasonalAdjustment.js';
import {inSampleSeasonal} from './inSampleSeasonal.js';

/**
 * The Theta method as simple exponential smoothing with drift: on the (classically, multiplicatively)
 * seasonally adjusted series x, fit SES by least squares (α and initial level), add half the slope b of a
 * least-squares line through x: ŷ_{n+h} = ℓ_n + (b/2)·(h − 1 + (1 − (1 − α)ⁿ)/α), then reseasonalise.
 * Intervals: σ·√(1 + (h − 1)α²) around the forecast, σ² the SES residual variance on the adjusted scale; running
 * totals of the forecasts get σ²·Σ_{i≤k}(1 + α(k − i))² from the same error model.
 *
 * Reference: V. Assimakopoulos and K. Nikolopoulos (2000), The theta model: a decomposition approach to
 * forecasting, IJF 16, 521–530; R. J. Hyndman and B. Billah (2003), Unmasking the Theta method, IJF 19,
 * 287–290; the same steps as R's forecast::thetaf (equal within 1e-6, see the tests).
 *
 * `adjust` replaces the classical seasonal adjustment (the combinations use robust STL, see
 * stlSeasonalAdjustment.ts).
 *
 * Complexity: O(E·n) for the SES fit. NaN policy: rejects NaN.
 */
export interface ThetaFit {
  method: 'Theta';
  alpha: number;
  /** Half the least-squares slope (drift per period). */
  drift: number;
  level: number;
  sigma2: number;
  n: number;
  /** The seasonal adjustment applied before smoothing (kind 'none' when not seasonal). */
  adjustment: SeasonalAdjustment;
  fitted: Float64Array;
  residuals: Float64Array;
  /**
   * In-sample one-step Theta forecasts on the original scale: the SES forecast plus the drift term the forecast
   * from that origin would carry, ℓₜ₋₁ + b·(1 − (1 − α)ᵗ)/α, with the in-sample seasonal figure put back.
   */
  oneStep: Float64Array;
}

export function fitTheta(
  values: Float64Array,
  {
    period,
    adjust = seasonalAdjustment,
  }: {period: number; adjust?: (values: Float64Array, period: number) => SeasonalAdjustment},
): ThetaFit {
  const n = values.length;
  const sa = adjust(values, period);
  const x = sa.adjusted;
  const ses = fitEts(x, {error: 'A', trend: 'N', damped: false, season: 'N', period: 1}, {optCrit: 'mse'});
  if (!ses) throw new RangeError('theta needs at least four values');
  let mt = 0;
  let mx = 0;
  for (let t = 0; t < n; t++) {
    mt += t;
    mx += x[t];
  }
  mt /= n;
  mx /= n;
  let sxy = 0;
  let sxx = 0;
  for (let t = 0; t < n; t++) {
    sxy += (t - mt) * (x[t] - mx);
    sxx += (t - mt) ** 2;
  }
  const drift = sxy / sxx / 2;
  const alpha = ses.params.alpha;
  const oneStep = inSampleSeasonal(
    Float64Array.from(ses.fitted, (f, t) => f + (drift * (1 - (1 - alpha) ** t)) / alpha),
    values,
    sa,
  );
  return {
    method: 'Theta',
    alpha: ses.params.alpha,
    drift,
    level: ses.finalStates[0],
    sigma2: ses.sigma2,
    n,
    adjustment: sa,
    fitted: ses.fitted,
    residuals: ses.residuals,
    oneStep,
  };
}

export function forecastTheta(fit: ThetaFit, options: ForecastOptions): Forecast & {variance: Float64Array} {
  const levels = checkForecastOptions(options);
  const {h} = options;
  const {alpha, drift, level, n} = fit;
  const adjusted = new Float64Array(h);
  const variance = new Float64Array(h);
  const offset = (1 - (1 - alpha) ** n) / alpha;
  for (let i = 0; i < h; i++) {
    adjusted[i] = level + drift * (i + offset);
    variance[i] = fit.sigma2 * (i * alpha * alpha + 1);
  }
  const mean = fit.adjustment.restore(adjusted);
  // Running totals: with forecast errors e_j = ε_j + α·Σ_{i<j} ε_i, Var(e_1 + … + e_k) = σ²·Σ_{i≤k} (1 + α(k − i))²
  // (on the adjusted scale, like the per-period intervals above).
  const totalMean = new Float64Array(h);
  const totalVariance = new Float64Array(h);
  let running = 0;
  for (let k = 0; k < h; k++) {
    running += mean[k];
    totalMean[k] = running;
    let v = 0;
    for (let i = 0; i <= k; i++) v += (1 + alpha * (k - i)) ** 2;
    totalVariance[k] = fit.sigma2 * v;
  }
  const runningTotals = normalIntervals(totalMean, totalVariance, levels);
  const fitted = fit.oneStep;
  return {method: 'Theta', mean, variance, levels, ...normalIntervals(mean, variance, levels), runningTotals, fitted};
}
