import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {fCdf} from '../../../src/analyse/numeric/fDistribution.js';
import {incompleteBeta} from '../../../src/analyse/numeric/incompleteBeta.js';
import {logGamma} from '../../../src/analyse/numeric/logGamma.js';
import {normalCdf} from '../../../src/analyse/numeric/normalCdf.js';

// Confirmed with scipy 1.10.1 (scipy.stats.f.cdf, scipy.special.betainc, scipy.stats.norm.cdf); calls and values in
// test/reference/adf.json, written by test/reference/hp.cf.adf.py.
const {distributions} = JSON.parse(readFileSync(new URL('../../reference/adf.json', import.meta.url), 'utf8')) as {
  distributions: {
    fCdf: {x: number; d1: number; d2: number; value: number; call: string}[];
    incompleteBeta: {x: number; a: number; b: number; value: number; call: string}[];
    normalCdf: {x: number; value: number; call: string}[];
  };
};

const close = (a: number, b: number, rel: number): void => {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.abs(b) + 1e-300);
};

describe('fCdf', () => {
  for (const c of distributions.fCdf) it(`matches ${c.call}`, () => close(fCdf(c.x, c.d1, c.d2), c.value, 1e-12));
  it('handles the edges', () => {
    expect(fCdf(0, 3, 4)).toBe(0);
    expect(fCdf(Infinity, 3, 4)).toBe(1);
    expect(fCdf(NaN, 3, 4)).toBeNaN();
  });
});

describe('incompleteBeta', () => {
  for (const c of distributions.incompleteBeta) {
    it(`matches ${c.call}`, () => close(incompleteBeta(c.x, c.a, c.b), c.value, 1e-12));
  }
  it('is NaN outside its domain', () => expect(incompleteBeta(1.5, 1, 1)).toBeNaN());
});

describe('normalCdf', () => {
  for (const c of distributions.normalCdf) it(`matches ${c.call}`, () => close(normalCdf(c.x), c.value, 1e-13));
});

describe('logGamma', () => {
  // Γ(5) = 24, Γ(1/2) = √π, Γ(1) = Γ(2) = 1 (standard identities).
  it('gives known values', () => {
    expect(logGamma(5)).toBeCloseTo(Math.log(24), 13);
    expect(logGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 13);
    expect(logGamma(1)).toBeCloseTo(0, 14);
    expect(logGamma(2)).toBeCloseTo(0, 14);
    expect(logGamma(0)).toBe(Infinity);
    expect(logGamma(-1)).toBeNaN();
  });
});
