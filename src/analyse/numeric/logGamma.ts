/**
 * Natural logarithm of the gamma function for x > 0, by the Lanczos approximation (g = 7, 9 terms),
 * with the reflection formula below 0.5.
 *
 * Why: the F and beta distributions' normalising constants. Relative error about 1e-15 over x > 0.
 *
 * Reference: C. Lanczos (1964), A precision approximation of the gamma function, SIAM J. Numer. Anal.
 * B 1:86–96; coefficients as tabulated by P. Godfrey (2001) for g = 7, n = 9.
 *
 * Complexity: O(1). NaN policy: NaN in → NaN out; returns Infinity at x = 0 and NaN for x < 0.
 *
 * @example logGamma(5) // => 3.1780538303479458 (ln 24)
 */
const G = 7;
const C = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
  12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
];

export function logGamma(x: number): number {
  if (Number.isNaN(x) || x < 0) return NaN;
  if (x === 0) return Infinity;
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  const z = x - 1;
  let a = C[0];
  const t = z + G + 0.5;
  for (let i = 1; i < C.length; i++) a += C[i] / (z + i);
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(a);
}
