import type {Turn} from './turningPointRules.js';
import {alternate, censorEnds, endValueRule, enforceDurations, localExtremes} from './turningPointRules.js';

/** Options of {@link hardingPagan}; defaults are the quarterly values of Harding & Pagan (2002). */
export interface HardingPaganOptions {
  /** A turn is the extreme within ±window periods. Default: 2. */
  window?: number;
  /** Minimum periods from a turn to the next. Default: 2. */
  minPhase?: number;
  /** Minimum periods peak to peak and trough to trough. Default: 5. */
  minCycle?: number;
  /** No turn this close to either end. Default: 1 (the first and last values cannot be turns). */
  censor?: number;
}

/**
 * Harding-Pagan quarterly dating rule (the "BBQ" simplification of Bry-Boschan): peaks and troughs are local
 * extremes within ±2 quarters, peaks and troughs alternate, a phase lasts at least 2 quarters and a cycle at
 * least 5. No smoothing stages: quarterly data are smooth enough.
 *
 * Why: dates the turns of a quarterly series. Applied to the level it gives classical cycles (recessions); applied
 * to a gap it gives growth cycles. At the right end the ±window is cut short so a recent turn can be found;
 * the caller marks such turns provisional.
 *
 * Reference: D. Harding and A. Pagan (2002), Dissecting the cycle: a methodological investigation, Journal of
 * Monetary Economics 49:365–381.
 *
 * Complexity: O(n·window + m²) for m candidate turns. NaN policy: NaN values are never turns and are ignored as
 * neighbours (fill gaps first for a complete dating).
 *
 * @example
 * hardingPagan(Float64Array.of(1, 2, 3, 2, 1, 0, 1, 2, 3, 4))
 * // => [{index: 2, type: 'peak'}, {index: 5, type: 'trough'}]
 */
export function hardingPagan(
  values: Float64Array,
  {window = 2, minPhase = 2, minCycle = 5, censor = 1}: HardingPaganOptions = {},
): Turn[] {
  let turns = alternate(localExtremes(values, window), values);
  turns = censorEnds(turns, values.length, censor);
  turns = endValueRule(turns, values);
  turns = enforceDurations(turns, values, {minPhase, minCycle});
  return endValueRule(turns, values);
}
