import {nelderMead, warmSteps} from '../numeric/nelderMead.js';
import {rootsWithinUnitCircle} from '../numeric/rootsWithinUnitCircle.js';
import {checkForecastOptions, type Forecast, type ForecastOptions} from './model.js';
import {normalIntervals} from './normalIntervals.js';

/**
 * ARIMA(p, d, q) with d ∈ {0, 1}, fitted by conditional sum of squares (CSS). With w the series (d = 0) or its
 * first differences (d = 1) and μ the mean (d = 0) or the drift per period (d = 1; 0 without a constant):
 *
 *   wₜ − μ = φ₁(wₜ₋₁ − μ) + … + φₚ(wₜ₋ₚ − μ) + eₜ + θ₁eₜ₋₁ + … + θ_q eₜ₋_q,
 *
 * residuals eₜ computed from t = p with earlier e set to 0; the estimates minimise Σ eₜ² over the n_w − p
 * residuals, σ² = that sum / (n_w − p). The optimiser (Nelder-Mead) works on the standardised w and only inside
 * the stationary and invertible region, with a margin: every root of 1 − φ₁z − … − φₚzᵖ and of
 * 1 + θ₁z + … + θ_q z^q at least 1/0.95 from the origin.
 *
 * Forecasts continue the recursion with future errors 0 (and cumulate for d = 1); the forecast variance is
 * σ²·Σ_{j<h} Ψⱼ², Ψ the ψ-weights of the ARMA part (cumulated for d = 1), and running totals of the forecasts get
 * σ²·Σ_{j<k} Cⱼ², C the cumulated Ψ. Intervals are normal.
 *
 * Why: a third, differently built forecaster for the combination (see methods.ts): the mean of ETS, ARIMA and
 * Theta is a well-known strong benchmark on the M3 data.
 * Reference: G. E. P. Box and G. M. Jenkins (1970), Time Series Analysis: Forecasting and Control, ch. 5 and 7
 * (ψ-weights, conditional least squares); the CSS objective and σ² as R's stats::arima(method = "CSS")
 * (see the tests and test/reference/arima.R).
 *
 * Complexity: O(E·n·(p + q)) for E objective evaluations. NaN policy: rejects NaN.
 */
export interface ArimaOrder {
  p: number;
  d: 0 | 1;
  q: number;
  /** Mean (d = 0) or drift (d = 1) estimated. */
  constant: boolean;
}

export interface ArimaFit {
  method: string;
  order: ArimaOrder;
  ar: Float64Array;
  ma: Float64Array;
  /** μ: mean of w (d = 0) or drift per period (d = 1); 0 without a constant. */
  constant: number;
  sigma2: number;
  /** Number of residuals in the sum of squares (n_w − p). */
  residualCount: number;
  /** Last value of the series (d = 1), the w values and residuals the forecast recursion starts from. */
  last: number;
  w: Float64Array;
  residuals: Float64Array;
}

/** The model's name, e.g. `ARIMA(1,1,0) with drift`. */
function arimaName({p, d, q, constant}: ArimaOrder): string {
  const what = d === 1 ? 'drift' : 'mean';
  return `ARIMA(${p},${d},${q})${constant ? ` with ${what}` : ''}`;
}

/**
 * With `start` (a fit of the same order to a shorter stretch of the same series, e.g. the back-test origin before)
 * the search begins at its estimates with a small simplex (warmSteps in nelderMead.ts) instead of at zero with
 * the usual step; an inadmissible start is ignored.
 */
