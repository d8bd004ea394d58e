/** Each part's contribution to the total's change at every period, in percentage points. */
export interface ContributionSeries {
  /** The total's change in percent, per period (NaN where not computable). */
  total: Float64Array;
  /** One array per part, in the order given: contribution in percentage points per period. */
  parts: Float64Array[];
}

/**
 * Contributions of parts to the change of a total over `lag` periods:
 * cᵢ,t = 100 · (xᵢ,t − xᵢ,t−lag) / X_t−lag and the total's change 100 · (X_t − X_t−lag) / X_t−lag.
 *
 * Why: the first question about a total is what drove it. When the parts add up to the total the
 * contributions add up to its change exactly (Σᵢ cᵢ,t = 100 · (Σᵢ xᵢ,t − Σᵢ xᵢ,t−lag) / X_t−lag).
 * With `lag` = the periods in a year this is the year-on-year contribution; with `lag` = 1 on seasonally
 * adjusted parts and their sum as the total (indirect adjustment), the period-on-period one.
 * Reference: the usual contribution-to-growth arithmetic of national accounts, e.g. OECD (2001), Quarterly
 * National Accounts, and Eurostat (2013) Handbook on quarterly national accounts, §6 (contributions to growth).
 * NaN policy: NaN in → NaN out per period; NaN where the base X_t−lag is missing or not positive.
 * Complexity O(n · parts).
 *
 * @param total the total, aligned with each part (same start and length)
 */
export function contributions(total: Float64Array, parts: readonly Float64Array[], lag: number): ContributionSeries {
  const n = total.length;
  const base = (t: number): number => (t >= lag && total[t - lag] > 0 ? total[t - lag] : NaN);
  const change = (x: Float64Array) => Float64Array.from({length: n}, (_, t) => (100 * (x[t] - x[t - lag])) / base(t));
  return {total: change(total), parts: parts.map(change)};
}
