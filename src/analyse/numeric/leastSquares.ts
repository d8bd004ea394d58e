/**
 * Ordinary least squares by Householder QR: coefficients, residual sum of squares and standard errors.
 *
 * `columns` holds the regressors, one Float64Array of length n per column (add a column of ones for a
 * constant). Why: unit-root regressions need t-statistics to about 1e-8; QR avoids forming XᵀX, whose
 * condition number is the square of X's.
 *
 * Reference: G. H. Golub and C. F. Van Loan (2013), Matrix Computations, 4th ed., §5.3 (LS by QR).
 *
 * Complexity: O(n·k²) time, O(n·k) memory. The inputs are not changed.
 *
 * NaN policy: rejects NaN by contract (the caller passes complete rows); a NaN spreads to every output.
 * Throws when n ≤ k or a column is an exact linear combination of earlier ones (rank deficient).
 */
export interface LeastSquaresFit {
  coefficients: Float64Array;
  standardErrors: Float64Array;
  residualSumOfSquares: number;
  /** Observations used. */
  n: number;
  /**
   * Qᵀy. Because Householder QR treats columns in order, the fit on the first j columns alone has residual sum of
   * squares Σ_{i≥j} (Qᵀy)_i², so nested models (e.g. lag-length searches) need one factorisation, not one each.
   */
  rotatedResponse: Float64Array;
}

export function leastSquares(y: Float64Array, columns: Float64Array[]): LeastSquaresFit {
  const n = y.length;
  const k = columns.length;
  if (k === 0 || n <= k) throw new RangeError('least squares needs more rows than columns');
  const a = columns.map((c) => {
    if (c.length !== n) throw new RangeError('least squares column length does not match');
    return Float64Array.from(c);
  });
  const b = Float64Array.from(y);
  const r = new Float64Array(k * k); // upper triangle, row-major
  for (let j = 0; j < k; j++) {
    const v = a[j];
    let norm = 0;
    for (let i = j; i < n; i++) norm += v[i] * v[i];
    norm = Math.sqrt(norm);
    let scale = 0;
    for (const c of columns[j]) scale = Math.max(scale, Math.abs(c));
    if (norm <= 1e-13 * scale * Math.sqrt(n)) throw new RangeError('least squares design is rank deficient');
    const alpha = v[j] > 0 ? -norm : norm;
    v[j] -= alpha;
    let vv = 0;
    for (let i = j; i < n; i++) vv += v[i] * v[i];
    // Reflect the remaining columns and the response with H = I − 2vvᵀ/vᵀv.
    for (let m = j + 1; m < k; m++) {
      const w = a[m];
      let dot = 0;
      for (let i = j; i < n; i++) dot += v[i] * w[i];
      const f = (2 * dot) / vv;
      for (let i = j; i < n; i++) w[i] -= f * v[i];
    }
    let dot = 0;
    for (let i = j; i < n; i++) dot += v[i] * b[i];
    const f = (2 * dot) / vv;
    for (let i = j; i < n; i++) b[i] -= f * v[i];
    r[j * k + j] = alpha;
    for (let m = j + 1; m < k; m++) r[j * k + m] = a[m][j];
  }
  const coefficients = new Float64Array(k);
  for (let j = k - 1; j >= 0; j--) {
    let s = b[j];
    for (let m = j + 1; m < k; m++) s -= r[j * k + m] * coefficients[m];
    coefficients[j] = s / r[j * k + j];
  }
  let residualSumOfSquares = 0;
  for (let i = k; i < n; i++) residualSumOfSquares += b[i] * b[i];
  // diag((XᵀX)⁻¹) = row sums of squares of R⁻¹; R⁻¹ by back-substitution, one column at a time.
  const rInv = new Float64Array(k * k);
  for (let c = 0; c < k; c++) {
    for (let j = c; j >= 0; j--) {
      let s = j === c ? 1 : 0;
      for (let m = j + 1; m <= c; m++) s -= r[j * k + m] * rInv[m * k + c];
      rInv[j * k + c] = s / r[j * k + j];
    }
  }
  const sigma2 = residualSumOfSquares / (n - k);
  const standardErrors = new Float64Array(k);
  for (let j = 0; j < k; j++) {
    let s = 0;
    for (let c = j; c < k; c++) s += rInv[j * k + c] * rInv[j * k + c];
    standardErrors[j] = Math.sqrt(sigma2 * s);
  }
  return {coefficients, standardErrors, residualSumOfSquares, n, rotatedResponse: b};
}
