import {hodrickPrescott} from './hodrickPrescott.js';

/**
 * One-sided (real-time) Hodrick-Prescott trend: the value at t is the last point of the two-sided trend fitted
 * to y_0…y_t only, so it uses no data after t.
 *
 * Why: the two-sided trend at the end of a sample is revised as data arrive (the end-point problem); the
 * one-sided trend is what an analyst would have seen at each date, so comparing the two at the latest points
 * shows how provisional the latest gap is. Computed from `from` onward (earlier entries are NaN).
 *
 * Reference: R. J. Hodrick and E. C. Prescott (1997), JMCB 29(1):1–16; the recursive (one-sided) use follows
 * common practice in real-time output-gap work, e.g. A. Orphanides and S. van Norden (2002), REStat 84(4):569–583.
 *
 * Complexity: O(Σ_t t) = O(n·(n − from)) time, O(n) memory. NaN policy: rejects NaN. Points t < 2 equal the data.
 *
 * @example oneSidedHodrickPrescott(Float64Array.of(1, 2, 3, 4), {lambda: 1600}) // => [1, 2, 3, 4]
 */
export function oneSidedHodrickPrescott(
  values: Float64Array,
  {lambda, from = 0}: {lambda: number; from?: number},
): Float64Array {
  const n = values.length;
  const out = new Float64Array(n).fill(NaN);
  for (let t = Math.max(0, from); t < n; t++) {
    const trend = hodrickPrescott(values.subarray(0, t + 1), {lambda});
    out[t] = trend[t];
  }
  return out;
}
