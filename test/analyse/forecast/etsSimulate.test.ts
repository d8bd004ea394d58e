import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {fitEts} from '../../../src/analyse/forecast/etsFit.js';
import {forecastEts} from '../../../src/analyse/forecast/etsForecast.js';
import {simulateEts} from '../../../src/analyse/forecast/etsSimulate.js';
import {runningTotalIntervals} from '../../../src/analyse/forecast/runningTotalIntervals.js';
import {normalQuantile} from '../../../src/analyse/numeric/normalQuantile.js';

// Data: R's AirPassengers and Nile from test/reference/ets.json (test/reference/ets.R). The checks compare the
// simulation with the analytic moments of Hyndman et al. (2005, 2008), which match forecast::ets (etsFit.test.ts).
const ref = JSON.parse(readFileSync(new URL('../../reference/ets.json', import.meta.url), 'utf8'));
const series = (name: string) => Float64Array.from(ref.auto.find((c: {name: string}) => c.name === name).values);

function columnMoments(paths: Float64Array, h: number, t: number): {mean: number; sd: number} {
  const n = paths.length / h;
  let s = 0;
  let ss = 0;
  for (let p = 0; p < n; p++) {
    const v = paths[p * h + t];
    s += v;
    ss += v * v;
  }
  const mean = s / n;
  return {mean, sd: Math.sqrt(ss / n - mean * mean)};
}

describe('simulateEts', () => {
  it('reproduces the analytic class-3 mean and variance of ETS(M,Ad,M) on AirPassengers', () => {
    const fit = fitEts(series('AirPassengers'), {error: 'M', trend: 'A', damped: true, season: 'M', period: 12})!;
    const h = 24;
    const fc = forecastEts(fit, {h});
    const paths = simulateEts(fit, {h, paths: 8000, seed: 3});
    for (const t of [0, 11, 23]) {
      const {mean, sd} = columnMoments(paths, h, t);
      // Monte Carlo error with 8000 paths: about 1/√8000 ≈ 1.1% of sd for the mean, 0.8% for the sd; allow 4%.
      expect(Math.abs(mean - fc.mean[t])).toBeLessThan(0.04 * Math.sqrt(fc.variance[t]));
      expect(Math.abs(sd / Math.sqrt(fc.variance[t]) - 1)).toBeLessThan(0.04);
    }
  });

  it('is reproducible for a seed', () => {
    const fit = fitEts(series('Nile'), {error: 'A', trend: 'N', damped: false, season: 'N', period: 1})!;
    expect(simulateEts(fit, {h: 5, paths: 10, seed: 9})).toEqual(simulateEts(fit, {h: 5, paths: 10, seed: 9}));
  });
});

describe('runningTotalIntervals', () => {
  it('matches the closed form σ²·Σ(1 + α(k − i))² for running totals of ETS(A,N,N) on Nile', () => {
    const fit = fitEts(series('Nile'), {error: 'A', trend: 'N', damped: false, season: 'N', period: 1})!;
    const h = 6;
    const totals = runningTotalIntervals(simulateEts(fit, {h, paths: 20000, seed: 5}), h, [80]);
    const level = fit.finalStates[0];
    const z = normalQuantile(0.9);
    for (let k = 0; k < h; k++) {
      let v = 0;
      for (let i = 0; i <= k; i++) v += (1 + fit.params.alpha * (k - i)) ** 2;
      const half = z * Math.sqrt(fit.sigma2 * v);
      const hi = totals.upper.get(80)![k] - level * (k + 1);
      const lo = level * (k + 1) - totals.lower.get(80)![k];
      expect(Math.abs(hi / half - 1)).toBeLessThan(0.04);
      expect(Math.abs(lo / half - 1)).toBeLessThan(0.04);
    }
  });
});
