import {fCdf} from '../numeric/fDistribution.js';
import {leastSquares} from '../numeric/leastSquares.js';
import type {AdjustmentDiagnostics} from './types.js';

/** Significance level of the residual-seasonality test. */
export const RESIDUAL_SEASONALITY_ALPHA = 0.01;

export const RESIDUAL_SEASONALITY_TEST = 'seasonal-dummy F-test on period-on-period changes of the adjusted series';

/**
 * Variance shares of the period-on-period changes of trend, seasonal and irregular (model scale), each divided by
 * the sum of the three so they add to 1. Rows with a NaN in any component are skipped. All values are first
 * divided by a power of two near the largest magnitude (an exact operation) so huge series do not overflow.
 */
export function varianceShares(
  trend: Float64Array,
  seasonal: Float64Array,
  irregular: Float64Array,
): AdjustmentDiagnostics['varianceShares'] {
  const parts = [trend, seasonal, irregular];
  let scale = 0;
  for (const a of parts) for (const v of a) if (Number.isFinite(v)) scale = Math.max(scale, Math.abs(v));
  const s = scale > 0 ? 2 ** -Math.floor(Math.log2(scale)) : 1;
  const vars = parts.map((a) => {
    const d: number[] = [];
    for (let i = 1; i < a.length; i++) {
      if (parts.every((c) => Number.isFinite(c[i]) && Number.isFinite(c[i - 1]))) d.push((a[i] - a[i - 1]) * s);
    }
    const mean = d.reduce((x, y) => x + y, 0) / d.length;
    return d.reduce((x, y) => x + (y - mean) ** 2, 0) / d.length;
  });
  const total = vars[0] + vars[1] + vars[2];
  if (!(total > 0)) return {trend: 0, seasonal: 0, irregular: 0};
  return {trend: vars[0] / total, seasonal: vars[1] / total, irregular: vars[2] / total};
}

/**
 * Residual seasonality: F-test of seasonal dummies in a regression of the period-on-period changes of the adjusted
 * series (model scale) on an intercept and dummies for each season but one; `season` gives the group of each
 * period (month, quarter, or for weekly series the month of the week). H0: no seasonal pattern left.
 * F = ((RSS₀ − RSS₁)/(m − 1)) / (RSS₁/(N − m)), p from the F(m − 1, N − m) distribution; detected when p < 1%.
 * Reference: the standard linear-model F-test (e.g. Greene, Econometric Analysis, §5.3). NaN policy: skips NaN.
 */
export function residualSeasonality(
  adjusted: Float64Array,
  season: Int32Array,
  groups: number,
): AdjustmentDiagnostics['residualSeasonality'] {
  const d: number[] = [];
  const g: number[] = [];
  for (let i = 1; i < adjusted.length; i++) {
    const v = adjusted[i] - adjusted[i - 1];
    if (Number.isFinite(v)) {
      d.push(v);
      g.push(season[i]);
    }
  }
  const present = Array.from(new Set(g)).sort((a, b) => a - b);
  const m = present.length;
  const N = d.length;
  const none = {test: RESIDUAL_SEASONALITY_TEST, statistic: NaN, pValue: NaN, detected: false};
  if (m < 2 || N <= m + 2 || groups < 2) return none;
  const y = Float64Array.from(d);
  const mean = d.reduce((a, b) => a + b, 0) / N;
  const rss0 = d.reduce((a, b) => a + (b - mean) ** 2, 0);
  const dummies = present.slice(1).map((s) => Float64Array.from(g, (x) => (x === s ? 1 : 0)));
  const columns = [new Float64Array(N).fill(1), ...dummies];
  let rss1: number;
  try {
    rss1 = leastSquares(y, columns).residualSumOfSquares;
  } catch {
    return none;
  }
  if (!(rss1 > 0)) return none;
  const statistic = (rss0 - rss1) / (m - 1) / (rss1 / (N - m));
  const pValue = 1 - fCdf(statistic, m - 1, N - m);
  return {test: RESIDUAL_SEASONALITY_TEST, statistic, pValue, detected: pValue < RESIDUAL_SEASONALITY_ALPHA};
}

/** Mean absolute change of the seasonal component from one year to the next (lag `period`), model scale. */
export function seasonalStability(seasonal: Float64Array, period: number): number {
  let sum = 0;
  let count = 0;
  for (let i = period; i < seasonal.length; i++) {
    const d = seasonal[i] - seasonal[i - period];
    if (Number.isFinite(d)) {
      sum += Math.abs(d);
      count++;
    }
  }
  return count > 0 ? sum / count : NaN;
}
