/**
 * Solve A·x = rhs for a symmetric positive-definite pentadiagonal matrix A by an LDLᵀ factorisation.
 *
 * A is given by its three distinct bands: `diagonal` (length n), `first` (A[i][i+1], length n − 1) and
 * `second` (A[i][i+2], length n − 2). Why: the Hodrick-Prescott normal equations (I + λ·DᵀD)·τ = y are
 * pentadiagonal, and a banded factorisation solves them exactly in linear time instead of O(n³).
 *
 * Reference: G. H. Golub and C. F. Van Loan (2013), Matrix Computations, 4th ed., §4.3 (band LDLᵀ).
 *
 * Complexity: O(n) time and O(n) extra memory. Returns a new array; the inputs are not changed.
 *
 * NaN policy: NaN in → NaN out (a NaN right-hand side spreads through the solve). No pivoting: A must be
 * positive definite, which I + λ·DᵀD is for every λ ≥ 0.
 *
 * @example
 * solveSymmetricPentadiagonal(Float64Array.of(2, 2), Float64Array.of(1), new Float64Array(0), Float64Array.of(3, 3)) // => [1, 1]
 */
export function solveSymmetricPentadiagonal(
  diagonal: Float64Array,
  first: Float64Array,
  second: Float64Array,
  rhs: Float64Array,
): Float64Array {
  const n = diagonal.length;
  if (rhs.length !== n || first.length !== Math.max(0, n - 1) || second.length !== Math.max(0, n - 2)) {
    throw new RangeError('pentadiagonal band lengths do not match');
  }
  // d: pivots of D; l1, l2: the two sub-diagonals of the unit lower factor L.
  const d = new Float64Array(n);
  const l1 = new Float64Array(n);
  const l2 = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let di = diagonal[i];
    if (i >= 1) di -= l1[i - 1] * l1[i - 1] * d[i - 1];
    if (i >= 2) di -= l2[i - 2] * l2[i - 2] * d[i - 2];
    d[i] = di;
    if (i + 1 < n) l1[i] = (first[i] - (i >= 1 ? l2[i - 1] * l1[i - 1] * d[i - 1] : 0)) / di;
    if (i + 2 < n) l2[i] = second[i] / di;
  }
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let z = rhs[i];
    if (i >= 1) z -= l1[i - 1] * x[i - 1];
    if (i >= 2) z -= l2[i - 2] * x[i - 2];
    x[i] = z;
  }
  for (let i = 0; i < n; i++) x[i] /= d[i];
  for (let i = n - 1; i >= 0; i--) {
    if (i + 1 < n) x[i] -= l1[i] * x[i + 1];
    if (i + 2 < n) x[i] -= l2[i] * x[i + 2];
  }
  return x;
}
