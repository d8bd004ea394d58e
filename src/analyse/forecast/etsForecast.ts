import type {EtsFit} from './etsFit.js';
import {checkForecastOptions, type Forecast, type ForecastOptions} from './model.js';
import {normalIntervals} from './normalIntervals.js';

/**
 * ETS point forecasts, forecast variances and normal prediction intervals for h periods ahead.
 *
 * Class 1 (additive error, linear) and class 2 (multiplicative error, additive or no trend and season) have
 * exact variances: with cⱼ = α + β(φ + … + φʲ) + γ·[j ≡ 0 mod m], class 1 gives σ²(1 + Σ_{j<h} cⱼ²) and class 2
 * (1 + σ²)θ_h − μ_h² with θ₁ = μ₁², θ_h = μ_h² + σ² Σ_{j<h} cⱼ² θ_{h−j}. Class 3 (multiplicative error and
 * season) uses the moment recursions of Hyndman et al. (2005), in which the forecast mean itself carries a
 * small σ² correction.
 *
 * Reference: R. J. Hyndman, A. B. Koehler, J. K. Ord and R. D. Snyder (2005), Prediction intervals for
 * exponential smoothing using two new classes of state space models, Journal of Forecasting 24, 17–37;
 * Hyndman et al. (2008), ch. 6.
 *
 * Complexity: O(h²) for classes 1–2; O(h·(km)²) for class 3 (k = 1 or 2 level/trend states), or O(h·km) when no
 * level is asked for: the class 3 mean does not need the variance recursion, which is then skipped (variance NaN).
 * NaN policy: NaN in the fit → NaN out.
 */
export function forecastEts(fit: EtsFit, options: ForecastOptions): Forecast & {variance: Float64Array} {
  const levels = checkForecastOptions(options);
  const {h} = options;
  const {mean, variance} =
    fit.spec.error === 'M' && fit.spec.season === 'M'
      ? etsClass3Moments(fit, h, levels.length > 0)
      : etsLinearMoments(fit, h);
  return {method: fit.method, mean, variance, levels, ...normalIntervals(mean, variance, levels)};
}

/** Means and variances for classes 1 and 2. */
function etsLinearMoments(fit: EtsFit, h: number): {mean: Float64Array; variance: Float64Array} {
  const {spec, params, finalStates: x, sigma2} = fit;
  const hasTrend = spec.trend !== 'N';
  const phi = hasTrend && spec.damped ? params.phi : 1;
  const m = spec.season === 'N' ? 1 : spec.period;
  const first = hasTrend ? 2 : 1;
  const mean = new Float64Array(h);
  const c = new Float64Array(h);
  let phiSum = 0;
  let phiPow = 1;
  for (let i = 0; i < h; i++) {
    phiPow *= phi;
    phiSum += phiPow;
    const trendPart = hasTrend ? phiSum * x[1] : 0;
    const s = spec.season === 'N' ? 0 : x[first + ((((m - 1 - i) % m) + m) % m)];
    mean[i] = spec.season === 'M' ? (x[0] + trendPart) * s : x[0] + trendPart + s;
    const seasonTerm = spec.season !== 'N' && (i + 1) % m === 0 ? params.gamma : 0;
    c[i] = params.alpha + (hasTrend ? params.beta * phiSum : 0) + seasonTerm;
  }
  const variance = new Float64Array(h);
  if (spec.error === 'A') {
    let acc = 0;
    for (let i = 0; i < h; i++) {
      variance[i] = sigma2 * (1 + acc);
      acc += c[i] * c[i];
    }
  } else {
    const theta = new Float64Array(h);
    for (let j = 0; j < h; j++) {
      let acc = 0;
      for (let i = 0; i < j; i++) acc += c[i] * c[i] * theta[j - 1 - i];
      theta[j] = mean[j] * mean[j] + sigma2 * acc;
      variance[j] = (1 + sigma2) * theta[j] - mean[j] * mean[j];
    }
  }
  return {mean, variance};
}

/** Square matrices as row-major Float64Array of size d·d. */
function mul(a: Float64Array, b: Float64Array, d: number): Float64Array {
  const out = new Float64Array(d * d);
  for (let i = 0; i < d; i++) {
    for (let k = 0; k < d; k++) {
      const v = a[i * d + k];
      if (v === 0) continue;
      for (let j = 0; j < d; j++) out[i * d + j] += v * b[k * d + j];
    }
  }
  return out;
}

/** The non-zero entries of each row of a square row-major matrix (columns ascending): the factors of class 3. */
interface SparseRows {
  start: Int32Array;
  column: Int32Array;
  value: Float64Array;
}

function sparseRows(b: Float64Array, d: number): SparseRows {
  const start = new Int32Array(d + 1);
  const column: number[] = [];
  const value: number[] = [];
  for (let j = 0; j < d; j++) {
    for (let k = 0; k < d; k++) {
      if (b[j * d + k] === 0) continue;
      column.push(k);
      value.push(b[j * d + k]);
    }
    start[j + 1] = column.length;
  }
  return {start, column: Int32Array.from(column), value: Float64Array.from(value)};
}

/**
 * A·Bᵀ for a sparse B: each sum runs over the columns where B's row is not zero, in ascending order, so it adds
 * the same non-zero terms in the same order as the dense product (the factors have at most four a row).
 */
function mulT(a: Float64Array, b: SparseRows, d: number): Float64Array {
  const out = new Float64Array(d * d);
  const {start, column, value} = b;
  for (let i = 0; i < d; i++) {
    const row = i * d;
    for (let j = 0; j < d; j++) {
      let s = 0;
      for (let e = start[j]; e < start[j + 1]; e++) s += a[row + column[e]] * value[e];
      out[row + j] = s;
    }
  }
  return out;
}

