/**
 * Simple moving average of length `len` by a running sum: `out[j] = (x[j] + … + x[j+len−1]) / len`,
 * for j = 0 … n − len. The running sum is the order of operations of STL's published code, so the low-pass
 * filter of {@link ../decompose/stl.js} agrees with R's `stats::stl` to rounding.
 *
 * Reference: Cleveland et al. (1990), STL, Journal of Official Statistics 6:3–73, §3 (low-pass filter).
 * Complexity: O(n). NaN policy: NaN in → NaN out for every window after it (running sum).
 */
export function movingAverageInto(x: Float64Array, n: number, len: number, out: Float64Array): void {
  const count = n - len + 1;
  let sum = 0;
  for (let i = 0; i < len; i++) sum += x[i];
  out[0] = sum / len;
  for (let j = 1; j < count; j++) {
    sum += x[j + len - 1] - x[j - 1];
    out[j] = sum / len;
  }
}

/**
 * Trailing-window moving average as a new array of length n − len + 1 (empty when n < len).
 * @example movingAverage(Float64Array.of(1, 2, 3, 4), 2) // => [1.5, 2.5, 3.5]
 */
export function movingAverage(values: Float64Array, len: number): Float64Array {
  if (!Number.isInteger(len) || len < 1) throw new RangeError(`invalid window: ${len}`);
  const n = values.length;
  if (n < len) return new Float64Array(0);
  const out = new Float64Array(n - len + 1);
  movingAverageInto(values, n, len, out);
  return out;
}
