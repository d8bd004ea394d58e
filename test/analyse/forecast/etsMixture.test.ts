import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {fitEts} from '../../../src/analyse/forecast/etsFit.js';
import {forecastEts} from '../../../src/analyse/forecast/etsForecast.js';
import {forecastEtsMixture, simulateEtsMixture} from '../../../src/analyse/forecast/etsMixture.js';
import {simulateEts} from '../../../src/analyse/forecast/etsSimulate.js';

// UKgas (R datasets: UK quarterly gas consumption 1960–1986, Harvey 1989), from test/reference/ets.json.
const ref = JSON.parse(readFileSync(new URL('../../reference/ets.json', import.meta.url), 'utf8'));
const gas = Float64Array.from(ref.auto.find((c: {name: string}) => c.name === 'UKgas').values);
const fits = [
  fitEts(gas, {error: 'M', trend: 'A', damped: false, season: 'M', period: 4})!,
  fitEts(gas, {error: 'M', trend: 'A', damped: true, season: 'M', period: 4})!,
];

describe('forecastEtsMixture', () => {
  it('averages the members’ point forecasts and bounds by weight, and counts them in its name', () => {
    const w = Float64Array.of(0.7, 0.3);
    const mix = forecastEtsMixture(fits, w, {h: 8, levels: [80, 95]});
    const [a, b] = fits.map((f) => forecastEts(f, {h: 8, levels: [80, 95]}));
    for (let i = 0; i < 8; i++) {
      expect(mix.mean[i]).toBeCloseTo(0.7 * a.mean[i] + 0.3 * b.mean[i], 9);
      expect(mix.lower.get(95)![i]).toBeCloseTo(0.7 * a.lower.get(95)![i] + 0.3 * b.lower.get(95)![i], 9);
      expect(mix.upper.get(80)![i]).toBeCloseTo(0.7 * a.upper.get(80)![i] + 0.3 * b.upper.get(80)![i], 9);
    }
    expect(mix.method).toBe('ETS (2 models, Akaike-weighted)');
  });

  it('is the single model’s forecast when only one has weight', () => {
    const mix = forecastEtsMixture(fits, Float64Array.of(0, 1), {h: 4, levels: [80]});
    expect(mix.method).toBe('ETS(M,Ad,M)');
    expect(Array.from(mix.mean)).toEqual(Array.from(forecastEts(fits[1], {h: 4, levels: [80]}).mean));
  });
});

describe('simulateEtsMixture', () => {
  it('draws each model’s share of the paths (largest remainder) from its own seeded simulation', () => {
    const h = 3;
    const paths = simulateEtsMixture(fits, Float64Array.of(2 / 3, 1 / 3), {h, paths: 10});
    expect(paths).toHaveLength(30);
    // 6.67 and 3.33 paths: 7 from the first model, 3 from the second.
    expect(Array.from(paths.subarray(0, 7 * h))).toEqual(Array.from(simulateEts(fits[0], {h, paths: 7})));
    expect(Array.from(paths.subarray(7 * h))).toEqual(Array.from(simulateEts(fits[1], {h, paths: 3})));
  });
});
