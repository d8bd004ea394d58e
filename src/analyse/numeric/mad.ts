import {median} from './median.js';

/**
 * Median absolute deviation from the median, scaled by 1.4826 so that it estimates the standard deviation of
 * normal data (the default `constant` of R's `stats::mad`); NaN when there are no values.
 *
 * Why: a robust sigma for outlier scores; one wild value does not inflate it.
 * Reference: Hampel (1974), JASA 69:383–393; R `mad(x)`.
 * Complexity: O(n log n). NaN policy: skips NaN.
 * @example mad(Float64Array.of(1, 2, 3, 4, 100)) // => 1.4826
 */
export function mad(values: Float64Array): number {
  const centre = median(values);
  const deviations = values.map((v) => Math.abs(v - centre));
  return 1.4826 * median(deviations);
}
