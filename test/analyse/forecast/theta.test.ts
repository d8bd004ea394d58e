import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {fitTheta, forecastTheta} from '../../../src/analyse/forecast/theta.js';

// Fixtures: test/reference/theta.json, written by test/reference/theta.R with R's forecast::thetaf
// (version inside the JSON) on R's built-in datasets (AirPassengers, UKgas, co2, USAccDeaths, nottem, …).
const ref = JSON.parse(readFileSync(new URL('../../reference/theta.json', import.meta.url), 'utf8'));

const relErr = (a: number, b: number): number => Math.abs(a - b) / Math.max(1, Math.abs(b));

describe('Theta against forecast::thetaf', () => {
  for (const c of ref.cases) {
    it(`${c.name} (m = ${c.frequency}, h = ${c.h}): forecasts and intervals within 1e-6`, () => {
      const fit = fitTheta(Float64Array.from(c.values), {period: c.frequency});
      expect(relErr(fit.alpha, c.alpha)).toBeLessThan(1e-6);
      expect(relErr(fit.drift, c.drift)).toBeLessThan(1e-6);
      expect(relErr(fit.sigma2, c.sigma2)).toBeLessThan(1e-6);
      const fc = forecastTheta(fit, {h: c.h, levels: [80, 95]});
      for (let i = 0; i < c.h; i++) {
        expect(relErr(fc.mean[i], c.mean[i])).toBeLessThan(1e-6);
        expect(relErr(fc.lower.get(80)![i], c.lower80[i])).toBeLessThan(1e-6);
        expect(relErr(fc.upper.get(80)![i], c.upper80[i])).toBeLessThan(1e-6);
        expect(relErr(fc.lower.get(95)![i], c.lower95[i])).toBeLessThan(1e-6);
        expect(relErr(fc.upper.get(95)![i], c.upper95[i])).toBeLessThan(1e-6);
      }
    });
  }

  it('forecasts a constant series as that constant with zero-width intervals', () => {
    // A constant series has no drift and no residual variance (common practice; forecast's thetaf tests do the same).
    const fc = forecastTheta(fitTheta(new Float64Array(30).fill(7), {period: 12}), {h: 5});
    for (const v of fc.mean) expect(v).toBeCloseTo(7, 12);
    for (const v of fc.upper.get(95)!) expect(v).toBeCloseTo(7, 6);
  });
});
