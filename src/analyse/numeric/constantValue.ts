/**
 * The value every known (non-NaN) value equals, or null when two known values differ or fewer than `minimum`
 * are known.
 *
 * Why: a constant series has no seasonal pattern, trend or cycle, and forecasts as the constant; the analysis,
 * the seasonal adjustment and the forecast all ask this one question, so they ask it of one routine.
 * Complexity: O(n). NaN policy: skips NaN. Never changes the input.
 * @example constantValue(Float64Array.of(5, NaN, 5)) // => 5
 */
export function constantValue(values: Float64Array, minimum = 1): number | null {
  let value = NaN;
  let count = 0;
  for (const v of values) {
    if (Number.isNaN(v)) continue;
    if (count > 0 && v !== value) return null;
    value = v;
    count++;
  }
  return count >= minimum ? value : null;
}
