import {logGamma} from './logGamma.js';

/**
 * Regularised incomplete beta function I_x(a, b) = B(x; a, b) / B(a, b) for 0 ≤ x ≤ 1, a, b > 0.
 *
 * Why: the F (and Student t) distribution functions are incomplete beta functions, e.g.
 * P(F ≤ f) = I_{d1·f/(d1·f + d2)}(d1/2, d2/2). Evaluated by the continued fraction of Abramowitz & Stegun
 * 26.5.8 with the modified Lentz algorithm, using the symmetry I_x(a, b) = 1 − I_{1−x}(b, a) so the fraction
 * converges fast (x < (a + 1)/(a + b + 2)).
 *
 * Reference: M. Abramowitz and I. A. Stegun (1964), Handbook of Mathematical Functions, 26.5.8;
 * W. J. Lentz (1976), Applied Optics 15:668–671; W. H. Press et al. (2007), Numerical Recipes, 3rd ed., §6.4.
 *
 * Complexity: O(√max(a, b)) iterations (at most 300). NaN policy: NaN in → NaN out; x outside [0, 1] or
 * a, b ≤ 0 give NaN.
 *
 * @example incompleteBeta(0.5, 2, 3) // => 0.6875
 */
export function incompleteBeta(x: number, a: number, b: number): number {
  if (!(x >= 0 && x <= 1 && a > 0 && b > 0)) return NaN;
  if (x === 0 || x === 1) return x;
  const logFront = logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log1p(-x);
  if (x < (a + 1) / (a + b + 2)) return (Math.exp(logFront) * betaFraction(x, a, b)) / a;
  return 1 - (Math.exp(logFront) * betaFraction(1 - x, b, a)) / b;
}

const TINY = 1e-300;

function betaFraction(x: number, a: number, b: number): number {
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 300; m++) {
    const m2 = 2 * m;
    // Even step d_{2m}, then odd step d_{2m+1} of A&S 26.5.8.
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < 1e-15) break;
  }
  return h;
}
