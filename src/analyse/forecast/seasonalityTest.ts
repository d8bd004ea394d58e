import {autocorrelation} from '../numeric/autocorrelation.js';
import {normalQuantile} from '../numeric/normalQuantile.js';

/**
 * The 90% seasonality test of the M3 benchmarks and the Theta method: seasonal when
 * |r_m| > 1.645·√((1 + 2·Σ_{k<m} r_k²)/n), r_k the lag-k autocorrelation and m the seasonal period.
 *
 * Why: deseasonalise only series with a detectable seasonal pattern (the standard practice for Naive2,
 * Comb S-H-D and Theta in forecasting competitions).
 * Reference: S. Makridakis and M. Hibon (2000), The M3-Competition, IJF 16, 451–476; V. Assimakopoulos and
 * K. Nikolopoulos (2000), The theta model, IJF 16, 521–530; as in R's forecast::thetaf.
 *
 * Complexity: O(n·m). NaN policy: rejects NaN. False for m ≤ 1, constant series, or n ≤ m.
 */
export function seasonalityTest(values: Float64Array, period: number): boolean {
  const n = values.length;
  if (period <= 1 || n <= period) return false;
  let constant = true;
  for (let i = 1; i < n; i++) if (values[i] !== values[0]) constant = false;
  if (constant) return false;
  const r = autocorrelation(values, period);
  let sum = 0;
  for (let k = 0; k < period - 1; k++) sum += r[k] * r[k];
  const stat = Math.sqrt((1 + 2 * sum) / n);
  return Math.abs(r[period - 1]) / stat > normalQuantile(0.95);
}
