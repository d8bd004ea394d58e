/**
 * Sample autocorrelations r₁ … r_maxLag: r_k = Σ_{t=1}^{n−k} (x_t − x̄)(x_{t+k} − x̄) / Σ_{t=1}^{n} (x_t − x̄)²,
 * the biased (divide-by-n) estimator that keeps the sequence positive definite.
 *
 * Why: the seasonality test of the Theta method and of the M3 benchmarks uses r_m and r_1 … r_{m−1}.
 * Reference: G. E. P. Box and G. M. Jenkins (1976), Time Series Analysis, §2.1.5; the same definition as
 * R's `stats::acf`.
 *
 * Complexity: O(n · maxLag). NaN policy: rejects NaN (a NaN spreads to every lag). A constant series gives NaN.
 * @example autocorrelation(Float64Array.of(1, 2, 3, 4), 1) // => [0.25]
 */
export function autocorrelation(values: Float64Array, maxLag: number): Float64Array {
  const n = values.length;
  if (!Number.isInteger(maxLag) || maxLag < 1 || maxLag >= n) throw new RangeError(`invalid lag: ${maxLag}`);
  let mean = 0;
  for (let t = 0; t < n; t++) mean += values[t];
  mean /= n;
  let c0 = 0;
  for (let t = 0; t < n; t++) c0 += (values[t] - mean) ** 2;
  const out = new Float64Array(maxLag);
  for (let k = 1; k <= maxLag; k++) {
    let c = 0;
    for (let t = 0; t + k < n; t++) c += (values[t] - mean) * (values[t + k] - mean);
    out[k - 1] = c / c0;
  }
  return out;
}
