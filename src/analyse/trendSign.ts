/** Trend-cycle change per period below which the trend counts as flat: 0.05% (common practice for monthly packs). */
export const FLAT_TREND_PERCENT = 0.05;
/** The same for series that are rates, in percentage points: 0.01 pp (common practice). */
export const FLAT_TREND_POINTS = 0.01;

/**
 * The one flat-trend rule: the direction of a per-period trend-cycle change (percent, or percentage points for
 * rates), 0 when it is within the flat band (|change| < threshold) or not finite.
 *
 * Why: the changes' trend direction (summary tables, exports) and the trend callout must call the same move
 * flat; both use this rule (the former on the average change over the last three periods, the latter on each
 * period's change).
 * Complexity: O(1). NaN policy: NaN → 0.
 * @example trendSign(0.2) // => 1
 */
export function trendSign(change: number, threshold = FLAT_TREND_PERCENT): -1 | 0 | 1 {
  if (!Number.isFinite(change) || Math.abs(change) < threshold) return 0;
  return change > 0 ? 1 : -1;
}
