import {readFileSync} from 'node:fs';
import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {reconcileForecasts} from '../../../src/combine/reconcile/reconcileForecasts.js';
import {shrinkCovariance} from '../../../src/combine/reconcile/shrinkCovariance.js';
import type {Constraint} from '../../../src/combine/reconcile/hierarchy.js';

interface Case {
  name: string;
  n: number;
  h: number;
  constraints: Constraint[];
  base: number[][];
  errors: number[][];
  lambda: number;
  w: number[][];
  mint: number[][];
  ols: number[][];
  bottomUp?: number[][];
}
// Closed forms computed by numpy (test/reference/reconcile.py; versions inside the JSON).
const ref = JSON.parse(readFileSync(new URL('../../reference/reconcile.json', import.meta.url), 'utf8')) as {
  cases: Case[];
};
const flat = (m: number[][]) => Float64Array.from(m.flat());
const close = (a: ArrayLike<number>, b: ArrayLike<number>, tol: number) => {
  expect(a.length).toBe(b.length);
  for (let i = 0; i < a.length; i++) expect(Math.abs(a[i] - b[i])).toBeLessThan(tol * Math.max(1, Math.abs(b[i])));
};

describe.each(ref.cases)('reconciliation against numpy: $name', (c) => {
  const base = flat(c.base);
  it('shrunk covariance and its intensity match the closed form', () => {
    const s = shrinkCovariance(c.errors.map((e) => Float64Array.from(e)))!;
    expect(Math.abs(s.lambda - c.lambda)).toBeLessThan(1e-12);
    close(s.covariance, flat(c.w), 1e-12);
  });
  it('MinT and OLS match S (SᵀW⁻¹S)⁻¹ SᵀW⁻¹ ŷ to 1e-10', () => {
    const opts = {n: c.n, h: c.h, constraints: c.constraints};
    close(reconcileForecasts(base, {...opts, method: 'mint', w: flat(c.w)})!, flat(c.mint), 1e-10);
    close(reconcileForecasts(base, {...opts, method: 'ols'})!, flat(c.ols), 1e-10);
    if (c.bottomUp) close(reconcileForecasts(base, {...opts, method: 'bottom-up'})!, flat(c.bottomUp), 1e-10);
    else expect(reconcileForecasts(base, {...opts, method: 'bottom-up'})).toBeNull();
    expect(Array.from(reconcileForecasts(base, {...opts, method: 'none'})!)).toEqual(Array.from(base));
  });
});

describe('reconcileForecasts', () => {
  it('gives coherent forecasts over random nested hierarchies (property)', () => {
    const hierarchy = fc
      .array(fc.integer({min: 0, max: 1000}), {minLength: 2, maxLength: 9})
      .map((picks) => picks.map((p, i) => (i === 0 ? -1 : p % i)));
    fc.assert(
      fc.property(
        hierarchy,
        fc.integer({min: 1, max: 4}),
        fc.constantFrom('mint', 'ols', 'bottom-up' as const),
        fc.integer({min: 1, max: 2 ** 31}),
        (parents, h, method, seed) => {
          const n = parents.length;
          const constraints = [...new Set(parents.filter((p) => p >= 0))].map((t) => ({
            total: t,
            parts: parents.flatMap((p, i) => (p === t ? [i] : [])),
          }));
          let s = seed;
          const rand = () => ((s = (s * 1103515245 + 12345) % 2 ** 31) / 2 ** 31) * 100;
          const base = Float64Array.from({length: n * h}, rand);
          const errors = Array.from({length: n}, () => Float64Array.from({length: 20}, () => rand() - 50));
          const w = shrinkCovariance(errors)!.covariance;
          const out = reconcileForecasts(base, {n, h, constraints, method, w})!;
          for (const c of constraints)
            for (let j = 0; j < h; j++) {
              const sum = c.parts.reduce((a, p) => a + out[p * h + j], 0);
              expect(Math.abs(out[c.total * h + j] - sum)).toBeLessThan(1e-9 * Math.max(1, Math.abs(sum)));
            }
          if (method === 'bottom-up')
            for (let i = 0; i < n; i++)
              if (!parents.includes(i)) for (let j = 0; j < h; j++) expect(out[i * h + j]).toBe(base[i * h + j]);
        },
      ),
      {seed: 17, numRuns: 200},
    );
  });
  it('leaves coherent forecasts unchanged and rejects NaN', () => {
    const base = Float64Array.of(10, 4, 6);
    const constraints = [{total: 0, parts: [1, 2]}];
    expect(Array.from(reconcileForecasts(base, {n: 3, h: 1, constraints, method: 'ols'})!)).toEqual([10, 4, 6]);
    expect(reconcileForecasts(Float64Array.of(NaN, 1, 2), {n: 3, h: 1, constraints, method: 'ols'})).toBeNull();
  });
});

describe('shrinkCovariance', () => {
  it('is unusable with fewer than two complete periods or an error-free series', () => {
    expect(shrinkCovariance([Float64Array.of(1, NaN), Float64Array.of(NaN, 2)])).toBeNull();
    expect(shrinkCovariance([Float64Array.of(1, 2, 3), Float64Array.of(0, 0, 0)])).toBeNull();
    expect(shrinkCovariance([])).toBeNull();
  });
});
