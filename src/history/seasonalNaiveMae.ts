/**
 * In-sample mean absolute error of the seasonal naive forecast: mean of |y[t] − y[t − lag]| over
 * t ≥ lag. It is the scale of MASE (Hyndman & Koehler 2006, "Another look at measures of forecast
 * accuracy", IJF 22(4), eq. for seasonal data), so a running MASE below 1 means the published
 * forecasts beat "same period last year" on average.
 *
 * NaN policy: skips pairs where either value is NaN. Returns NaN when no pair is left (series
 * shorter than lag + 1, or all missing).
 *
 * Complexity: O(n).
 *
 * @example seasonalNaiveMae(Float64Array.of(1, 2, 4, 7), 2) // => (|4−1| + |7−2|) / 2 = 4
 */
export function seasonalNaiveMae(values: Float64Array, lag: number): number {
  if (!Number.isInteger(lag) || lag < 1) throw new RangeError(`invalid lag: ${lag}`);
  let sum = 0;
  let count = 0;
  for (let t = lag; t < values.length; t++) {
    const d = values[t] - values[t - lag];
    if (!Number.isNaN(d)) {
      sum += Math.abs(d);
      count++;
    }
  }
  return count === 0 ? NaN : sum / count;
}
