import {leastSquares} from '../numeric/leastSquares.js';
import {mackinnonCritical, mackinnonPValue} from './mackinnon.js';

/** Result of {@link augmentedDickeyFuller}; `lags` and `maxLag` are the resolved lag choices. */
export interface AdfResult {
  statistic: number;
  pValue: number;
  lags: number;
  maxLag: number;
  /** Observations in the final regression. */
  nobs: number;
  critical: {'1%': number; '5%': number; '10%': number};
}

/**
 * Augmented Dickey-Fuller unit-root test with a constant: the t-statistic of ρ in
 * Δy_t = α + ρ·y_{t−1} + Σ_{i=1}^{p} φ_i·Δy_{t−i} + ε_t. H₀: unit root (not stationary in mean).
 *
 * Lag choice as statsmodels' `adfuller(x, regression='c', autolag='AIC')`: maxLag = ⌈12·(n/100)^{1/4}⌉ capped at
 * ⌊n/2⌋ − 2; every p = 0…maxLag is fitted on the same sample (the last n − 1 − maxLag differences) and the p
 * with the least AIC = n·ln(SSR/n) + 2k (+ constants) is kept, ties to the smaller p; the chosen regression is
 * then refitted on all n − 1 − p usable differences. p-value and critical values from MacKinnon's tables. The
 * nested fits come from one QR factorisation of the widest design (see {@link leastSquares}).
 *
 * Reference: D. A. Dickey and W. A. Fuller (1979), JASA 74:427–431; S. E. Said and D. A. Dickey (1984),
 * Biometrika 71:599–607; J. G. MacKinnon (1994, 2010), see {@link mackinnonPValue}.
 *
 * Complexity: O(n·maxLag²). NaN policy: rejects NaN. Throws `series too short for the ADF test` when n < 8 and
 * `ADF regression is singular` for a constant series.
 *
 * @example augmentedDickeyFuller(randomWalk).pValue // => large (cannot reject a unit root)
 */
export function augmentedDickeyFuller(values: Float64Array, {maxLag}: {maxLag?: number} = {}): AdfResult {
  for (const v of values) if (!Number.isFinite(v)) throw new RangeError('augmentedDickeyFuller rejects NaN');
  const n = values.length;
  if (n < 8) throw new RangeError('series too short for the ADF test');
  const cap = Math.floor(n / 2) - 2;
  const resolvedMax = Math.min(maxLag ?? Math.ceil(12 * Math.pow(n / 100, 1 / 4)), cap);
  const diff = new Float64Array(n - 1);
  for (let t = 1; t < n; t++) diff[t - 1] = values[t] - values[t - 1];
  // One QR of the widest design gives every nested lag model's SSR on the common sample (columns in lag order).
  const widest = regress(values, diff, resolvedMax, resolvedMax);
  let bestLag = 0;
  let bestAic = Infinity;
  for (let p = 0; widest && p <= resolvedMax; p++) {
    let ssr = 0;
    for (let i = p + 2; i < widest.n; i++) ssr += widest.rotatedResponse[i] ** 2;
    const aic = widest.n * Math.log(ssr / widest.n) + 2 * (p + 2);
    if (aic < bestAic) {
      bestAic = aic;
      bestLag = p;
    }
  }
  const fit = regress(values, diff, bestLag, bestLag);
  if (!fit) throw new RangeError('ADF regression is singular');
  const statistic = fit.coefficients[1] / fit.standardErrors[1];
  return {
    statistic,
    pValue: mackinnonPValue(statistic),
    lags: bestLag,
    maxLag: resolvedMax,
    nobs: fit.n,
    critical: mackinnonCritical(fit.n),
  };
}

/**
 * Regression with p lagged differences on the sample that `start` lags leave (rows t = start+1 … n−1), columns in
 * the order constant, level, lag 1 … lag p; null when it cannot be fitted.
 */
function regress(values: Float64Array, diff: Float64Array, p: number, start: number) {
  const rows = diff.length - start;
  if (rows <= p + 2) return null;
  const y = diff.subarray(start);
  const columns = [new Float64Array(rows).fill(1), values.subarray(start, start + rows)];
  for (let i = 1; i <= p; i++) columns.push(diff.subarray(start - i, start - i + rows));
  try {
    return leastSquares(y, columns);
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    return null;
  }
}
