import {normalCdf} from '../numeric/normalCdf.js';

/**
 * MacKinnon's response-surface p-value and critical values for the Dickey-Fuller τ statistic with a constant
 * and no trend, one variable (N = 1).
 *
 * p-value: Φ(γ₀ + γ₁τ + γ₂τ² [+ γ₃τ³]) with the small-p coefficients for τ ≤ −1.61 and the large-p ones above,
 * 0 below −18.83 and 1 above 2.74 (MacKinnon 1994, Table 3). Critical values at 1, 5 and 10 %:
 * β∞ + β₁/T + β₂/T² + β₃/T³ with T the regression's observations (MacKinnon 2010, Table 2).
 * These are the published tables statsmodels' `mackinnonp`/`mackinnoncrit` implement, so results agree.
 *
 * Reference: J. G. MacKinnon (1994), Approximate asymptotic distribution functions for unit-root and
 * cointegration tests, Journal of Business & Economic Statistics 12(2):167–176; J. G. MacKinnon (2010),
 * Critical values for cointegration tests, Queen's Economics Department Working Paper 1227.
 *
 * Complexity: O(1). NaN policy: NaN in → NaN out.
 */
const SMALL_P = [2.1659, 1.4412, 3.8269e-2];
const LARGE_P = [1.7339, 9.3202e-1, -1.2745e-1, -1.0368e-2];
const TAU_STAR = -1.61;
const TAU_MIN = -18.83;
const TAU_MAX = 2.74;
/** Rows: 1 %, 5 %, 10 %; columns β∞, β₁, β₂, β₃. */
const CRITICAL = [
  [-3.43035, -6.5393, -16.786, -79.433],
  [-2.86154, -2.8903, -4.234, -40.04],
  [-2.56677, -1.5384, -2.809, 0],
];

/** @example mackinnonPValue(-2.86) // => about 0.05 */
export function mackinnonPValue(tau: number): number {
  if (Number.isNaN(tau)) return NaN;
  if (tau > TAU_MAX) return 1;
  if (tau < TAU_MIN) return 0;
  const coef = tau <= TAU_STAR ? SMALL_P : LARGE_P;
  let poly = 0;
  for (let i = coef.length - 1; i >= 0; i--) poly = poly * tau + coef[i];
  return normalCdf(poly);
}

/**
 * Critical values at 1, 5 and 10 % for a regression on `nobs` observations.
 * @example mackinnonCritical(Infinity)['5%'] // => -2.86154
 */
export function mackinnonCritical(nobs: number): {'1%': number; '5%': number; '10%': number} {
  const [c1, c5, c10] = CRITICAL.map(([b0, b1, b2, b3]) => b0 + b1 / nobs + b2 / nobs ** 2 + b3 / nobs ** 3);
  return {'1%': c1, '5%': c5, '10%': c10};
}
