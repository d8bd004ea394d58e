import {averageForecasts} from './averageForecasts.js';
import type {EtsFit} from './etsFit.js';
import {forecastEts} from './etsForecast.js';
import {simulateEts} from './etsSimulate.js';
import type {Forecast, ForecastOptions} from './model.js';

/**
 * Forecasts of several fitted ETS models averaged with given weights (Akaike weights, see akaikeWeights.ts):
 * the weighted mean of the point forecasts and, per level, the weighted mean of the lower and of the upper
 * bounds (quantile averaging, as for the other combinations). With one model this is that model's forecast.
 * The label counts the models (`ETS (3 models, Akaike-weighted)`); the caller keeps the list with the weights.
 *
 * Reference: Kolassa (2011), IJF 27, 238–251 (Akaike-weighted exponential smoothing); Lichtendahl,
 * Grushka-Cockayne & Winkler (2013) for quantile averaging.
 * Complexity: O(k · cost of one ETS forecast). NaN policy: NaN in a fit → NaN out. Weights must sum to 1;
 * models with weight 0 are skipped.
 */
export function forecastEtsMixture(fits: EtsFit[], weights: Float64Array, options: ForecastOptions): Forecast {
  const members = fits.flatMap((fit, i) => (weights[i] > 0 ? [{fit, w: weights[i]}] : []));
  if (members.length === 0) throw new RangeError('no ETS model with a positive weight');
  const forecasts = members.map(({fit}) => forecastEts(fit, options));
  if (members.length === 1) return forecasts[0];
  const label = `ETS (${members.length} models, Akaike-weighted)`;
  return averageForecasts(forecasts, label, {}, members.map(({w}) => w));
}

/**
 * Sample paths of the weighted mixture: `paths` paths in all, each model drawing its share (rounded by largest
 * remainder) from its own seeded simulation. Returns paths × h values, row-major (as simulateEts).
 */
export function simulateEtsMixture(
  fits: EtsFit[],
  weights: Float64Array,
  {h, paths = 2000}: {h: number; paths?: number},
): Float64Array {
  const exact = Array.from(weights, (w) => w * paths);
  const counts = exact.map(Math.floor);
  let left = paths - counts.reduce((a, b) => a + b, 0);
  const remainder = exact.map((e) => e - Math.floor(e));
  const order = exact.map((_, i) => i).sort((a, b) => remainder[b] - remainder[a] || a - b);
  for (const i of order) {
    if (left <= 0) break;
    if (weights[i] > 0) {
      counts[i]++;
      left--;
    }
  }
  const out = new Float64Array(paths * h);
  let offset = 0;
  fits.forEach((fit, i) => {
    if (counts[i] === 0) return;
    out.set(simulateEts(fit, {h, paths: counts[i]}), offset);
    offset += counts[i] * h;
  });
  return out;
}
