/**
 * A ratio over a span of periods: Σ numerator / Σ denominator over indices `from` … `to` (inclusive).
 *
 * Why: the year-to-date, quarterly or fiscal-year figure of a ratio (margin, average basket) is the ratio of
 * the summed numerator and denominator, not the mean of the period ratios.
 * NaN policy: NaN when any value in the span is missing, the span leaves the arrays, or Σ denominator is 0.
 * Complexity O(to − from).
 * @example ratioOfSums(Float64Array.of(1, 3), Float64Array.of(2, 2), 0, 1) // => 1
 */
export function ratioOfSums(numerator: Float64Array, denominator: Float64Array, from: number, to: number): number {
  if (from < 0 || to >= numerator.length || to >= denominator.length || to < from) return NaN;
  let n = 0;
  let d = 0;
  for (let i = from; i <= to; i++) {
    n += numerator[i];
    d += denominator[i];
  }
  return d === 0 || Number.isNaN(n + d) ? NaN : n / d;
}
