/**
 * Robust z-score of `value` against a sample: (value − median) ÷ (1.4826 · MAD).
 *
 * Why: callouts rank a move by how unusual it is for the series, and the median/MAD pair is not pulled by
 * the very outliers being judged. 1.4826 makes the MAD consistent for the normal standard deviation
 * (Rousseeuw & Croux 1993; R's `mad()` default constant).
 *
 * NaN policy: skips NaN in `sample`; returns NaN when `value` is NaN, when fewer than `minimum` finite values
 * remain, or when the MAD is zero.
 *
 * Complexity: O(n log n) (two sorts).
 *
 * @example robustZ([1, 2, 3, 4, 5], 6) // => 3 / 1.4826 ≈ 2.0235
 */
export function robustZ(sample: ArrayLike<number>, value: number, minimum = 5): number {
  if (!Number.isFinite(value)) return NaN;
  const xs: number[] = [];
  for (let i = 0; i < sample.length; i++) if (Number.isFinite(sample[i])) xs.push(sample[i]);
  if (xs.length < minimum) return NaN;
  const centre = median(xs);
  const mad = median(xs.map((x) => Math.abs(x - centre)));
  return mad > 0 ? (value - centre) / (1.4826 * mad) : NaN;
}

function median(xs: number[]): number {
  const s = Float64Array.from(xs).sort();
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}
