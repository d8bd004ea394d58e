import {solveSymmetricPentadiagonal} from '../numeric/pentadiagonal.js';

/**
 * Hodrick-Prescott trend: the τ that minimises Σ (y_t − τ_t)² + λ Σ (Δ²τ_t)², i.e. the solution of
 * (I + λ·DᵀD)·τ = y with D the (n − 2) × n second-difference matrix.
 *
 * Why: the long-run trend against which the cycle (gap) is measured. The system is pentadiagonal and is solved
 * exactly, so the trend equals the dense solve (statsmodels' `hpfilter`, R mFilter `hpfilter`) to rounding.
 * The cycle is y − τ. Being two-sided, the last few trend values move when new data arrive; see
 * {@link oneSidedHodrickPrescott} for the real-time version.
 *
 * Reference: R. J. Hodrick and E. C. Prescott (1997), Postwar U.S. business cycles: an empirical investigation,
 * Journal of Money, Credit and Banking 29(1):1–16.
 *
 * Complexity: O(n) time and memory. NaN policy: rejects NaN (fill gaps first). Series of one or two values are
 * returned unchanged (no second difference exists). Returns a new array.
 *
 * @example hodrickPrescott(Float64Array.of(1, 2, 3, 4), {lambda: 1600}) // => [1, 2, 3, 4] (a line is its own trend)
 */
export function hodrickPrescott(values: Float64Array, {lambda}: {lambda: number}): Float64Array {
  if (!(lambda >= 0) || !Number.isFinite(lambda)) throw new RangeError(`invalid lambda: ${lambda}`);
  for (const v of values) if (!Number.isFinite(v)) throw new RangeError('hodrickPrescott rejects NaN');
  const n = values.length;
  if (n < 3) return Float64Array.from(values);
  const diagonal = new Float64Array(n);
  const first = new Float64Array(n - 1);
  const second = new Float64Array(n - 2).fill(lambda);
  // Row r of D is (1, −2, 1) at columns r, r+1, r+2; accumulate DᵀD's bands row by row.
  for (let r = 0; r < n - 2; r++) {
    diagonal[r] += lambda;
    diagonal[r + 1] += 4 * lambda;
    diagonal[r + 2] += lambda;
    first[r] -= 2 * lambda;
    first[r + 1] -= 2 * lambda;
  }
  for (let i = 0; i < n; i++) diagonal[i] += 1;
  return solveSymmetricPentadiagonal(diagonal, first, second, values);
}
