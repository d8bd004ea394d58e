/**
 * Nelder-Mead simplex minimisation, in the variant of Nash's Algorithm 14 ("Nelder-Mead minimisation"):
 * reflection coefficient `alpha`, contraction `beta`, expansion `gamma`, one axial start step of
 * 0.1·max|x₀ᵢ| (0.1 when x₀ = 0) unless `steps` gives one per coordinate, and a stop when the spread of
 * function values over the simplex falls below `relTol`·(|f(x₀)| + relTol) or after `maxEvaluations` evaluations.
 *
 * Why: ETS and Theta fits need a derivative-free minimiser over a handful of smoothing parameters and initial
 * states; this variant is the one statistical software has long used for those fits, so results agree with
 * published reference implementations step for step (the arithmetic order below is kept deliberately).
 * Bounds are the caller's job: return `Infinity` (or NaN) outside the feasible region; such values count as 1e35.
 * Each call also gets `bound`: a trial point whose value is at or above it is rejected whatever the value, so the
 * objective may stop early and return any value ≥ `bound` there (e.g. skip a costly feasibility test, or a sum
 * of squares that has already passed it); the search path is the same as with exact values. Vertices of the
 * start simplex and of a shrink are stored, so they get `bound = Infinity`.
 *
 * Reference: J. A. Nelder and R. Mead (1965), A simplex method for function minimization, Computer Journal 7,
 * 308–313; J. C. Nash (1990), Compact Numerical Methods for Computers, 2nd ed., Algorithm 14.
 *
 * Complexity: O(maxEvaluations · (cost of f + n)) time, O(n²) memory. The start vector is not changed.
 * NaN policy: a NaN or infinite objective value is treated as a very large value (1e35).
 * @example nelderMead((x) => (x[0] - 1) ** 2, Float64Array.of(0)).x // => ≈ [1]
 */
export interface NelderMeadOptions {
  /** Relative tolerance on function values. Default: √ε ≈ 1.49e-8. */
  relTol?: number;
  /** Stop as soon as the best value is at or below this. Default: −Infinity. */
  absTol?: number;
  /** Reflection coefficient. Default: 1. */
  alpha?: number;
  /** Contraction coefficient. Default: 0.5. */
  beta?: number;
  /** Expansion coefficient. Default: 2. */
  gamma?: number;
  /** Maximum number of function evaluations. Default: 500. */
  maxEvaluations?: number;
  /**
   * Start step along each coordinate, for a start already near the minimum (a smaller simplex than the one axial
   * step suited to a rough start); a step that is not positive falls back to the one step. Default: null.
   */
  steps?: Float64Array | null;
}

export interface NelderMeadResult {
  x: Float64Array;
  value: number;
  evaluations: number;
  /** True when the tolerance was met (false: evaluation limit or a shrink that did not shrink). */
  converged: boolean;
}

const BIG = 1e35;

/**
 * Start steps for a search that begins at a previous fit's estimates (`steps` above): 5% of each coordinate, 0.01
 * for a zero. The start is close, and the usual single step (a tenth of the largest coordinate) would throw the
 * small ones out of range.
 */
export function warmSteps(start: Float64Array): Float64Array {
  return start.map((x) => (x === 0 ? 0.01 : 0.05 * Math.abs(x)));
}

export function nelderMead(
  f: (x: Float64Array, bound: number) => number,
  start: Float64Array,
  {maxEvaluations = 500, ...options}: NelderMeadOptions = {},
): NelderMeadResult {
  return nelderMeadSearch(f, start, options).run(maxEvaluations);
}

/** A Nelder-Mead search that can be run in stages: `run(a)` then `run(b)` takes exactly the path of `run(b)`. */
export interface NelderMeadSearch {
  /** Go on until more than `limit` evaluations in all (or a stop); the best point so far. */
  run(limit: number): NelderMeadResult;
  /** True once the search has stopped for good (tolerance met, or a shrink that did not shrink). */
  readonly stopped: boolean;
  /** Evaluations so far and the best value so far. */
  readonly evaluations: number;
  readonly value: number;
}

/**
 * The search of {@link nelderMead} as an object, so a caller can look at the best value between stages and give
 * up on a search that cannot pay (see etsScreen.ts). Throws when the objective is not finite at the start.
 */
