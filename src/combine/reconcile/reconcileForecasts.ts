import {choleskySolve} from './choleskySolve.js';
import {constraintMatrix, type Constraint} from './hierarchy.js';

export type ReconcileMethod = 'mint' | 'ols' | 'bottom-up' | 'none';

/**
 * Reconcile base forecasts so that every total equals the sum of its parts, at every horizon:
 * ỹ = ŷ − W Cᵀ (C W Cᵀ)⁻¹ C ŷ, the projection of ŷ onto the coherent subspace {y : C y = 0} in the metric W⁻¹.
 *
 * For a hierarchy with summing matrix S (y = S b) this equals the MinT estimator ỹ = S (Sᵀ W⁻¹ S)⁻¹ Sᵀ W⁻¹ ŷ of
 * Wickramasuriya, Athanasopoulos and Hyndman (2019, JASA 114:804–819); the constraint form also covers a
 * total broken down in two ways (grouped series), and needs W only, never W⁻¹. W is: the shrunk covariance of
 * the in-sample one-step errors (`mint`, see shrinkCovariance.ts), the identity (`ols`), or 1 for totals and 0
 * for parts that are no total (`bottom-up`: parts keep their forecasts and each total becomes the sum of its
 * parts; needs each total broken down one way only). `none` returns the base forecasts.
 * The equivalence of the constraint and summing-matrix forms is checked against numpy in
 * test/reference/reconcile.py.
 *
 * NaN policy: rejects NaN (returns null). Returns null when C W Cᵀ is singular (e.g. `bottom-up` on a total
 * broken down twice). Complexity O(k³ + k n h + n² k) for k constraints, n series, h horizons.
 *
 * @param base n × h base forecasts, row-major (series i, horizon j at i·h + j)
 * @param w n × n, row-major; ignored for `ols`, `bottom-up` and `none`
 */
export function reconcileForecasts(
  base: Float64Array,
  {
    n,
    h,
    constraints,
    method,
    w,
  }: {n: number; h: number; constraints: readonly Constraint[]; method: ReconcileMethod; w?: Float64Array},
): Float64Array | null {
  if (method === 'none' || constraints.length === 0) return Float64Array.from(base);
  if (!base.every(Number.isFinite)) return null;
  const k = constraints.length;
  const c = constraintMatrix(constraints, n);
  const totals = new Set(constraints.map((x) => x.total));
  const weight =
    method === 'mint'
      ? w!
      : Float64Array.from({length: n * n}, (_, idx) => {
          const i = Math.floor(idx / n);
          if (idx % n !== i) return 0;
          return method === 'ols' || totals.has(i) ? 1 : 0;
        });
  // WCᵀ (n × k)
  const wct = new Float64Array(n * k);
  for (let i = 0; i < n; i++)
    for (let j = 0; j < k; j++) {
      let s = 0;
      for (let p = 0; p < n; p++) s += weight[i * n + p] * c[j * n + p];
      wct[i * k + j] = s;
    }
  // C W Cᵀ (k × k) and C ŷ (k × h)
  const cwc = new Float64Array(k * k);
  for (let a = 0; a < k; a++)
    for (let b = 0; b < k; b++) {
      let s = 0;
      for (let p = 0; p < n; p++) s += c[a * n + p] * wct[p * k + b];
      cwc[a * k + b] = s;
    }
  const cy = new Float64Array(k * h);
  for (let a = 0; a < k; a++)
    for (let j = 0; j < h; j++) {
      let s = 0;
      for (let p = 0; p < n; p++) s += c[a * n + p] * base[p * h + j];
      cy[a * h + j] = s;
    }
  const x = choleskySolve(cwc, cy, k, h);
  if (x === null) return null;
  const out = Float64Array.from(base);
  for (let i = 0; i < n; i++)
    for (let j = 0; j < h; j++) {
      let s = 0;
      for (let a = 0; a < k; a++) s += wct[i * k + a] * x[a * h + j];
      out[i * h + j] -= s;
    }
  return out;
}
