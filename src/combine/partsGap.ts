/** The largest difference between a total and the sum of its parts, where both are known. */
export interface PartsGap {
  /** Index (into the aligned arrays) of the period with the largest absolute gap. */
  index: number;
  /** Total − Σ parts at that period. */
  gap: number;
  /** The gap in percent of the total's absolute value at that period. */
  percent: number;
  /** Periods whose gap is beyond the tolerance. */
  periods: number;
}

/** Relative tolerance under which a total and its parts count as adding up: 1e-6 (rounding of stored figures). */
export const PARTS_GAP_TOLERANCE = 1e-6;

/**
 * Check that the parts add up to the total, period by period: gap_t = X_t − Σᵢ xᵢ,t.
 *
 * Why: when a total and its parts both come from data, a gap means a part is missing from the pack or a figure
 * is wrong, and every contribution and reconciled forecast would silently absorb it.
 * A gap counts when |gap_t| > 1e-6 · max(1, |X_t|). NaN policy: skips periods where the total or any part is
 * missing. Complexity O(n · parts). Returns null when every checked period adds up.
 *
 * @param total the total, aligned with each part (same start and length)
 */
export function partsGap(total: Float64Array, parts: readonly Float64Array[]): PartsGap | null {
  let worst: PartsGap | null = null;
  let periods = 0;
  for (let t = 0; t < total.length; t++) {
    let sum = 0;
    for (const p of parts) sum += p[t];
    const gap = total[t] - sum;
    if (Number.isNaN(gap) || Math.abs(gap) <= PARTS_GAP_TOLERANCE * Math.max(1, Math.abs(total[t]))) continue;
    periods++;
    if (worst === null || Math.abs(gap) > Math.abs(worst.gap)) {
      worst = {index: t, gap, percent: (100 * gap) / Math.abs(total[t]), periods: 0};
    }
  }
  return worst && {...worst, periods};
}
