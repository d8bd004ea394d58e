/**
 * Whether every root of the real polynomial c₀ + c₁z + … + cₙzⁿ lies inside the circle |z| ≤ 1 + `slack`,
 * decided by the Schur–Cohn recursion without computing the roots.
 *
 * Each step maps A (degree n) to T·A(z) = (cₙA(z) − c₀A*(z))/z of degree n − 1, where A* is A with its
 * coefficients reversed; A has all roots strictly inside the unit circle iff |c₀| < |cₙ| and T·A has too.
 * Roots within the slack are admitted by testing A((1 + slack)z).
 *
 * Why: the admissible region of seasonal ETS models is defined by the roots of a characteristic polynomial
 * (Hyndman, Akram & Archibald 2008); a root-free test is exact, cheap and has no convergence issues.
 * Reference: P. Henrici (1974), Applied and Computational Complex Analysis, vol. 1, §6.8 (Schur–Cohn algorithm).
 *
 * Complexity: O(n²) time, O(n) memory. NaN policy: NaN in → false.
 * @example rootsWithinUnitCircle(Float64Array.of(-0.5, 1)) // => true (root 0.5)
 */
export function rootsWithinUnitCircle(coefficients: Float64Array, slack = 1e-10): boolean {
  let n = coefficients.length - 1;
  while (n > 0 && coefficients[n] === 0) n--;
  let a = new Float64Array(n + 1);
  let scale = 1;
  for (let k = 0; k <= n; k++) {
    a[k] = coefficients[k] * scale;
    scale *= 1 + slack;
  }
  for (; n > 0; n--) {
    const lead = a[n];
    const tail = a[0];
    if (!(Math.abs(tail) < Math.abs(lead))) return false;
    const b = new Float64Array(n);
    let max = 0;
    for (let j = 0; j < n; j++) {
      b[j] = lead * a[j + 1] - tail * a[n - 1 - j];
      max = Math.max(max, Math.abs(b[j]));
    }
    // Rescale so repeated products neither overflow nor underflow.
    if (max > 0) for (let j = 0; j < n; j++) b[j] /= max;
    a = b;
  }
  return !Number.isNaN(a[0]);
}
