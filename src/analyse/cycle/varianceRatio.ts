import {fCdf} from '../numeric/fDistribution.js';

/** Result of {@link varianceRatio}. */
export interface VarianceRatioResult {
  /** Variance of the last part over variance of the first part. */
  statistic: number;
  /** Two-sided p-value: 2·min(P(F ≤ f), P(F ≥ f)). */
  pValue: number;
  df1: number;
  df2: number;
}

/**
 * Split-sample variance-ratio test (Goldfeld-Quandt style) for a change in variance: the series is cut into
 * thirds, the middle third dropped, and f = s²_last / s²_first (each about its own mean) compared with
 * F(n_last − 1, n_first − 1). H₀: constant variance.
 *
 * Why: a growing or shrinking irregular makes intervals and "unusual value" thresholds misleading; the report
 * says whether the series is stationary in variance.
 *
 * Reference: S. M. Goldfeld and R. E. Quandt (1965), Some tests for homoscedasticity, JASA 60:539–547
 * (dropping the middle third follows their recommendation of omitting central observations).
 *
 * Complexity: O(n). NaN policy: skips NaN. Throws `series too short for the variance test` with fewer than four
 * values in either part, and `variance test needs a varying series` when the first part is constant.
 */
export function varianceRatio(values: Float64Array): VarianceRatioResult {
  const kept = values.filter((v) => !Number.isNaN(v));
  const third = Math.floor(kept.length / 3);
  if (third < 4) throw new RangeError('series too short for the variance test');
  const head = kept.subarray(0, third);
  if (head.every((v) => v === head[0])) throw new RangeError('variance test needs a varying series');
  const first = variance(head);
  const last = variance(kept.subarray(kept.length - third));
  const statistic = last / first;
  const df1 = third - 1;
  const df2 = third - 1;
  const lower = fCdf(statistic, df1, df2);
  return {statistic, pValue: Math.min(1, 2 * Math.min(lower, 1 - lower)), df1, df2};
}

function variance(x: Float64Array): number {
  let mean = 0;
  for (const v of x) mean += v;
  mean /= x.length;
  let s = 0;
  for (const v of x) s += (v - mean) ** 2;
  return s / (x.length - 1);
}
