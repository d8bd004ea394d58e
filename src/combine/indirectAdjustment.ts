/**
 * The indirectly adjusted total: the sum of the seasonally adjusted parts, period by period.
 *
 * Why: a total can be adjusted directly (its own seasonal adjustment) or indirectly (the sum of its adjusted
 * parts); only the indirect total adds up to its adjusted parts. Reference: Eurostat (2015), ESS guidelines on
 * seasonal adjustment, item 3.3 (direct versus indirect adjustment of aggregates).
 * NaN policy: NaN in → NaN out per period. Complexity O(n · parts).
 *
 * @param adjustedParts the parts' adjusted values on one calendar (same start and length)
 */
export function indirectTotal(adjustedParts: readonly Float64Array[], n: number): Float64Array {
  const out = new Float64Array(n);
  for (const p of adjustedParts) for (let t = 0; t < n; t++) out[t] += p[t];
  return out;
}

/**
 * The largest difference between the directly and the indirectly adjusted total, in percent of the direct one:
 * max over t of 100 · |indirect_t − direct_t| / |direct_t|, with the index where it occurs.
 * NaN policy: skips periods where either is missing; `{index: -1, percent: NaN}` when none is left.
 */
export function largestDifference(
  direct: Float64Array,
  indirect: Float64Array,
): {index: number; percent: number; difference: number} {
  let best = {index: -1, percent: NaN, difference: NaN};
  for (let t = 0; t < direct.length; t++) {
    const d = indirect[t] - direct[t];
    const pct = (100 * Math.abs(d)) / Math.abs(direct[t]);
    if (Number.isFinite(pct) && !(pct <= best.percent)) best = {index: t, percent: pct, difference: d};
  }
  return best;
}
