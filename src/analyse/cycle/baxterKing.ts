/**
 * Baxter-King symmetric band-pass filter of half-length K: a centred moving average with weights
 * b_j = B_j + θ, B_0 = (b − a)/π, B_j = (sin jb − sin ja)/(πj), a = 2π/high, b = 2π/low, and θ chosen so the
 * 2K + 1 weights sum to zero (removing up to quadratic trends).
 *
 * Why: the classic fixed-window band-pass, offered beside Christiano-Fitzgerald. It loses K observations at each
 * end, which are NaN in the output. K = 12 quarterly, 36 monthly (Baxter & King's recommendation of three years).
 *
 * Reference: M. Baxter and R. G. King (1999), Measuring business cycles: approximate band-pass filters for
 * economic time series, Review of Economics and Statistics 81(4):575–593.
 *
 * Complexity: O(n·K) time. NaN policy: NaN in → NaN out for the outputs whose window holds it. Returns a new array
 * (all NaN when n ≤ 2K).
 *
 * @example baxterKing(Float64Array.of(1, 1, 1, 1, 1), {low: 2, high: 4, k: 1}) // => [NaN, 0, 0, 0, NaN]
 */
export function baxterKing(
  values: Float64Array,
  {low, high, k}: {low: number; high: number; k: number},
): Float64Array {
  if (!(low >= 2) || !(high > low)) throw new RangeError(`invalid band: ${low}–${high}`);
  if (!Number.isInteger(k) || k < 1) throw new RangeError(`invalid half-length: ${k}`);
  const a = (2 * Math.PI) / high;
  const b = (2 * Math.PI) / low;
  const weights = new Float64Array(k + 1);
  weights[0] = (b - a) / Math.PI;
  let sum = weights[0];
  for (let j = 1; j <= k; j++) {
    weights[j] = (Math.sin(b * j) - Math.sin(a * j)) / (Math.PI * j);
    sum += 2 * weights[j];
  }
  const theta = -sum / (2 * k + 1);
  for (let j = 0; j <= k; j++) weights[j] += theta;
  const n = values.length;
  const out = new Float64Array(n).fill(NaN);
  for (let t = k; t < n - k; t++) {
    let s = weights[0] * values[t];
    for (let j = 1; j <= k; j++) s += weights[j] * (values[t - j] + values[t + j]);
    out[t] = s;
  }
  return out;
}
