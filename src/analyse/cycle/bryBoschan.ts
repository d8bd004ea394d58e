import {centredMovingAverage} from '../numeric/centredMovingAverage.js';
import {spencer} from './spencer.js';
import type {Turn} from './turningPointRules.js';
import {alternate, censorEnds, endValueRule, enforceDurations, localExtremes, relocate} from './turningPointRules.js';

/** Options of {@link bryBoschan}; defaults are the monthly values of Bry & Boschan (1971), in periods. */
export interface BryBoschanOptions {
  /** Span of the first, long centred average. Default: 12. */
  longSpan?: number;
  /** Window for extremes and for moving turns between stages (±). Default: 5. */
  window?: number;
  /** Span of the short centred average of stage 3. Default: 3. */
  shortSpan?: number;
  /** Radius within which the final turn is sought on the unsmoothed series. Default: 4. */
  finalRadius?: number;
  /** Minimum periods from a turn to the next. Default: 6. */
  minPhase?: number;
  /** Minimum periods peak to peak and trough to trough. Default: 15. */
  minCycle?: number;
  /** No turn this close to either end. Default: 6. */
  censor?: number;
}

/**
 * Bry-Boschan dating of monthly turning points, in the paper's stages:
 * 1. extremes (±window) of the 12-term centred average, alternated;
 * 2. each moved to the extreme of Spencer's curve within ±window; cycles shorter than `minCycle` removed;
 * 3. each moved to the extreme of a short centred average within ±window;
 * 4. each moved to the extreme of the unsmoothed series within ±finalRadius; then turns within `censor` of the
 *    ends, end turns beaten by values nearer the end, phases shorter than `minPhase` and cycles shorter than
 *    `minCycle` removed, alternation kept throughout.
 *
 * Simplifications (ours): the short average has a fixed span (3, the shortest the paper allows) instead of one
 * chosen from months for cyclical dominance, and the paper's replacement of extreme values before smoothing is
 * left to the caller (ebbflow dates the seasonally adjusted series or its gap, already cleaned of outliers).
 * The minimum phase of 6 months follows common practice; the 1971 text states 5 months (recalled from memory).
 *
 * Reference: G. Bry and C. Boschan (1971), Cyclical Analysis of Time Series: Selected Procedures and Computer
 * Programs, NBER Technical Paper 20.
 *
 * Complexity: O(n·(longSpan + window) + m²) for m candidate turns. NaN policy: rejects NaN (fill gaps first).
 * Series shorter than longSpan + 1 have no turns.
 */
export function bryBoschan(
  values: Float64Array,
  {
    longSpan = 12,
    window = 5,
    shortSpan = 3,
    finalRadius = 4,
    minPhase = 6,
    minCycle = 15,
    censor = 6,
  }: BryBoschanOptions = {},
): Turn[] {
  for (const v of values) if (!Number.isFinite(v)) throw new RangeError('bryBoschan rejects NaN');
  const n = values.length;
  const long = centredMovingAverage(values, longSpan);
  let turns = alternate(localExtremes(long, window), long);
  const smooth = spencer(values);
  turns = relocate(turns, smooth, window);
  turns = enforceDurations(turns, smooth, {minPhase: 1, minCycle});
  const short = centredMovingAverage(values, shortSpan);
  turns = relocate(turns, short, window);
  turns = relocate(turns, values, finalRadius);
  turns = censorEnds(turns, n, censor);
  turns = endValueRule(turns, values);
  turns = enforceDurations(turns, values, {minPhase, minCycle});
  return endValueRule(turns, values);
}
