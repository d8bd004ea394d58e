import {mad} from '../numeric/mad.js';
import {median} from '../numeric/median.js';
import type {Outlier} from './types.js';

/**
 * Flag unusual periods from the final irregular (model scale: logs for multiplicative models).
 *
 * - Robust sigma σ = 1.4826 · MAD of the irregular (R's `mad`); score = irregular / σ.
 * - Level shift (our rule): at t the adjusted series (model scale) jumps, |a_t − a_{t−1}| ≥ threshold · σ, and
 *   it stays there: the median of a_t … a_{t+k−1} minus the median of a_{t−k} … a_{t−1}, with k = 3, has the
 *   same sign and at least half the size of the jump, and so does a_{t+1} − a_{t−1}. Score = that median shift / σ.
 *   A robust trend follows a lasting shift, so the irregular alone would show only a blip around t.
 * - Additive outlier: any other t with |score| ≥ threshold.
 *
 * Why: robust STL keeps such points from distorting the seasonal; flagging them lets the report explain them.
 * Complexity: O(n log n). NaN policy: skips NaN. Returns [] when σ is 0 (a perfectly smooth series).
 */
export function detectOutliers(irregular: Float64Array, adjusted: Float64Array, threshold: number): Outlier[] {
  const sigma = mad(irregular);
  if (!(sigma > 0)) return [];
  const n = irregular.length;
  const k = 3;
  const out: Outlier[] = [];
  for (let t = 0; t < n; t++) {
    const jump = adjusted[t] - adjusted[t - 1];
    if (t >= k && t + k <= n && Math.abs(jump) >= threshold * sigma) {
      const shift = median(adjusted.subarray(t, t + k)) - median(adjusted.subarray(t - k, t));
      const next = adjusted[t + 1] - adjusted[t - 1];
      const lasting = (x: number): boolean => Math.sign(x) === Math.sign(jump) && Math.abs(x) >= 0.5 * Math.abs(jump);
      if (lasting(shift) && lasting(next)) {
        out.push({index: t, kind: 'level-shift', score: shift / sigma});
        continue;
      }
    }
    const score = irregular[t] / sigma;
    if (Math.abs(score) >= threshold) out.push({index: t, kind: 'additive', score});
  }
  return out;
}