export function fitArima(values: Float64Array, order: ArimaOrder, start?: ArimaFit): ArimaFit | null {
  const {p, d, q, constant} = order;
  for (const v of values) if (!Number.isFinite(v)) throw new RangeError('arima rejects NaN');
  if (p < 0 || q < 0) throw new RangeError(`invalid order: ${arimaName(order)}`);
  const w = d === 1 ? values.subarray(1).map((v, t) => v - values[t]) : Float64Array.from(values);
  const count = w.length - p;
  if (count < p + q + (constant ? 1 : 0) + 2) return null;
  let centre = 0;
  for (const v of w) centre += v;
  centre /= w.length;
  let spread = 0;
  for (const v of w) spread += (v - centre) ** 2;
  spread = Math.sqrt(spread / w.length);
  if (!(spread > 0)) {
    // The squares underflowed (deviations below about 1e-162): the same spread from deviations scaled by the largest.
    let peak = 0;
    for (const v of w) peak = Math.max(peak, Math.abs(v - centre));
    let scaled = 0;
    for (const v of w) scaled += peak > 0 ? ((v - centre) / peak) ** 2 : 0;
    spread = peak * Math.sqrt(scaled / w.length);
  }
  if (!(spread > 0)) spread = Math.abs(centre) || 1;
  // Standardised w, so that every parameter the optimiser sees is of order one.
  const z = w.map((v) => (v - centre) / spread);
  const e = new Float64Array(w.length);
  const arPoly = new Float64Array(p + 1);
  const maPoly = new Float64Array(q + 1);
  const shift = constant ? 0 : -centre / spread;
  // The sum of squares first, stopping once past the optimiser's bound (nelderMead.ts); admissibility only matters
  // for a value below it.
  const objective = (x: Float64Array, bound: number): number => {
    const ss = sumOfSquares(z, x, p, q, constant ? x[p + q] : shift, e, bound * (1 + 1e-12));
    return ss >= bound || admissible(x, p, q, arPoly, maPoly) ? ss : Infinity;
  };
  const k = p + q + (constant ? 1 : 0);
  const x0 = new Float64Array(k);
  const x = k === 0 ? x0 : search(objective, x0, warmVector(start, order, centre, spread), 200 * k);
  const mu = constant ? x[p + q] : shift;
  const css = sumOfSquares(z, x, p, q, mu, e) * spread * spread;
  return {
    method: arimaName(order),
    order,
    ar: x.slice(0, p),
    ma: x.slice(p, p + q),
    constant: constant ? centre + spread * mu : 0,
    sigma2: css / count,
    residualCount: count,
    last: values[values.length - 1],
    w,
    residuals: e.map((v) => v * spread),
  };
}

/** Nelder-Mead from the warm start when it is feasible, else from zero. */
function search(
  objective: (x: Float64Array, bound: number) => number,
  cold: Float64Array,
  warm: Float64Array | null,
  maxEvaluations: number,
): Float64Array {
  if (warm && Number.isFinite(objective(warm, Infinity))) {
    return nelderMead(objective, warm, {maxEvaluations, steps: warmSteps(warm)}).x;
  }
  return nelderMead(objective, cold, {maxEvaluations}).x;
}

/** A fit's estimates as the optimiser's vector for a series standardised by `centre` and `spread`. */
function warmVector(
  start: ArimaFit | undefined,
  order: ArimaOrder,
  centre: number,
  spread: number,
): Float64Array | null {
  const same = start && start.order.p === order.p && start.order.q === order.q && start.order.d === order.d;
  if (!start || !same || start.order.constant !== order.constant) return null;
  const x = [...start.ar, ...start.ma];
  if (order.constant) x.push((start.constant - centre) / spread);
  return Float64Array.from(x);
}

/**
 * Σ eₜ² for t ≥ p of the ARMA recursion on z with mean mu; residuals written to e (0 before p). Stops with
 * Infinity once the sum passes `limit` (it only grows).
 */
function sumOfSquares(
  z: Float64Array,
  x: Float64Array,
  p: number,
  q: number,
  mu: number,
  e: Float64Array,
  limit = Infinity,
): number {
  let ss = 0;
  e.fill(0, 0, p);
  for (let t = p; t < z.length; t++) {
    let r = z[t] - mu;
    for (let i = 1; i <= p; i++) r -= x[i - 1] * (z[t - i] - mu);
    for (let j = 1; j <= q && t - j >= p; j++) r -= x[p + j - 1] * e[t - j];
    e[t] = r;
    ss += r * r;
    if (ss > limit) return Infinity;
  }
  return ss;
}

/**
 * Reciprocal roots must stay within 0.95 of the origin: near-unit roots make the fit a hidden extra difference
 * (or an MA term cancelling one) and long-horizon forecasts unstable. Our margin, measured on M3 (methods.ts).
 */
const ROOT_SLACK = -0.05;

/** AR part stationary and MA part invertible: the reversed polynomials have their roots inside the unit circle. */
function admissible(x: Float64Array, p: number, q: number, ar: Float64Array, ma: Float64Array): boolean {
  if (p > 0) {
    ar[p] = 1;
    for (let i = 1; i <= p; i++) ar[p - i] = -x[i - 1];
    if (!rootsWithinUnitCircle(ar, ROOT_SLACK)) return false;
  }
  if (q > 0) {
    ma[q] = 1;
    for (let j = 1; j <= q; j++) ma[q - j] = x[p + j - 1];
    if (!rootsWithinUnitCircle(ma, ROOT_SLACK)) return false;
  }
  return true;
}

