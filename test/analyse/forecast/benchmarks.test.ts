import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {accuracy} from '../../../src/analyse/forecast/accuracy.js';
import {forecastBenchmarks} from '../../../src/analyse/forecast/benchmarks.js';
import type {Forecast} from '../../../src/analyse/forecast/model.js';
import {forecastNaive, forecastSeasonalNaive} from '../../../src/analyse/forecast/naive.js';
import {seasonalAdjustment} from '../../../src/analyse/forecast/seasonalAdjustment.js';

// Fixtures: test/reference/benchmarks.json from test/reference/benchmarks.R — forecast::naive, snaive, ses, holt
// (damped and not) on thetaf-style seasonally adjusted data, and forecast::accuracy; R's built-in datasets.
const ref = JSON.parse(readFileSync(new URL('../../reference/benchmarks.json', import.meta.url), 'utf8'));
const maxRelErr = (a: ArrayLike<number>, b: number[]): number =>
  b.reduce((w, v, i) => Math.max(w, Math.abs(a[i] - v) / Math.max(1, Math.abs(v))), 0);

interface Path {
  mean: number[];
  lower80?: number[];
  upper80?: number[];
  lower95: number[];
  upper95: number[];
}
function expectForecast(f: Forecast, p: Path, tol = 1e-6): void {
  expect(maxRelErr(f.mean, p.mean)).toBeLessThan(tol);
  expect(maxRelErr(f.lower.get(95)!, p.lower95)).toBeLessThan(tol);
  expect(maxRelErr(f.upper.get(95)!, p.upper95)).toBeLessThan(tol);
  if (p.lower80) expect(maxRelErr(f.lower.get(80)!, p.lower80)).toBeLessThan(tol);
}

describe('benchmark methods against the forecast package', () => {
  for (const c of ref.cases) {
    const y = Float64Array.from(c.values);
    it(`${c.name}: naive and seasonal naive`, () => {
      expectForecast(forecastNaive(y, {h: c.h}), c.naiveRaw);
      if (c.frequency > 1) expectForecast(forecastSeasonalNaive(y, c.frequency, {h: c.h}), c.snaive);
    });
    it(`${c.name}: seasonality test says ${c.seasonal}; Naive2, SES, Holt, damped on adjusted data`, () => {
      expect(seasonalAdjustment(y, c.frequency).seasonal).toBe(c.seasonal);
      const b = forecastBenchmarks(y, c.frequency, {h: c.h});
      expectForecast(b.get('Naive2')!, c.naive2);
      expectForecast(b.get('SES')!, c.ses);
      expectForecast(b.get('Holt')!, c.holt);
      expectForecast(b.get('Damped')!, c.damped);
      const comb = b.get('Comb S-H-D')!;
      comb.mean.forEach((v, i) => expect(v).toBeCloseTo((c.ses.mean[i] + c.holt.mean[i] + c.damped.mean[i]) / 3, 6));
    });
  }
});

describe('accuracy', () => {
  it('equals forecast::accuracy (ME, RMSE, MAE, MAPE, MASE) and the M3 sMAPE on AirPassengers 1958–1960', () => {
    const a = ref.accuracy;
    const acc = accuracy(Float64Array.from(a.forecast), Float64Array.from(a.test), {
      insample: Float64Array.from(a.train),
      period: 12,
    });
    for (const k of ['ME', 'RMSE', 'MAE', 'MAPE', 'MASE', 'sMAPE'] as const) expect(acc[k]).toBeCloseTo(a[k], 10);
  });
  it('skips NaN pairs and gives NaN MASE for a constant sample', () => {
    const acc = accuracy([1, NaN, 3], [2, 5, NaN], {insample: new Float64Array(5).fill(1), period: 1});
    expect(acc.MAE).toBe(1);
    expect(acc.sMAPE).toBeCloseTo(200 / 3, 12);
    expect(Number.isNaN(acc.MASE)).toBe(true);
  });
});
