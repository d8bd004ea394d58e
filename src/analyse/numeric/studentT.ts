import {incompleteBeta} from './incompleteBeta.js';

/**
 * Two-sided p-value of Student's t statistic with `df` degrees of freedom: P(|T| ≥ |t|) = I_{df/(df+t²)}(df/2, ½).
 *
 * Why: significance of regression coefficients (calendar effects). Matches R's `2 * pt(-abs(t), df)`.
 * Reference: Abramowitz & Stegun (1964), Handbook of Mathematical Functions, 26.7.1 and 26.5.27.
 * Complexity: that of {@link incompleteBeta}. NaN policy: NaN in → NaN out; df ≤ 0 gives NaN.
 * @example studentTTwoSided(2.228138851986274, 10) // => 0.05
 */
export function studentTTwoSided(t: number, df: number): number {
  if (Number.isNaN(t) || !(df > 0)) return NaN;
  if (!Number.isFinite(t)) return 0;
  return incompleteBeta(df / (df + t * t), df / 2, 0.5);
}
