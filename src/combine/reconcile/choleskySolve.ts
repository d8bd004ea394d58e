/**
 * Solve A X = B for a symmetric positive-definite k × k matrix A (row-major) and a k × m right-hand side B, by
 * the Cholesky factorisation A = L Lᵀ and two triangular solves.
 *
 * Why: reconciliation solves (C W Cᵀ) X = C Ŷ with a small k (the number of totals).
 * Reference: G. H. Golub and C. F. Van Loan (2013), Matrix Computations, 4th ed., §4.2.
 * Complexity O(k³ + k² m). NaN policy: rejects NaN (returns null). Returns null when A is not positive definite
 * to working precision (a pivot ≤ 1e-12 times the largest diagonal entry).
 */
export function choleskySolve(a: Float64Array, b: Float64Array, k: number, m: number): Float64Array | null {
  const l = new Float64Array(k * k);
  let largest = 0;
  for (let i = 0; i < k; i++) largest = Math.max(largest, a[i * k + i]);
  if (!(largest > 0)) return null;
  for (let j = 0; j < k; j++) {
    let d = a[j * k + j];
    for (let p = 0; p < j; p++) d -= l[j * k + p] ** 2;
    if (!(d > 1e-12 * largest)) return null;
    l[j * k + j] = Math.sqrt(d);
    for (let i = j + 1; i < k; i++) {
      let s = a[i * k + j];
      for (let p = 0; p < j; p++) s -= l[i * k + p] * l[j * k + p];
      l[i * k + j] = s / l[j * k + j];
    }
  }
  const x = Float64Array.from(b);
  for (let c = 0; c < m; c++) {
    for (let i = 0; i < k; i++) {
      let s = x[i * m + c];
      for (let p = 0; p < i; p++) s -= l[i * k + p] * x[p * m + c];
      x[i * m + c] = s / l[i * k + i];
    }
    for (let i = k - 1; i >= 0; i--) {
      let s = x[i * m + c];
      for (let p = i + 1; p < k; p++) s -= l[p * k + i] * x[p * m + c];
      x[i * m + c] = s / l[i * k + i];
    }
  }
  return x.every(Number.isFinite) ? x : null;
}
