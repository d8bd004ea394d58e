/**
 * Standard normal draws from a uniform generator by the polar (Marsaglia) method, returning both deviates of a
 * pair in turn.
 *
 * Why: simulated ETS sample paths need Gaussian innovations from a seeded uniform source.
 * Reference: G. Marsaglia and T. A. Bray (1964), A convenient method for generating normal variables,
 * SIAM Review 6(3), 260–264.
 *
 * Complexity: O(1) expected per draw. NaN policy: not applicable.
 * @example const z = standardNormalSampler(mulberry32(1)); z() // => a N(0, 1) draw
 */
export function standardNormalSampler(uniform: () => number): () => number {
  let spare = NaN;
  return () => {
    if (!Number.isNaN(spare)) {
      const s = spare;
      spare = NaN;
      return s;
    }
    let u: number;
    let v: number;
    let s: number;
    do {
      u = 2 * uniform() - 1;
      v = 2 * uniform() - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const k = Math.sqrt((-2 * Math.log(s)) / s);
    spare = v * k;
    return u * k;
  };
}
