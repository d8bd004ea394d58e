import {describe, expect, it} from 'vitest';
import {projectedBfgs} from '../../../src/analyse/numeric/projectedBfgs.js';

// Rosenbrock's function, f = 100(x₂ − x₁²)² + (1 − x₁)², minimum 0 at (1, 1) (H. H. Rosenbrock 1960, The Computer
// Journal 3, 175–184); with the bound x₁ ≤ 0.5 the minimum is at x₁ = 0.5, x₂ = x₁² = 0.25 (for fixed x₁ the first
// term vanishes at x₂ = x₁², and (1 − x₁)² falls towards the bound), value 0.25.
const rosenbrock = (x: Float64Array, g: Float64Array): number => {
  const a = x[1] - x[0] * x[0];
  g[0] = -400 * x[0] * a - 2 * (1 - x[0]);
  g[1] = 200 * a;
  return 100 * a * a + (1 - x[0]) ** 2;
};

describe('projectedBfgs', () => {
  it('Rosenbrock from (−1.2, 1): the minimum (1, 1) in far fewer evaluations than a simplex search', () => {
    const r = projectedBfgs(rosenbrock, Float64Array.of(-1.2, 1), {relTol: 1e-14, maxIterations: 500});
    expect(r.x[0]).toBeCloseTo(1, 5);
    expect(r.x[1]).toBeCloseTo(1, 5);
    expect(r.value).toBeLessThan(1e-10);
    expect(r.evaluations).toBeLessThan(150);
  });

  it('Rosenbrock with x₁ ≤ 0.5: the minimum on the bound, (0.5, 0.25)', () => {
    const r = projectedBfgs(rosenbrock, Float64Array.of(-1.2, 1), {
      upper: Float64Array.of(0.5, Infinity),
      relTol: 1e-14,
      maxIterations: 500,
    });
    expect(r.x[0]).toBe(0.5);
    expect(r.x[1]).toBeCloseTo(0.25, 6);
    expect(r.value).toBeCloseTo(0.25, 10);
  });

  it('variables of very different sizes, scaled: a quadratic with its minimum at (1e4, 1e-3)', () => {
    const f = (x: Float64Array, g: Float64Array): number => {
      const [u, v] = [(x[0] - 1e4) / 1e3, (x[1] - 1e-3) / 1e-3];
      g[0] = (2 * u + v) / 1e3;
      g[1] = (u + 2 * v) / 1e-3;
      return u * u + u * v + v * v;
    };
    const r = projectedBfgs(f, Float64Array.of(0, 0), {scale: Float64Array.of(1e3, 1e-3), relTol: 1e-14});
    expect(r.x[0]).toBeCloseTo(1e4, 4);
    expect(r.x[1]).toBeCloseTo(1e-3, 9);
  });

  it('a constraint stated by Infinity shortens the step; the start is projected and not changed', () => {
    const start = Float64Array.of(5);
    const f = (x: Float64Array, g: Float64Array): number => {
      g[0] = 2 * (x[0] + 1);
      return x[0] < 0.5 ? Infinity : (x[0] + 1) ** 2;
    };
    const r = projectedBfgs(f, start, {upper: Float64Array.of(3), maxIterations: 200});
    expect(start[0]).toBe(5);
    expect(r.x[0]).toBeGreaterThanOrEqual(0.5);
    expect(r.x[0]).toBeLessThan(0.51);
  });

  it('from a given inverse Hessian: the exact one takes a quadratic to its minimum in one step', () => {
    // f = (x₁ − 1)² + 10(x₂ + 2)² + x₁x₂: Hessian [[2, 1], [1, 20]], inverse [[20, −1], [−1, 2]] / 39; the minimum
    // solves 2(x₁ − 1) + x₂ = 0, 20(x₂ + 2) + x₁ = 0: x₁ = 80/39, x₂ = −82/39.
    const f = (x: Float64Array, g: Float64Array): number => {
      g[0] = 2 * (x[0] - 1) + x[1];
      g[1] = 20 * (x[1] + 2) + x[0];
      return (x[0] - 1) ** 2 + 10 * (x[1] + 2) ** 2 + x[0] * x[1];
    };
    const inverseHessian = Float64Array.of(20 / 39, -1 / 39, -1 / 39, 2 / 39);
    const r = projectedBfgs(f, Float64Array.of(5, 5), {inverseHessian});
    expect(r.x[0]).toBeCloseTo(80 / 39, 12);
    expect(r.x[1]).toBeCloseTo(-82 / 39, 12);
    // The start, the Newton step, and the steps that confirm the stop.
    expect(r.evaluations).toBeLessThanOrEqual(4);
    expect(projectedBfgs(f, Float64Array.of(5, 5)).evaluations).toBeGreaterThan(r.evaluations);
    // A Rosenbrock search passes on what it learnt: a restart near its end with it needs fewer evaluations.
    const first = projectedBfgs(rosenbrock, Float64Array.of(-1.2, 1), {relTol: 1e-14, maxIterations: 500});
    expect(first.inverseHessian).toHaveLength(4);
    const near = Float64Array.of(1.01, 1.03);
    const warm = projectedBfgs(rosenbrock, near, {relTol: 1e-14, inverseHessian: first.inverseHessian});
    const cold = projectedBfgs(rosenbrock, near, {relTol: 1e-14});
    expect(warm.value).toBeLessThan(1e-12);
    expect(warm.evaluations).toBeLessThan(cold.evaluations);
  });

  it('throws when the start is not feasible', () => {
    expect(() => projectedBfgs(() => Infinity, Float64Array.of(0))).toThrow(/objective not finite/);
  });
});
