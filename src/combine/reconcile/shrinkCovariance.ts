/** A shrunk covariance matrix (n × n, row-major) and the shrinkage intensity used. */
export interface ShrunkCovariance {
  covariance: Float64Array;
  lambda: number;
  /** Periods (rows) the estimate used: those where every series has an error. */
  observations: number;
}

/**
 * Covariance of one-step forecast errors shrunk towards its diagonal, as MinT uses it:
 * Ŵ = λ̂ · diag(Ŵ₁) + (1 − λ̂) · Ŵ₁, with Ŵ₁ = (1/T) Σₜ eₜ eₜᵀ and
 * λ̂ = Σ_{i≠j} Var̂(r̂ᵢⱼ) / Σ_{i≠j} r̂ᵢⱼ², clamped to [0, 1], where r̂ᵢⱼ are the correlations of Ŵ₁ and Var̂(r̂ᵢⱼ) is
 * estimated from the errors scaled by their own root mean square, zᵢ,ₜ:
 * Var̂(r̂ᵢⱼ) = (Σₜ zᵢ,ₜ² zⱼ,ₜ² − (Σₜ zᵢ,ₜ zⱼ,ₜ)² / T) / (T (T − 1)).
 *
 * Why: with a few years of monthly errors and several series the plain sample covariance is noisy or singular;
 * shrinking the correlations towards zero keeps it positive definite.
 * Reference: S. L. Wickramasuriya, G. Athanasopoulos and R. J. Hyndman (2019), Optimal forecast reconciliation
 * for hierarchical and grouped time series through trace minimization, JASA 114, 804–819 (their shrinkage
 * estimator with a diagonal target); J. Schäfer and K. Strimmer (2005), A shrinkage approach to large-scale
 * covariance matrix estimation, Stat. Appl. Genet. Mol. Biol. 4(1), art. 32 (target D, Table 1).
 * The errors are not centred (their mean is taken as zero, as for one-step errors of unbiased forecasts).
 *
 * NaN policy: uses only the periods where every series has a finite error. Returns null (unusable) with fewer
 * than 2 such periods or when a series' errors are all zero. Complexity O(T n²).
 *
 * @param errors one array per series, aligned on the same periods
 */
export function shrinkCovariance(errors: readonly Float64Array[]): ShrunkCovariance | null {
  const n = errors.length;
  const length = n === 0 ? 0 : Math.min(...errors.map((e) => e.length));
  const rows: number[] = [];
  for (let t = 0; t < length; t++) if (errors.every((e) => Number.isFinite(e[t]))) rows.push(t);
  const T = rows.length;
  if (n === 0 || T < 2) return null;
  const w1 = new Float64Array(n * n);
  for (let i = 0; i < n; i++)
    for (let j = i; j < n; j++) {
      let s = 0;
      for (const t of rows) s += errors[i][t] * errors[j][t];
      w1[i * n + j] = w1[j * n + i] = s / T;
    }
  const sd = Float64Array.from({length: n}, (_, i) => Math.sqrt(w1[i * n + i]));
  if (!sd.every((s) => s > 0)) return null;
  let variance = 0;
  let squared = 0;
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      if (i === j) continue;
      let sumSq = 0;
      let sum = 0;
      for (const t of rows) {
        const p = (errors[i][t] / sd[i]) * (errors[j][t] / sd[j]);
        sumSq += p * p;
        sum += p;
      }
      variance += (sumSq - (sum * sum) / T) / (T * (T - 1));
      squared += (w1[i * n + j] / (sd[i] * sd[j])) ** 2;
    }
  const lambda = squared > 0 ? Math.max(0, Math.min(1, variance / squared)) : 1;
  const covariance = Float64Array.from(w1, (v, k) => (k % (n + 1) === 0 ? v : (1 - lambda) * v));
  return {covariance, lambda, observations: T};
}
