/**
 * Minimise a smooth function with box bounds by projected BFGS: a quasi-Newton direction from a dense inverse
 * Hessian approximation on the variables that are not held at a bound (a variable at its bound whose gradient
 * points outwards is held there for the step, as in Bertsekas' projected Newton method), a backtracking line
 * search along the projected path x(t) = P(x + t·d) with the Armijo condition, and the BFGS update of the
 * inverse Hessian (scaled by sᵀy / yᵀy before the first update). Constraints other than the box may be stated
 * by returning Infinity (or NaN): the line search then shortens the step. The search works in scaled coordinates
 * x / `scale`, so variables of very different sizes (smoothing parameters and states of a level) are comparable.
 *
 * Stops when a step lowers f by less than `relTol`·(|f| + relTol) or the line search finds no lower point (each
 * once more after starting the approximation again from the identity), when the projected gradient vanishes, or
 * after `maxIterations` iterations.
 *
 * Why: the likelihood of an exponential smoothing model with a dozen initial states takes a simplex search
 * 1,500–2,000 evaluations; with its gradient (etsGradient.ts), a quasi-Newton search needs far fewer.
 * Reference: J. Nocedal and S. J. Wright (2006), Numerical Optimization, 2nd ed., §6.1 (BFGS, eq. 6.17 and
 * 6.20) and §3.1 (Armijo backtracking); D. P. Bertsekas (1982), Projected Newton methods for optimization
 * problems with simple constraints, SIAM J. Control Optim. 20, 221–246; R. H. Byrd, P. Lu, J. Nocedal and
 * C. Zhu (1995), A limited memory algorithm for bound constrained optimization, SIAM J. Sci. Comput. 16,
 * 1190–1208 (the same active-set idea with a limited memory).
 *
 * Complexity: O(iterations · (cost of f + k²)) for k variables, O(k²) memory. The start vector is not changed
 * (it is projected into the box first). NaN policy: a NaN or infinite value is infeasible; throws when the
 * start is.
 * @example
 * const f = (x: Float64Array, g: Float64Array) => ((g[0] = 2 * (x[0] - 3)), (x[0] - 3) ** 2);
 * projectedBfgs(f, Float64Array.of(0), {upper: Float64Array.of(2)}).x // => [2]
 */
export interface ProjectedBfgsOptions {
  /** Lower bounds (−Infinity for none). Default: all −Infinity. */
  lower?: Float64Array;
  /** Upper bounds (Infinity for none). Default: all Infinity. */
  upper?: Float64Array;
  /** Typical size of each variable (positive). Default: all 1. */
  scale?: Float64Array;
  /** Default: 100. */
  maxIterations?: number;
  /** Relative decrease of f below which the search stops. Default: 1e-10. */
  relTol?: number;
  /**
   * Inverse Hessian approximation to start from (k × k, row-major, in scaled coordinates), e.g. a search's
   * `inverseHessian` on a slightly different function: the first step is then a quasi-Newton step. Ignored when
   * its size is not k × k. Default: the identity, scaled after the first step.
   */
  inverseHessian?: Float64Array | null;
}

export interface ProjectedBfgsResult {
  x: Float64Array;
  value: number;
  /** Evaluations of f (each with its gradient). */
  evaluations: number;
  iterations: number;
  /** The inverse Hessian approximation at the end (scaled coordinates), to warm-start a related search. */
  inverseHessian: Float64Array;
}

const ARMIJO = 1e-4;
const MAX_BACKTRACKS = 40;

