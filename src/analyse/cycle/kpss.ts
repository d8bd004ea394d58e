/** Result of {@link kpss}. The p-value is interpolated in the published table, so it is clipped to 0.01–0.10. */
export interface KpssResult {
  statistic: number;
  pValue: number;
  lags: number;
}

/**
 * KPSS test of level stationarity: η = Σ S_t² / (n²·σ̂²), S_t the partial sums of y − ȳ and σ̂² the Newey-West
 * long-run variance with Bartlett weights 1 − i/(L + 1). H₀: stationary around a constant.
 *
 * Bandwidth L as statsmodels' `kpss(nlags='auto')` (Hobijn, Franses & Ooms 1998): with m = ⌊n^{2/9}⌋,
 * s₀ = γ₀ + 2Σ_{i≤m} γ_i, s₁ = 2Σ_{i≤m} i·γ_i (γ_i = Σ e_t e_{t−i}/n), L = ⌊1.1447·(s₁/s₀)^{2/3}·n^{1/3}⌋,
 * at most n − 1 (0 when s₀ = 0). The p-value is linear interpolation in the critical values 0.347, 0.463, 0.574, 0.739 for
 * 10, 5, 2.5 and 1 % (Kwiatkowski et al. 1992, Table 1).
 *
 * Reference: D. Kwiatkowski, P. C. B. Phillips, P. Schmidt and Y. Shin (1992), Testing the null hypothesis of
 * stationarity against the alternative of a unit root, Journal of Econometrics 54:159–178; N. Hobijn,
 * P. H. Franses and M. Ooms (1998), Econometric Institute Report 9802/A, Erasmus University Rotterdam.
 *
 * Complexity: O(n·(L + m)). NaN policy: rejects NaN. Throws `series too short for the KPSS test` when n < 3 and
 * `KPSS needs a varying series` for a constant one.
 */
const CRITICAL = [0.347, 0.463, 0.574, 0.739];
const P_VALUES = [0.1, 0.05, 0.025, 0.01];

export function kpss(values: Float64Array): KpssResult {
  for (const v of values) if (!Number.isFinite(v)) throw new RangeError('kpss rejects NaN');
  const n = values.length;
  if (n < 3) throw new RangeError('series too short for the KPSS test');
  if (values.every((v) => v === values[0])) throw new RangeError('KPSS needs a varying series');
  let mean = 0;
  for (const v of values) mean += v;
  mean /= n;
  const e = values.map((v) => v - mean);
  const autocovariance = (i: number): number => {
    let s = 0;
    for (let t = i; t < n; t++) s += e[t] * e[t - i];
    return s;
  };
  const m = Math.floor(Math.pow(n, 2 / 9));
  let s0 = autocovariance(0) / n;
  let s1 = 0;
  for (let i = 1; i <= m; i++) {
    const g = autocovariance(i) / (n / 2);
    s0 += g;
    s1 += i * g;
  }
  // s₀ can be zero or negative for strongly oscillating series; statsmodels squares the ratio, and we take L = 0
  // where the ratio does not exist.
  const ratio = s0 === 0 ? 0 : s1 / s0;
  const lags = Math.min(Math.floor(1.1447 * Math.pow(ratio * ratio, 1 / 3) * Math.pow(n, 1 / 3)), n - 1);
  let longRun = autocovariance(0);
  for (let i = 1; i <= lags; i++) longRun += 2 * autocovariance(i) * (1 - i / (lags + 1));
  longRun /= n;
  let partial = 0;
  let eta = 0;
  for (let t = 0; t < n; t++) {
    partial += e[t];
    eta += partial * partial;
  }
  const statistic = eta / (n * n) / longRun;
  return {statistic, pValue: interpolate(statistic), lags};
}

function interpolate(x: number): number {
  if (x <= CRITICAL[0]) return P_VALUES[0];
  for (let i = 1; i < CRITICAL.length; i++) {
    if (x <= CRITICAL[i]) {
      const f = (x - CRITICAL[i - 1]) / (CRITICAL[i] - CRITICAL[i - 1]);
      return P_VALUES[i - 1] + f * (P_VALUES[i] - P_VALUES[i - 1]);
    }
  }
  return P_VALUES[P_VALUES.length - 1];
}
