import {incompleteBeta} from './incompleteBeta.js';

/**
 * Cumulative distribution function of Fisher's F distribution with (d1, d2) degrees of freedom:
 * P(F ≤ f) = I_{d1·f/(d1·f + d2)}(d1/2, d2/2).
 *
 * Why: p-values of variance-ratio (Goldfeld-Quandt style) tests. Matches scipy.stats.f.cdf to about 1e-14.
 *
 * Reference: M. Abramowitz and I. A. Stegun (1964), Handbook of Mathematical Functions, 26.6.2.
 *
 * Complexity: that of {@link incompleteBeta}. NaN policy: NaN in → NaN out; f ≤ 0 gives 0.
 *
 * @example fCdf(1, 10, 10) // => 0.5
 */
export function fCdf(f: number, d1: number, d2: number): number {
  if (Number.isNaN(f) || !(d1 > 0 && d2 > 0)) return NaN;
  if (f <= 0) return 0;
  if (f === Infinity) return 1;
  return incompleteBeta((d1 * f) / (d1 * f + d2), d1 / 2, d2 / 2);
}