/** A ⊗ B for A (ra×ra) and B (rb×rb), both row-major. */
function kron(a: Float64Array, ra: number, b: Float64Array, rb: number): Float64Array {
  const d = ra * rb;
  const out = new Float64Array(d * d);
  for (let i = 0; i < ra; i++) {
    for (let j = 0; j < ra; j++) {
      for (let k = 0; k < rb; k++) {
        for (let l = 0; l < rb; l++) out[(i * rb + k) * d + j * rb + l] = a[i * ra + j] * b[k * rb + l];
      }
    }
  }
  return out;
}

/**
 * Class 3 moments. The state splits into a level/trend block (k = 1 or 2) and the m seasonal states;
 * M_h = E[(level/trend) × seasonalᵀ] and V_h = Var(vec M_h) follow Hyndman et al. (2005), §4.
 */
function etsClass3Moments(
  fit: EtsFit,
  h: number,
  withVariance: boolean,
): {mean: Float64Array; variance: Float64Array} {
  const {spec, params, finalStates: x, sigma2} = fit;
  const k = spec.trend === 'N' ? 1 : 2;
  const m = spec.period;
  const phi = spec.damped ? params.phi : 1;
  const f1 = k === 1 ? Float64Array.of(1) : Float64Array.of(1, 1, 0, phi);
  const {alpha, beta} = params;
  const g1 = k === 1 ? Float64Array.of(alpha) : Float64Array.of(alpha, alpha, beta, beta);
  const f2 = new Float64Array(m * m);
  f2[m - 1] = 1;
  for (let i = 1; i < m; i++) f2[i * m + i - 1] = 1;
  const g2 = new Float64Array(m * m);
  g2[m - 1] = params.gamma;
  const d = k * m;
  const f21 = kron(f2, m, f1, k);
  const g21 = kron(g2, m, g1, k);
  const kk = kron(g2, m, f1, k);
  const t = kron(f2, m, g1, k);
  for (let i = 0; i < d * d; i++) kk[i] += t[i];
  const [f21Rows, g21Rows, kkRows] = [sparseRows(f21, d), sparseRows(g21, d), sparseRows(kk, d)];
  // M (k × m, row-major) = [l, b]ᵀ · seasonalᵀ.
  let mh = new Float64Array(k * m);
  for (let r = 0; r < k; r++) for (let c = 0; c < m; c++) mh[r * m + c] = x[r] * x[k + c];
  let vh = new Float64Array(d * d);
  const mean = new Float64Array(h);
  const variance = new Float64Array(h);
  for (let step = 0; step < h; step++) {
    let mu = 0;
    for (let r = 0; r < k; r++) mu += mh[r * m + m - 1];
    // H21 picks vec positions of column m − 1 (all k rows).
    let hv = 0;
    for (let a = 0; a < k; a++) for (let b = 0; b < k; b++) hv += vh[((m - 1) * k + a) * d + (m - 1) * k + b];
    mean[step] = mu;
    if (!withVariance) {
      variance[step] = NaN;
    } else {
      variance[step] = (1 + sigma2) * hv + sigma2 * mu * mu;
      // vec(M) in column-major order: index r + c·k.
      const vec = new Float64Array(d);
      for (let r = 0; r < k; r++) for (let c = 0; c < m; c++) vec[r + c * k] = mh[r * m + c];
      const outer = new Float64Array(d * d);
      for (let i = 0; i < d; i++) for (let j = 0; j < d; j++) outer[i * d + j] = vec[i] * vec[j];
      const fv = mul(f21, vh, d);
      const gv = mul(g21, vh, d);
      const a1 = mulT(fv, f21Rows, d);
      const a2 = mulT(fv, g21Rows, d);
      const a3 = mulT(gv, f21Rows, d);
      const inner = new Float64Array(d * d);
      const inner2 = new Float64Array(d * d);
      for (let i = 0; i < d * d; i++) {
        inner[i] = vh[i] + outer[i];
        inner2[i] = 3 * vh[i] + 2 * outer[i];
      }
      const a4 = mulT(mul(kk, inner, d), kkRows, d);
      const a5 = mulT(mul(g21, inner2, d), g21Rows, d);
      const next = new Float64Array(d * d);
      for (let i = 0; i < d * d; i++) next[i] = a1[i] + sigma2 * (a2[i] + a3[i] + a4[i] + sigma2 * a5[i]);
      vh = next;
    }
    // M ← F1 M F2ᵀ + σ² G1 M G2ᵀ: F2ᵀ on the right rotates columns; G2ᵀ puts γ·column m−1 into column 0.
    const rotated = new Float64Array(k * m);
    for (let r = 0; r < k; r++) {
      rotated[r * m] = mh[r * m + m - 1];
      for (let c = 1; c < m; c++) rotated[r * m + c] = mh[r * m + c - 1];
    }
    const nextM = new Float64Array(k * m);
    for (let r = 0; r < k; r++)
      for (let c = 0; c < m; c++) {
        let s = 0;
        for (let q = 0; q < k; q++) s += f1[r * k + q] * rotated[q * m + c];
        nextM[r * m + c] = s;
      }
    for (let r = 0; r < k; r++) {
      let s = 0;
      for (let q = 0; q < k; q++) s += g1[r * k + q] * mh[q * m + m - 1];
      nextM[r * m] += sigma2 * params.gamma * s;
    }
    mh = nextM;
  }
  return {mean, variance};
}
