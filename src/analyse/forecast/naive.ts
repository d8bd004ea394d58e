import {checkForecastOptions, type Forecast, type ForecastOptions} from './model.js';
import {normalIntervals} from './normalIntervals.js';

/**
 * Naive (random walk) and seasonal naive forecasts with their textbook intervals: the last value (or the value
 * one season back) repeated; variance h·σ² (naive) or (⌊(h − 1)/m⌋ + 1)·σ² (seasonal naive), σ² the mean
 * squared lag-1 (lag-m) difference of the sample.
 *
 * Why: the benchmarks every forecast is compared with, and the fallback for very short series.
 * Reference: R. J. Hyndman and G. Athanasopoulos (2021), Forecasting: Principles and Practice, 3rd ed., §5.2
 * and Table 5.2 (benchmark forecast variances).
 *
 * Complexity: O(n + h). NaN policy: rejects NaN. Needs n ≥ 1 (σ² = 0 when there is no difference to take).
 */
export function forecastNaive(values: Float64Array, options: ForecastOptions): Forecast & {variance: Float64Array} {
  return seasonalNaiveCore(values, 1, options, 'Naive');
}

export function forecastSeasonalNaive(
  values: Float64Array,
  period: number,
  options: ForecastOptions,
): Forecast & {variance: Float64Array} {
  if (values.length <= period) return seasonalNaiveCore(values, 1, options, 'Naive');
  return seasonalNaiveCore(values, period, options, 'Seasonal naive');
}

function seasonalNaiveCore(
  values: Float64Array,
  lag: number,
  options: ForecastOptions,
  method: string,
): Forecast & {variance: Float64Array} {
  const levels = checkForecastOptions(options);
  const n = values.length;
  if (n < 1) throw new RangeError('naive forecast needs at least one value');
  const {h} = options;
  let ss = 0;
  let count = 0;
  for (let t = lag; t < n; t++) {
    ss += (values[t] - values[t - lag]) ** 2;
    count++;
  }
  const sigma2 = count > 0 ? ss / count : 0;
  const mean = new Float64Array(h);
  const variance = new Float64Array(h);
  for (let i = 0; i < h; i++) {
    mean[i] = values[n - lag + (i % lag)];
    variance[i] = sigma2 * (Math.floor(i / lag) + 1);
  }
  const fitted = Float64Array.from(values, (_, t) => (t >= lag ? values[t - lag] : NaN));
  return {method, mean, variance, levels, ...normalIntervals(mean, variance, levels), fitted};
}