export function nelderMeadSearch(
  f: (x: Float64Array, bound: number) => number,
  start: Float64Array,
  {
    relTol = Math.sqrt(Number.EPSILON),
    absTol = -Infinity,
    alpha = 1,
    beta = 0.5,
    gamma = 2,
    steps = null,
  }: Omit<NelderMeadOptions, 'maxEvaluations'> = {},
): NelderMeadSearch {
  const n = start.length;
  const x = Float64Array.from(start);
  const f0 = f(x, Infinity);
  if (!Number.isFinite(f0)) throw new RangeError('objective not finite at the start point');
  if (n === 0) {
    const result = {x, value: f0, evaluations: 1, converged: true};
    return {run: () => ({...result, x: Float64Array.from(x)}), stopped: true, evaluations: 1, value: f0};
  }
  const safe = (v: number): number => (Number.isFinite(v) ? v : BIG);
  // Simplex: n + 1 vertices, each a Float64Array of n coordinates, and their values.
  const p: Float64Array[] = [];
  const fv = new Float64Array(n + 1);
  p.push(Float64Array.from(start));
  fv[0] = f0;
  let evaluations = 1;
  const convTol = relTol * (Math.abs(f0) + relTol);
  let step = 0;
  for (let i = 0; i < n; i++) step = Math.max(step, 0.1 * Math.abs(start[i]));
  if (step === 0) step = 0.1;
  let size = 0;
  for (let j = 1; j <= n; j++) {
    const v = Float64Array.from(start);
    let tryStep = steps !== null && steps[j - 1] > 0 ? steps[j - 1] : step;
    // Grow the step until it changes the coordinate (tiny steps vanish against large values).
    while (v[j - 1] === start[j - 1]) {
      v[j - 1] = start[j - 1] + tryStep;
      tryStep *= 10;
    }
    size += tryStep;
    p.push(v);
  }
  let oldSize = size;
  let recompute = true;
  let best = 0;
  let converged = false;
  let stopped = false;
  const centroid = new Float64Array(n);
  // One iteration of the original loop; false when the search stops.
  const iterate = (): boolean => {
    if (recompute) {
      for (let j = 0; j <= n; j++) {
        if (j === best) continue;
        fv[j] = safe(f(p[j], Infinity));
        evaluations++;
      }
      recompute = false;
    }
    let low = fv[best];
    let high = low;
    let worst = best;
    for (let j = 0; j <= n; j++) {
      if (j === best) continue;
      const v = fv[j];
      if (v < low) {
        best = j;
        low = v;
      }
      if (v > high) {
        worst = j;
        high = v;
      }
    }
    if (high <= low + convTol || low <= absTol) {
      converged = true;
      return false;
    }
    for (let i = 0; i < n; i++) {
      let t = -p[worst][i];
      for (let j = 0; j <= n; j++) t += p[j][i];
      centroid[i] = t / n;
    }
    for (let i = 0; i < n; i++) x[i] = (1 + alpha) * centroid[i] - alpha * p[worst][i];
    // Only a reflected value below the worst is kept (or leads to an expansion); at or above it, a contraction
    // follows and the shrink test asks only whether it was at or above.
    const reflected = safe(f(x, high));
    evaluations++;
    if (reflected < low) {
      // Try an expansion; keep the reflected point in `centroid` meanwhile.
      for (let i = 0; i < n; i++) {
        const e = gamma * x[i] + (1 - gamma) * centroid[i];
        centroid[i] = x[i];
        x[i] = e;
      }
      const expanded = safe(f(x, reflected));
      evaluations++;
      if (expanded < reflected) {
        p[worst].set(x);
        fv[worst] = expanded;
      } else {
        p[worst].set(centroid);
        fv[worst] = reflected;
      }
    } else {
      if (reflected < high) {
        p[worst].set(x);
        fv[worst] = reflected;
      }
      for (let i = 0; i < n; i++) x[i] = (1 - beta) * p[worst][i] + beta * centroid[i];
      const contracted = safe(f(x, fv[worst]));
      evaluations++;
      if (contracted < fv[worst]) {
        p[worst].set(x);
        fv[worst] = contracted;
      } else if (reflected >= high) {
        recompute = true;
        size = 0;
        for (let j = 0; j <= n; j++) {
          if (j === best) continue;
          for (let i = 0; i < n; i++) {
            p[j][i] = beta * (p[j][i] - p[best][i]) + p[best][i];
            size += Math.abs(p[j][i] - p[best][i]);
          }
        }
        if (size < oldSize) oldSize = size;
        else return false;
      }
    }
    return true;
  };
  return {
    run(limit: number): NelderMeadResult {
      // The original loop runs its first iteration unconditionally: evaluations is 1 then, within any limit.
      while (!stopped && (evaluations <= limit || evaluations === 1)) stopped = !iterate();
      return {x: Float64Array.from(p[best]), value: fv[best], evaluations, converged};
    },
    get stopped() {
      return stopped;
    },
    get evaluations() {
      return evaluations;
    },
    get value() {
      return fv[best];
    },
  };
}
