import type {EtsParams, EtsSpec} from './etsModel.js';

/**
 * The ETS recursions over a series: one-step forecasts, errors and state updates from given parameters and
 * initial states, returning the likelihood criterion of the reference implementation,
 * L = n·log(Σ eₜ²) + 2·Σ log|ŷₜ| (the second term for multiplicative errors only), which is −2·log-likelihood
 * up to a constant, with eₜ = yₜ − ŷₜ (additive error) or (yₜ − ŷₜ)/ŷₜ (multiplicative error).
 *
 * The state updates are written in "error-correction" form and do not depend on the error type:
 *   q = l + φb;  l' = q + α(p − q) with p = y − s or y / s;  b' = φb + (β/α)(l' − l − φb);
 *   s' = s + γ(y − q − s) (additive) or s + γ(y/q − s) (multiplicative), s being the state m periods back.
 * States are kept as [l, b?, s₀ … s_{m−1}] with s₀ the most recent seasonal state.
 *
 * Reference: Hyndman et al. (2008), Forecasting with Exponential Smoothing, Tables 2.2–2.3; the numeric
 * guards (1e10 for divisions by near-zero states) follow the reference implementation.
 *
 * Complexity: O(n) time (a ring buffer holds the seasonal states), O(n) memory for errors and fitted values.
 * NaN policy: rejects NaN (NaN in y gives a NaN criterion, which callers treat as infeasible).
 */
export interface EtsFilterResult {
  /** n·log(SSE) [+ 2Σlog|ŷ|]: −2·log-likelihood up to a constant, as reported by the reference. */
  lik: number;
  /** Mean squared one-step error yₜ − ŷₜ (on the data scale, whatever the error type). */
  mse: number;
  /** Errors: yₜ − ŷₜ (A) or (yₜ − ŷₜ)/ŷₜ (M). */
  residuals: Float64Array;
  fitted: Float64Array;
  /** State vector after the last observation, same layout as the initial states. */
  finalStates: Float64Array;
}

const TOL = 1e-10;
const HUGE = 1e10;

export function etsFilter(
  y: Float64Array,
  spec: EtsSpec,
  params: EtsParams,
  initialStates: Float64Array,
): EtsFilterResult {
  const residuals = new Float64Array(y.length);
  const fitted = new Float64Array(y.length);
  const finalStates = new Float64Array(initialStates.length);
  const {lik, mse} = etsRecurse(y, spec, params, initialStates, {residuals, fitted, finalStates, mse: true});
  return {lik, mse, residuals, fitted, finalStates};
}

/**
 * The same recursions without allocation, for optimisers: writes into the optional buffers and returns the
 * criterion and, when `mse` is asked for, the one-step mean squared error (NaN otherwise). Work that only some
 * forms need (the log term, the running MSE, the output buffers) is skipped when not needed.
 *
 * `bound` (an optimiser's rejection level, see nelderMead.ts): with additive errors the criterion n·log(Σ e²)
 * only grows along the series, so the recursion stops once it has clearly passed `bound` and returns Infinity.
 */
export function etsRecurse(
  y: Float64Array,
  spec: EtsSpec,
  params: EtsParams,
  initialStates: Float64Array,
  {
    residuals = null,
    fitted = null,
    finalStates = null,
    seasonBuffer = new Float64Array(Math.max(1, spec.period)),
    mse: wantMse = false,
    bound = Infinity,
  }: {
    residuals?: Float64Array | null;
    fitted?: Float64Array | null;
    finalStates?: Float64Array | null;
    seasonBuffer?: Float64Array;
    mse?: boolean;
    bound?: number;
  } = {},
): {lik: number; mse: number} {
  const n = y.length;
  const hasTrend = spec.trend !== 'N';
  const season = spec.season;
  const m = season === 'N' ? 1 : spec.period;
  const multError = spec.error === 'M';
  const alpha = params.alpha;
  const beta = hasTrend ? params.beta : 0;
  const gamma = season === 'N' ? 0 : params.gamma;
  const phi = hasTrend && spec.damped ? params.phi : 1;
  const ratio = beta / alpha;
  let l = initialStates[0];
  let b = hasTrend ? initialStates[1] : 0;
  const first = hasTrend ? 2 : 1;
  const s = seasonBuffer;
  // Ring buffer: s[(head + j) % m] holds seasonal state s_j (s_0 most recent).
  let head = 0;
  if (season !== 'N') for (let j = 0; j < m; j++) s[j] = initialStates[first + j];
  let sse = 0;
  // Σ log|ŷ| is kept as a running product of the |ŷ| within 1e±100, folded into its logarithm once it leaves that
  // range (so it can neither overflow nor underflow): one logarithm every few steps instead of one per step, the
  // sum differing only by rounding. Zero, NaN and extreme ŷ go straight to the sum, as before.
  let logSum = 0;
  let product = 1;
  let mse = 0;
  const keep = residuals !== null || fitted !== null;
  // Σ e² beyond which n·log(Σ e²) is past `bound` (with a relative margin of 1e-12, far above rounding).
  const sseLimit = !multError && !keep && finalStates === null ? Math.exp(bound / n) * (1 + 1e-12) : Infinity;
  for (let t = 0; t < n; t++) {
    const phib = phi * b;
    const q = l + phib;
    const yt = y[t];
    let f: number;
    let lNew: number;
    if (season === 'N') {
      f = q;
      lNew = q + alpha * (yt - q);
    } else {
      const oldIdx = head === 0 ? m - 1 : head - 1;
      const old = s[oldIdx];
      let target: number;
      if (season === 'A') {
        f = q + old;
        lNew = q + alpha * (yt - old - q);
        target = yt - q;
      } else {
        f = q * old;
        lNew = q + alpha * ((Math.abs(old) < TOL ? HUGE : yt / old) - q);
        target = Math.abs(q) < TOL ? HUGE : yt / q;
      }
      head = oldIdx;
      s[head] = old + gamma * (target - old);
    }
    const e = multError ? (yt - f) / f : yt - f;
    if (keep) {
      if (residuals) residuals[t] = e;
      if (fitted) fitted[t] = f;
    }
    if (wantMse) {
      const d = yt - f;
      mse = (mse * t + d * d) / (t + 1);
    }
    if (hasTrend) b = phib + ratio * (lNew - l - phib);
    l = lNew;
    sse += e * e;
    if (sse > sseLimit) return {lik: Infinity, mse: NaN};
    if (multError) {
      const size = Math.abs(f);
      if (size < 1e100 && size > 1e-100) {
        product *= size;
        if (!(product < 1e100 && product > 1e-100)) {
          logSum += Math.log(product);
          product = 1;
        }
      } else logSum += Math.log(size);
    }
  }
  logSum += Math.log(product);
  if (finalStates) {
    finalStates[0] = l;
    if (hasTrend) finalStates[1] = b;
    if (season !== 'N') for (let j = 0; j < m; j++) finalStates[first + j] = s[(head + j) % m];
  }
  let lik = n * Math.log(sse);
  if (multError) lik += 2 * logSum;
  return {lik, mse: wantMse ? mse : NaN};
}
