import type {Phase} from './labels.js';

/**
 * Direction of the gap and the four-way phase: sign of the gap × direction of the gap.
 *
 * Direction compares the latest gap with the gap `span` periods earlier (one quarter: 3 months, 1 quarter or
 * 13 weeks), so a single noisy period does not flip it; changes within 1e-9 percentage points count as flat.
 * The phase uses the latest non-flat move (looking further back if needed); when the gap never moves the
 * phase is reported with `moving: false`, and the caller says the series is on trend.
 *
 * Complexity: O(n). NaN policy: the gap must be complete (it is computed from filled data).
 *
 * @example gapPhase(Float64Array.of(-2, -1, 1, 2), 1) // => {direction: 'rising', phase: 'rising-above', moving: true}
 */
export function gapPhase(
  gap: Float64Array,
  span: number,
): {direction: 'rising' | 'falling' | 'flat'; phase: Phase; moving: boolean} {
  const n = gap.length;
  const last = gap[n - 1];
  const move = (lag: number): number => (n - 1 - lag >= 0 ? last - gap[n - 1 - lag] : 0);
  const tolerance = 1e-9;
  const latest = move(Math.min(span, n - 1));
  const direction = latest > tolerance ? 'rising' : latest < -tolerance ? 'falling' : 'flat';
  let change = latest;
  for (let lag = 1; Math.abs(change) <= tolerance && lag < n; lag++) change = move(lag);
  const above = last >= 0;
  const rising = change > 0;
  const phase: Phase = above ? (rising ? 'rising-above' : 'falling-above') : rising ? 'rising-below' : 'falling-below';
  return {direction, phase, moving: Math.abs(change) > tolerance};
}