/** Small-sample corrected Akaike criterion of a CSS fit: n·log(σ²) + 2k + 2k(k + 1)/(n − k − 1), k counting σ². */
export function arimaAicc(fit: ArimaFit): number {
  const n = fit.residualCount;
  const k = fit.order.p + fit.order.q + (fit.order.constant ? 1 : 0) + 1;
  if (n - k - 1 <= 0 || !(fit.sigma2 > 0)) return Infinity;
  return n * Math.log(fit.sigma2) + 2 * k + (2 * k * (k + 1)) / (n - k - 1);
}

export function forecastArima(fit: ArimaFit, options: ForecastOptions): Forecast {
  const levels = checkForecastOptions(options);
  const {h} = options;
  const {ar, ma, w, residuals, constant: mu} = fit;
  const {p, q, d} = fit.order;
  const nw = w.length;
  const path = new Float64Array(nw + h);
  path.set(w);
  const shocks = new Float64Array(nw + h);
  shocks.set(residuals);
  const mean = new Float64Array(h);
  let level = fit.last;
  for (let k = 0; k < h; k++) {
    const t = nw + k;
    let v = mu;
    for (let i = 1; i <= p; i++) v += ar[i - 1] * (path[t - i] - mu);
    for (let j = 1; j <= q; j++) v += ma[j - 1] * shocks[t - j];
    path[t] = v;
    level = d === 1 ? level + v : v;
    mean[k] = level;
  }
  const weights = arimaErrorWeights(fit, h);
  const variance = new Float64Array(h);
  let sum = 0;
  for (let j = 0; j < h; j++) variance[j] = fit.sigma2 * (sum += weights[j] * weights[j]);
  return {
    method: fit.method,
    mean,
    levels,
    ...normalIntervals(mean, variance, levels),
    runningTotals: totalsInterval(weights, fit.sigma2, mean, levels),
  };
}

/**
 * Normal intervals for the running totals of a forecast path `mean` of the fit, the forecast errors weighted per
 * step by `scales` when given (seasonal factors of a multiplicatively reseasonalised forecast).
 */
export function arimaRunningTotals(
  fit: ArimaFit,
  mean: Float64Array,
  levels: number[],
  scales?: Float64Array,
): {lower: Map<number, Float64Array>; upper: Map<number, Float64Array>} {
  return totalsInterval(arimaErrorWeights(fit, mean.length), fit.sigma2, mean, levels, scales);
}

/** {@link arimaRunningTotals} from error weights already worked out. */
function totalsInterval(
  weights: Float64Array,
  sigma2: number,
  mean: Float64Array,
  levels: number[],
  scales?: Float64Array,
): {lower: Map<number, Float64Array>; upper: Map<number, Float64Array>} {
  const totals = new Float64Array(mean.length);
  let running = 0;
  for (let k = 0; k < mean.length; k++) totals[k] = running += mean[k];
  return normalIntervals(totals, runningTotalVariance(weights, sigma2, scales), levels);
}

/**
 * Weights Ψ₀ … Ψ_{h−1} of the future shocks in the forecast errors: e_{n+k} = Σ_{j<k} Ψⱼ a_{n+k−j}, the
 * ψ-weights of the ARMA part (ψ₀ = 1, ψⱼ = θⱼ + Σᵢ φᵢψⱼ₋ᵢ), cumulated for d = 1.
 */
export function arimaErrorWeights(fit: ArimaFit, h: number): Float64Array {
  const {ar, ma} = fit;
  const {p, q, d} = fit.order;
  const psi = new Float64Array(h);
  const out = new Float64Array(h);
  let cumulated = 0;
  for (let j = 0; j < h; j++) {
    let v = j === 0 ? 1 : j <= q ? ma[j - 1] : 0;
    for (let i = 1; i <= Math.min(j, p); i++) v += ar[i - 1] * psi[j - i];
    psi[j] = v;
    cumulated += v;
    out[j] = d === 1 ? cumulated : v;
  }
  return out;
}

/**
 * Variance of the running totals of forecast errors, Σ_{k≤K} sₖ·e_{n+k} for K = 1 … h, with error weights Ψ
 * (arimaErrorWeights) and optional per-step scales s (seasonal factors, when the forecast is reseasonalised
 * multiplicatively): σ²·Σ_{i≤K} (Σ_{i≤k≤K} sₖΨ_{k−i})².
 * Complexity: O(h³), h is a forecast horizon.
 */
export function runningTotalVariance(weights: Float64Array, sigma2: number, scales?: Float64Array): Float64Array {
  const h = weights.length;
  const out = new Float64Array(h);
  for (let last = 0; last < h; last++) {
    let v = 0;
    for (let i = 0; i <= last; i++) {
      let c = 0;
      for (let k = i; k <= last; k++) c += (scales ? scales[k] : 1) * weights[k - i];
      v += c * c;
    }
    out[last] = sigma2 * v;
  }
  return out;
}
