import type {Turn} from './turningPointRules.js';

/**
 * Amplitude of the current phase relative to past ones: |gap_{n−1} − gap_{last turn}| divided by the mean of
 * |gap_{next turn} − gap_{turn}| over the complete phases between dated turns.
 *
 * Why: says whether the present upswing or downswing is large or small by this series' own standards. A phase
 * (turn to turn) rather than a full cycle is the unit, because a review is usually part-way through one.
 * Null when there is no turn or no complete phase (or past phases have zero amplitude).
 *
 * Complexity: O(m) for m turns. NaN policy: the gap must be complete.
 *
 * @example
 * amplitudeRatio(Float64Array.of(0, 4, 0, 2), [{index: 1, type: 'peak'}, {index: 2, type: 'trough'}]) // => 0.5
 */
export function amplitudeRatio(gap: Float64Array, turns: Turn[]): number | null {
  if (turns.length < 2) return null;
  let sum = 0;
  for (let i = 0; i + 1 < turns.length; i++) sum += Math.abs(gap[turns[i + 1].index] - gap[turns[i].index]);
  const mean = sum / (turns.length - 1);
  if (!(mean > 0)) return null;
  return Math.abs(gap[gap.length - 1] - gap[turns[turns.length - 1].index]) / mean;
}
