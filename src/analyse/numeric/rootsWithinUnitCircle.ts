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
 * Complexity: O(n²) time, O(n) memory (scratch buffers shared between calls; the input is not changed).
 * NaN policy: NaN in → false.
 * @example rootsWithinUnitCircle(Float64Array.of(-0.5, 1)) // => true (root 0.5)
 */
// Scratch buffers reused across calls (the routine is called thousands of times per model fit).
let bufA = new Float64Array(32);
let bufB = new Float64Array(32);

export function rootsWithinUnitCircle(coefficients: ArrayLike<number>, slack = 1e-10): boolean {
  let n = coefficients.length - 1;
  while (n > 0 && coefficients[n] === 0) n--;
  if (bufA.length < n + 1) {
    bufA = new Float64Array(2 * (n + 1));
    bufB = new Float64Array(2 * (n + 1));
  }
  let a = bufA;
  let b = bufB;
  let scale = 1;
  for (let k = 0; k <= n; k++) {
    a[k] = coefficients[k] * scale;
    scale *= 1 + slack;
  }
  for (; n > 0; n--) {
    const lead = a[n];
    const tail = a[0];
    if (!(Math.abs(tail) < Math.abs(lead))) return false;
    let max = 0;
    for (let j = 0; j < n; j++) {
      const v = lead * a[j + 1] - tail * a[n - 1 - j];
      b[j] = v;
      if (Math.abs(v) > max) max = Math.abs(v);
    }
    // Rescale so repeated products neither overflow nor underflow.
    if (max > 0) for (let j = 0; j < n; j++) b[j] /= max;
    const t = a;
    a = b;
    b = t;
  }
  return !Number.isNaN(a[0]);
}
