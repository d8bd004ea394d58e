/**
 * Christiano-Fitzgerald asymmetric band-pass filter, random-walk version: keeps fluctuations with periods
 * between `low` and `high` observations, using every observation at every date.
 *
 * Why: a business-cycle component (6–32 quarters, 18–96 months) that, unlike Baxter-King, has values up to
 * both ends of the sample. With `drift` (default true) the line through the first and last values,
 * t · (y_{n−1} − y_0)/(n − 1), is removed first, as the paper does for a random walk with drift; the cycle is
 * the filter applied to that drift-free series. Weights and end corrections follow the published formula:
 * c_t = B_0·x_t + Σ_{j=1}^{n−t−2} B_j·x_{t+j} + B̃_{n−1−t}·x_{n−1} + Σ_{j=1}^{t−1} B_j·x_{t−j} + B̃_t·x_0,
 * B_j = (sin jb − sin ja)/(πj), B_0 = (b − a)/π, a = 2π/high, b = 2π/low, and end weights chosen so each row's
 * weights sum to zero. This reproduces statsmodels' `cffilter` (and R mFilter `cffilter` with root = TRUE).
 *
 * Reference: L. J. Christiano and T. J. Fitzgerald (2003), The band pass filter, International Economic
 * Review 44(2):435–465.
 *
 * Complexity: O(n²) time, O(n) memory. NaN policy: rejects NaN (fill gaps first). Returns the cycle as a new
 * array; series shorter than 2 give zeros.
 *
 * @example christianoFitzgerald(Float64Array.of(5, 5, 5, 5), {low: 6, high: 32}) // => [0, 0, 0, 0]
 */
export function christianoFitzgerald(
  values: Float64Array,
  {low, high, drift = true}: {low: number; high: number; drift?: boolean},
): Float64Array {
  if (!(low >= 2) || !(high > low)) throw new RangeError(`invalid band: ${low}–${high}`);
  for (const v of values) if (!Number.isFinite(v)) throw new RangeError('christianoFitzgerald rejects NaN');
  const n = values.length;
  if (n < 2) return new Float64Array(n);
  const a = (2 * Math.PI) / high;
  const b = (2 * Math.PI) / low;
  const x = Float64Array.from(values);
  if (drift) {
    const slope = (values[n - 1] - values[0]) / (n - 1);
    for (let t = 0; t < n; t++) x[t] -= t * slope;
  }
  const weights = new Float64Array(n + 1);
  weights[0] = (b - a) / Math.PI;
  for (let j = 1; j <= n; j++) weights[j] = (Math.sin(b * j) - Math.sin(a * j)) / (Math.PI * j);
  // prefix[m] = Σ_{j=1}^{m} B_j, so each end weight is O(1).
  const prefix = new Float64Array(n + 1);
  for (let j = 1; j <= n; j++) prefix[j] = prefix[j - 1] + weights[j];
  const cycle = new Float64Array(n);
  for (let t = 0; t < n; t++) {
    const ahead = Math.max(0, n - t - 2);
    const behind = Math.max(0, t - 1);
    const endWeight = -0.5 * weights[0] - prefix[ahead];
    const startWeight = -weights[0] - prefix[ahead] - prefix[behind] - endWeight;
    let s = weights[0] * x[t] + endWeight * x[n - 1] + startWeight * x[0];
    for (let j = 1; j <= ahead; j++) s += weights[j] * x[t + j];
    for (let j = 1; j <= behind; j++) s += weights[j] * x[t - j];
    cycle[t] = s;
  }
  return cycle;
}
