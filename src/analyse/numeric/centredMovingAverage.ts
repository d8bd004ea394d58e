/**
 * Centred moving average over one seasonal cycle of `period` points: for odd periods the plain mean of `period`
 * points centred on t; for even periods the 2×period average, weights (½, 1, …, 1, ½)/period over period + 1
 * points. Positions without a full window on both sides are NaN, as in R's `filter(x, w, sides = 2)`.
 *
 * Why: the trend estimate of classical decomposition (Kendall & Stuart; R's `stats::decompose`).
 * Complexity: O(n · period). NaN policy: NaN in → NaN out (a window holding a NaN gives NaN).
 * @example centredMovingAverage(Float64Array.of(1, 2, 3, 4, 5), 2) // => [NaN, 2, 3, 4, NaN]
 */
export function centredMovingAverage(values: Float64Array, period: number): Float64Array {
  if (!Number.isInteger(period) || period < 1) throw new RangeError(`invalid period: ${period}`);
  const n = values.length;
  const out = new Float64Array(n).fill(NaN);
  const even = period % 2 === 0;
  const len = even ? period + 1 : period;
  const weights = new Float64Array(len).fill(1 / period);
  if (even) weights[0] = weights[len - 1] = 0.5 / period;
  const half = len >> 1;
  for (let t = half; t < n - half; t++) {
    let sum = 0;
    // R's filter (C code) sums filter[j] · x[t + half − j] from j = 0: same weights, same order.
    for (let j = 0; j < len; j++) sum += weights[j] * values[t + half - j];
    out[t] = sum;
  }
  return out;
}
