/**
 * Median of the non-NaN values (mean of the two middle values for an even count); NaN when none.
 *
 * Why: robust centre for MAD, outlier scores and the `auto` model rule.
 * Complexity: O(n log n) (sorts a copy). NaN policy: skips NaN. Never changes the input.
 * @example median(Float64Array.of(3, 1, NaN, 2)) // => 2
 */
export function median(values: Float64Array): number {
  const finite = values.filter((v) => !Number.isNaN(v)).sort();
  const n = finite.length;
  if (n === 0) return NaN;
  const half = n >> 1;
  return n % 2 === 1 ? finite[half] : (finite[half - 1] + finite[half]) / 2;
}