export function projectedBfgs(
  fg: (x: Float64Array, gradient: Float64Array) => number,
  start: Float64Array,
  {lower, upper, scale, maxIterations = 100, relTol = 1e-10, inverseHessian = null}: ProjectedBfgsOptions = {},
): ProjectedBfgsResult {
  const k = start.length;
  const sc = scale ?? new Float64Array(k).fill(1);
  const lo = Float64Array.from({length: k}, (_, i) => (lower ? lower[i] / sc[i] : -Infinity));
  const hi = Float64Array.from({length: k}, (_, i) => (upper ? upper[i] / sc[i] : Infinity));
  const z = Float64Array.from({length: k}, (_, i) => Math.min(hi[i], Math.max(lo[i], start[i] / sc[i])));
  const xBuf = new Float64Array(k);
  const gBuf = new Float64Array(k);
  let evaluations = 0;
  // f and its gradient in scaled coordinates; Infinity for an infeasible point.
  const evaluate = (at: Float64Array, g: Float64Array): number => {
    for (let i = 0; i < k; i++) xBuf[i] = at[i] * sc[i];
    evaluations++;
    const v = fg(xBuf, gBuf);
    if (!Number.isFinite(v)) return Infinity;
    for (let i = 0; i < k; i++) {
      g[i] = gBuf[i] * sc[i];
      if (!Number.isFinite(g[i])) return Infinity;
    }
    return v;
  };
  const g = new Float64Array(k);
  let f = evaluate(z, g);
  if (!Number.isFinite(f)) throw new RangeError('objective not finite at the start point');
  const H = new Float64Array(k * k);
  // The last learnt approximation (a stop first starts again from the identity, which is no curvature to pass on).
  let learnt: Float64Array | null = null;
  const resetH = (): void => {
    if (updated) learnt = Float64Array.from(H);
    H.fill(0);
    for (let i = 0; i < k; i++) H[i * k + i] = 1;
  };
  let updated = false;
  resetH();
  if (inverseHessian && inverseHessian.length === k * k) {
    H.set(inverseHessian);
    updated = true;
  }
  const d = new Float64Array(k);
  const held = new Uint8Array(k);
  const zNew = new Float64Array(k);
  const gNew = new Float64Array(k);
  const s = new Float64Array(k);
  const yv = new Float64Array(k);
  const Hy = new Float64Array(k);
  let iterations = 0;
  while (iterations < maxIterations) {
    iterations++;
    let projected = 0;
    for (let i = 0; i < k; i++) {
      held[i] = (z[i] <= lo[i] && g[i] > 0) || (z[i] >= hi[i] && g[i] < 0) ? 1 : 0;
      if (!held[i]) projected = Math.max(projected, Math.abs(g[i]));
    }
    if (projected === 0) break;
    let slope = 0;
    for (let i = 0; i < k; i++) {
      let v = 0;
      if (!held[i]) for (let j = 0; j < k; j++) if (!held[j]) v -= H[i * k + j] * g[j];
      d[i] = v;
      slope += v * g[i];
    }
    if (!(slope < 0)) {
      // Not a descent direction (a stale approximation): start again from steepest descent.
      resetH();
      updated = false;
      slope = 0;
      for (let i = 0; i < k; i++) {
        d[i] = held[i] ? 0 : -g[i];
        slope -= d[i] * d[i];
      }
    }
    // The first step of steepest descent is kept within a unit length in scaled coordinates.
    let t = updated ? 1 : Math.min(1, 1 / Math.sqrt(-slope));
    let fNew = Infinity;
    let accepted = false;
    for (let back = 0; back < MAX_BACKTRACKS; back++) {
      let decrease = 0;
      for (let i = 0; i < k; i++) {
        zNew[i] = Math.min(hi[i], Math.max(lo[i], z[i] + t * d[i]));
        decrease += g[i] * (zNew[i] - z[i]);
      }
      fNew = evaluate(zNew, gNew);
      if (fNew <= f + ARMIJO * decrease) {
        accepted = true;
        break;
      }
      // The minimum of the quadratic through f, the slope and fNew, kept within [0.1, 0.5] of the step.
      const curvature = fNew - f - decrease;
      const next = Number.isFinite(fNew) && curvature > 0 ? (-decrease * t) / (2 * curvature) : 0.5 * t;
      t = Math.min(0.5 * t, Math.max(0.1 * t, next));
    }
    // A failed or tiny step with a learnt approximation may be the approximation's fault: start it again once
    // from steepest descent before stopping.
    if (!accepted) {
      if (!updated) break;
      resetH();
      updated = false;
      continue;
    }
    let sy = 0;
    let yy = 0;
    let ss = 0;
    for (let i = 0; i < k; i++) {
      // The update lives in the space of the variables moved: a held variable's change of gradient is left out.
      s[i] = zNew[i] - z[i];
      yv[i] = held[i] ? 0 : gNew[i] - g[i];
      sy += s[i] * yv[i];
      yy += yv[i] * yv[i];
      ss += s[i] * s[i];
    }
    const change = f - fNew;
    z.set(zNew);
    g.set(gNew);
    f = fNew;
    if (change <= relTol * (Math.abs(f) + relTol)) {
      if (!updated) break;
      resetH();
      updated = false;
      continue;
    }
    if (sy > 1e-12 * Math.sqrt(yy * ss)) {
      if (!updated) {
        const gammaScale = sy / yy;
        for (let i = 0; i < k * k; i++) H[i] *= gammaScale;
        updated = true;
      }
      // H ← (I − ρsyᵀ) H (I − ρysᵀ) + ρssᵀ, written as H − ρ(s(Hy)ᵀ + (Hy)sᵀ) + (ρ²·yᵀHy + ρ)ssᵀ.
      const rho = 1 / sy;
      let yHy = 0;
      for (let i = 0; i < k; i++) {
        let v = 0;
        for (let j = 0; j < k; j++) v += H[i * k + j] * yv[j];
        Hy[i] = v;
        yHy += yv[i] * v;
      }
      const c = rho * rho * yHy + rho;
      for (let i = 0; i < k; i++) {
        for (let j = 0; j < k; j++) H[i * k + j] += -rho * (s[i] * Hy[j] + Hy[i] * s[j]) + c * s[i] * s[j];
      }
    }
  }
  const x = Float64Array.from(z, (v, i) => v * sc[i]);
  return {x, value: f, evaluations, iterations, inverseHessian: updated ? H : (learnt ?? H)};
}
