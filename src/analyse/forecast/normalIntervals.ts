import {normalQuantile} from '../numeric/normalQuantile.js';

/**
 * Symmetric normal prediction intervals mean ± z·√variance at each level, z = Φ⁻¹(0.5 + level/200).
 *
 * Why: every model with an analytic forecast variance turns it into intervals the same way.
 * Complexity: O(h·levels). NaN policy: NaN in → NaN out; negative variances count as 0.
 */
export function normalIntervals(
  mean: Float64Array,
  variance: Float64Array,
  levels: number[],
): {lower: Map<number, Float64Array>; upper: Map<number, Float64Array>} {
  const lower = new Map<number, Float64Array>();
  const upper = new Map<number, Float64Array>();
  for (const level of levels) {
    const z = normalQuantile(0.5 + level / 200);
    const lo = new Float64Array(mean.length);
    const hi = new Float64Array(mean.length);
    for (let i = 0; i < mean.length; i++) {
      const half = z * Math.sqrt(Math.max(variance[i], 0));
      lo[i] = mean[i] - half;
      hi[i] = mean[i] + half;
    }
    lower.set(level, lo);
    upper.set(level, hi);
  }
  return {lower, upper};
}
