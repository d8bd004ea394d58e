/**
 * Values of a series on another stretch of periods: n values from period `from`, NaN where the series has none.
 * Complexity O(n). NaN policy: NaN in → NaN out.
 */
export function align(series: {start: number; values: ArrayLike<number>}, from: number, n: number): Float64Array {
  return Float64Array.from({length: n}, (_, i) => {
    const k = from + i - series.start;
    return k >= 0 && k < series.values.length ? series.values[k] : NaN;
  });
}
