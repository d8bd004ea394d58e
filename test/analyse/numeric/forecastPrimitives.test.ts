import {readFileSync} from 'node:fs';
import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {autocorrelation} from '../../../src/analyse/numeric/autocorrelation.js';
import {mulberry32} from '../../../src/analyse/numeric/mulberry32.js';
import {normalQuantile} from '../../../src/analyse/numeric/normalQuantile.js';
import {rootsWithinUnitCircle} from '../../../src/analyse/numeric/rootsWithinUnitCircle.js';
import {standardNormalSampler} from '../../../src/analyse/numeric/standardNormalSampler.js';

// Fixture: test/reference/benchmarks.json from test/reference/benchmarks.R (R's qnorm, acf, polyroot).
const ref = JSON.parse(readFileSync(new URL('../../reference/benchmarks.json', import.meta.url), 'utf8'));

describe('normalQuantile', () => {
  it("equals R's qnorm within 1e-14 relative (a few units in the last place)", () => {
    ref.qnorm.p.forEach((p: number, i: number) => {
      const q = ref.qnorm.q[i];
      expect(Math.abs(normalQuantile(p) - q)).toBeLessThanOrEqual(1e-14 * Math.max(1, Math.abs(q)));
    });
  });
  it('is antisymmetric and rejects probabilities outside (0, 1)', () => {
    fc.assert(
      fc.property(fc.double({min: 1e-9, max: 0.5, noNaN: true}), (p) => {
        expect(normalQuantile(p) + normalQuantile(1 - p)).toBeCloseTo(0, 6);
      }),
    );
    expect(() => normalQuantile(1)).toThrow(/invalid probability/);
    expect(Number.isNaN(normalQuantile(NaN))).toBe(true);
  });
});

describe('autocorrelation', () => {
  it("equals R's acf on ldeaths (lags 1–12) within 1e-12", () => {
    const r = autocorrelation(Float64Array.from(ref.acf.values), 12);
    ref.acf.r.forEach((v: number, i: number) => expect(r[i]).toBeCloseTo(v, 12));
  });
  it('rejects lags outside 1 … n − 1', () => {
    expect(() => autocorrelation(Float64Array.of(1, 2), 2)).toThrow(/invalid lag/);
  });
});

describe('rootsWithinUnitCircle', () => {
  it("agrees with max(Mod(polyroot(p))) <= 1 + 1e-10 in R", () => {
    for (const c of ref.polyroot) expect(rootsWithinUnitCircle(Float64Array.from(c.coef))).toBe(c.inside);
  });
  it('decides products of known real roots correctly', () => {
    fc.assert(
      fc.property(fc.array(fc.double({min: -1.5, max: 1.5, noNaN: true}), {minLength: 1, maxLength: 6}), (roots) => {
        // Expand Π(z − r) with coefficients in increasing powers; skip roots too close to the circle.
        if (roots.some((r) => Math.abs(Math.abs(r) - 1) < 1e-6)) return true;
        let poly = [1];
        for (const r of roots) poly = [...poly.map((c) => -r * c), 0].map((c, i) => c + (i > 0 ? poly[i - 1] : 0));
        return rootsWithinUnitCircle(Float64Array.from(poly)) === roots.every((r) => Math.abs(r) < 1);
      }),
    );
  });
});

describe('mulberry32 and standardNormalSampler', () => {
  it('are reproducible for a seed and give roughly standard normal moments', () => {
    const a = standardNormalSampler(mulberry32(7));
    const b = standardNormalSampler(mulberry32(7));
    let sum = 0;
    let sq = 0;
    const n = 20000;
    for (let i = 0; i < n; i++) {
      const z = a();
      expect(z).toBe(b());
      sum += z;
      sq += z * z;
    }
    // Sampling error of the mean is 1/√n ≈ 0.007 (common practice: allow about four standard errors).
    expect(Math.abs(sum / n)).toBeLessThan(0.03);
    expect(Math.abs(sq / n - 1)).toBeLessThan(0.05);
    const u = mulberry32(1);
    for (let i = 0; i < 1000; i++) {
      const v = u();
      expect(v >= 0 && v < 1).toBe(true);
    }
  });
});
