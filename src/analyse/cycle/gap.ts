/**
 * Gap: deviation of a series from its long-run trend, in percent.
 *
 * 100·(x_t − τ_t)/τ_t when every value and every trend value is positive. Otherwise (series that cross or touch
 * zero, such as profits or net flows, where a ratio to the trend explodes or flips sign) the deviation is scaled
 * by the mean absolute value of the series instead, 100·(x_t − τ_t)/mean|x|, so the gap stays in comparable
 * percentage units; `scale` says which was used (and `meanAbsolute` gives the divisor). A series of zeros has a zero gap. Gaps within 1e-9 percentage
 * points of zero are rounding noise of the filter (a straight line's HP trend is the line up to rounding) and are
 * set to 0, so noise is never dated as a cycle.
 *
 * Complexity: O(n). NaN policy: NaN in → NaN out at that position; the mean skips NaN. Returns a new array.
 *
 * @example gapPercent(Float64Array.of(110, 90), Float64Array.of(100, 100)).gap // => [10, -10]
 */
const NOISE = 1e-9;

export function gapPercent(
  values: Float64Array,
  trend: Float64Array,
): {gap: Float64Array; scale: 'trend' | 'mean-absolute'; meanAbsolute: number} {
  const n = values.length;
  let positive = true;
  let sumAbs = 0;
  let count = 0;
  for (let t = 0; t < n; t++) {
    if (Number.isNaN(values[t])) continue;
    if (!(values[t] > 0) || !(trend[t] > 0)) positive = false;
    sumAbs += Math.abs(values[t]);
    count++;
  }
  const meanAbs = count > 0 ? sumAbs / count : 0;
  const gap = new Float64Array(n);
  for (let t = 0; t < n; t++) {
    const scale = positive ? trend[t] : meanAbs;
    const g = scale > 0 ? (100 * (values[t] - trend[t])) / scale : 0 * values[t];
    gap[t] = Math.abs(g) < NOISE ? 0 : g;
  }
  return {gap, scale: positive ? 'trend' : 'mean-absolute', meanAbsolute: meanAbs};
}

