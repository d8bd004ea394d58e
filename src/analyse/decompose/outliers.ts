import {mad} from '../numeric/mad.js';
import {median} from '../numeric/median.js';
import type {Outlier} from './types.js';

/** Periods either side compared by the level-shift rule. */
const SIDE = 3;

/**
 * Flag unusual periods from the final irregular and the adjusted series (model scale: logs for multiplicative models).
 *
 * - Additive outlier: irregular / σ beyond `threshold`. σ is the larger of two estimates that agree for Gaussian
 *   noise: 1.4826 · MAD (R's `mad`) and √(π/2) · mean |irregular − median|. The second guards against an
 *   irregular that is mostly zero (rounded data, or a short-window trend hugging the data), where MAD alone
 *   collapses and ordinary noise would score as outliers.
 * - Level shift (our rule, on the period-on-period changes d of the adjusted series): the change at t stands out
 *   from the usual drift, |d_t − median(d)| ≥ threshold · σ_d with σ_d = 1.4826 · MAD(d), and it lasts: the median
 *   of the 3 periods from t minus the median of the 3 before, less 3 periods of drift, keeps the jump's sign and at
 *   least half its size, and so does a_{t+1} − a_{t−1} less 2 periods of drift. Score = (d_t − median d) / σ_d.
 *   A robust trend follows a lasting shift, so the irregular alone would show only a blip around t, and a trending
 *   series moves every period: hence changes measured against the drift, not against the irregular.
 * - Both sigmas are at least `floor` (a size below which nothing is unusual for business data: 0.1% of the level,
 *   set by the caller), so a near-perfectly smooth series (a budget, a rounded plan) does not flag rounding noise.
 *
 * Why: robust STL keeps such points from distorting the seasonal; flagging them lets the report explain them.
 * Complexity: O(n log n). NaN policy: skips NaN.
 */
export function detectOutliers(
  irregular: Float64Array,
  adjusted: Float64Array,
  threshold: number,
  floor: number,
): Outlier[] {
  const n = irregular.length;
  const sigma = Math.max(mad(irregular), meanAbsoluteSigma(irregular), floor);
  const changes = changesOf(adjusted);
  const drift = median(changes);
  const sigmaChange = Math.max(mad(changes), floor);
  if (!(sigma > 0) || !(sigmaChange > 0)) return [];
  const out: Outlier[] = [];
  for (let t = 0; t < n; t++) {
    const jump = changes[t] - drift;
    if (t >= SIDE && t + SIDE <= n && Math.abs(jump) >= threshold * sigmaChange) {
      const shift = shiftAt(adjusted, t, drift);
      const next = adjusted[t + 1] - adjusted[t - 1] - 2 * drift;
      const lasting = (x: number): boolean => Math.sign(x) === Math.sign(jump) && Math.abs(x) >= 0.5 * Math.abs(jump);
      if (lasting(shift) && lasting(next)) {
        out.push({index: t, kind: 'level-shift', score: jump / sigmaChange});
        continue;
      }
    }
    const score = irregular[t] / sigma;
    if (Math.abs(score) >= threshold) out.push({index: t, kind: 'additive', score});
  }
  return out;
}

/**
 * Sizes of level shifts at `indices` of the adjusted series (model scale), as the rule above measures them: the
 * median of the 3 periods from t less the median of the 3 before, less 3 periods of the median drift.
 */
export function levelShiftSizes(adjusted: Float64Array, indices: number[]): number[] {
  const drift = median(changesOf(adjusted));
  return indices.map((t) => shiftAt(adjusted, t, drift));
}

function changesOf(adjusted: Float64Array): Float64Array {
  const changes = new Float64Array(adjusted.length).fill(NaN);
  for (let t = 1; t < adjusted.length; t++) changes[t] = adjusted[t] - adjusted[t - 1];
  return changes;
}

function shiftAt(adjusted: Float64Array, t: number, drift: number): number {
  return median(adjusted.subarray(t, t + SIDE)) - median(adjusted.subarray(t - SIDE, t)) - SIDE * drift;
}

/** √(π/2) · mean |x − median(x)|: a Gaussian-consistent scale that does not collapse when most values are zero. */
function meanAbsoluteSigma(x: Float64Array): number {
  const centre = median(x);
  let sum = 0;
  let count = 0;
  for (const v of x) {
    if (Number.isNaN(v)) continue;
    sum += Math.abs(v - centre);
    count++;
  }
  return count > 0 ? Math.sqrt(Math.PI / 2) * (sum / count) : NaN;
}
