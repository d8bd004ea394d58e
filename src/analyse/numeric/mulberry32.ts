/**
 * Mulberry32: a 32-bit-state pseudo-random generator returning uniforms in [0, 1).
 *
 * Why: simulated prediction intervals must be reproducible (same inputs, same bytes), so randomness is always
 * seeded and passed in. Mulberry32 is tiny, fast and passes the usual statistical batteries for the few
 * thousand draws a simulation needs; it is not for cryptography.
 * Reference: T. Ettinger (2017), public-domain generator "Mulberry32" (a SplitMix-style output mix).
 *
 * Complexity: O(1) per draw. NaN policy: not applicable (the seed is coerced to an unsigned 32-bit integer).
 * @example const u = mulberry32(42); u() // => same number on every run
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
