/**
 * Fill missing values (NaN) by straight lines between the nearest observed neighbours; leading and trailing
 * gaps take the nearest observed value.
 *
 * Why: filters such as Hodrick-Prescott and Christiano-Fitzgerald need a complete series; a straight line adds
 * no cycle of its own. The count of filled points is returned so the caller can say what it did.
 *
 * Complexity: O(n). NaN policy: this is the routine that removes NaN; an all-NaN input stays all NaN (filled = 0).
 * Returns a new array; the input is not changed.
 *
 * @example fillGaps(Float64Array.of(1, NaN, 3)) // => {values: [1, 2, 3], filled: 1}
 */
export function fillGaps(values: Float64Array): {values: Float64Array; filled: number} {
  const n = values.length;
  const out = Float64Array.from(values);
  let previous = -1;
  let filled = 0;
  for (let i = 0; i <= n; i++) {
    if (i < n && Number.isNaN(values[i])) continue;
    const gap = i - previous - 1;
    if (gap > 0 && (previous >= 0 || i < n)) {
      for (let j = previous + 1; j < i; j++) {
        if (previous < 0) out[j] = values[i];
        else if (i >= n) out[j] = values[previous];
        else out[j] = values[previous] + ((values[i] - values[previous]) * (j - previous)) / (i - previous);
      }
      filled += gap;
    }
    previous = i;
  }
  return {values: out, filled};
}
