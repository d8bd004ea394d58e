import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {nelderMead, nelderMeadSearch} from '../../../src/analyse/numeric/nelderMead.js';

// Fixture: test/reference/benchmarks.json from test/reference/benchmarks.R, R's optim(start, f, method = "Nelder-Mead")
// with its defaults (reltol √ε, coefficients 1, 0.5, 2; maxit 500).
const ref = JSON.parse(readFileSync(new URL('../../reference/benchmarks.json', import.meta.url), 'utf8'));
const functions: Record<string, (x: Float64Array) => number> = {
  Rosenbrock: (x) => 100 * (x[1] - x[0] * x[0]) ** 2 + (1 - x[0]) ** 2,
  'weighted quadratic': (x) => (x[0] - 1) ** 2 + 10 * (x[1] + 2) ** 2 + 100 * (x[2] - 3) ** 2 + 0.5,
};

describe('nelderMead', () => {
  for (const c of ref.optim) {
    it(`${c.name}: same minimum, value and evaluation count as R's optim (Nelder-Mead)`, () => {
      const r = nelderMead(functions[c.name], Float64Array.from(c.start));
      r.x.forEach((v, i) => expect(v).toBeCloseTo(c.par[i], 10));
      expect(r.value).toBeCloseTo(c.value, 14);
      expect(r.evaluations).toBe(c.counts);
      expect(r.converged).toBe(true);
    });
  }

  it('a start step per coordinate: the first simplex is the start plus each step along its axis', () => {
    const f = functions['weighted quadratic'];
    const start = Float64Array.of(1.01, -2.02, 3.03);
    const seen: number[][] = [];
    const steps = Float64Array.of(0.01, 0.02, 0.03);
    const small = nelderMead((x) => (seen.push(Array.from(x)), f(x)), start, {maxEvaluations: 2000, steps});
    expect(seen.slice(0, 4)).toEqual([
      [1.01, -2.02, 3.03],
      [1.01 + 0.01, -2.02, 3.03],
      [1.01, -2.02 + 0.02, 3.03],
      [1.01, -2.02, 3.03 + 0.03],
    ]);
    expect(small.value).toBeCloseTo(0.5, 6);
    // A step that is not positive falls back to the usual one: the same run as without steps.
    const usual = nelderMead(f, start, {maxEvaluations: 2000});
    expect(nelderMead(f, start, {maxEvaluations: 2000, steps: Float64Array.of(0, 0, 0)})).toEqual(usual);
  });

  it('treats an infinite objective as infeasible and stays inside the region', () => {
    const f = (x: Float64Array) => (x[0] < 0 || x[1] < 0 ? Infinity : (x[0] + 1) ** 2 + (x[1] - 2) ** 2);
    const r = nelderMead(f, Float64Array.of(1, 1));
    expect(r.x[0]).toBeGreaterThanOrEqual(0);
    expect(r.x[0]).toBeLessThan(1e-3);
    expect(r.x[1]).toBeCloseTo(2, 3);
  });

  it('does not change the start vector and rejects a non-finite start', () => {
    const start = Float64Array.of(3, 4);
    nelderMead((x) => x[0] ** 2 + x[1] ** 2, start);
    expect([...start]).toEqual([3, 4]);
    expect(() => nelderMead(() => NaN, start)).toThrow(/objective not finite/);
  });

  it('a value at or above the bound it is given may be anything at or above it: the path stays the same', () => {
    const f = functions.Rosenbrock;
    const exact = nelderMead(f, Float64Array.of(-1.2, 1));
    let skipped = 0;
    const lazy = nelderMead((x, bound) => {
      const v = f(x);
      if (v < bound) return v;
      skipped++;
      return Infinity;
    }, Float64Array.of(-1.2, 1));
    expect(lazy).toEqual(exact);
    expect(skipped).toBeGreaterThan(0);
  });

  it('a search run in stages takes the path of one run', () => {
    const f = functions['weighted quadratic'];
    const once = nelderMead(f, Float64Array.of(0, 0, 0), {maxEvaluations: 400});
    const search = nelderMeadSearch(f, Float64Array.of(0, 0, 0));
    for (const limit of [10, 50, 51, 200]) search.run(limit);
    expect(search.run(400)).toEqual(once);
    expect(search.evaluations).toBe(once.evaluations);
  });
});
