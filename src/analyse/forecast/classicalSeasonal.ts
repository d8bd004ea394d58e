import {centredMovingAverage} from '../numeric/centredMovingAverage.js';

/**
 * Classical decomposition seasonal figure: the centred moving average of one cycle is the trend, the
 * detrended ratios (or differences) are averaged by position in the cycle counted from the first observation,
 * and the m averages are normalised to mean 1 (or 0). Returns the m figures; figure[i] belongs to observations
 * i, i + m, i + 2m, ….
 *
 * Why: the Theta method, the M3 benchmarks (Naive2, Comb S-H-D) and the ETS start values all deseasonalise with
 * this decomposition; results must match the reference implementation (R's `stats::decompose`), so positions
 * count from the first observation, not from the calendar.
 * Reference: M. G. Kendall and A. Stuart (1983), The Advanced Theory of Statistics, vol. 3, §46; R's
 * `stats::decompose`.
 *
 * Complexity: O(n·m). NaN policy: rejects NaN (the caller fills gaps first). Needs n ≥ 2m.
 */
export function classicalSeasonal(
  values: Float64Array,
  period: number,
  kind: 'additive' | 'multiplicative',
): Float64Array {
  const n = values.length;
  if (n < 2 * period) throw new RangeError('classical decomposition requires at least two full periods');
  const trend = centredMovingAverage(values, period);
  const sums = new Float64Array(period);
  const counts = new Float64Array(period);
  for (let t = 0; t < n; t++) {
    if (Number.isNaN(trend[t])) continue;
    const detrended = kind === 'multiplicative' ? values[t] / trend[t] : values[t] - trend[t];
    sums[t % period] += detrended;
    counts[t % period] += 1;
  }
  const figure = new Float64Array(period);
  let mean = 0;
  for (let i = 0; i < period; i++) {
    figure[i] = sums[i] / counts[i];
    mean += figure[i];
  }
  mean /= period;
  for (let i = 0; i < period; i++) figure[i] = kind === 'multiplicative' ? figure[i] / mean : figure[i] - mean;
  return figure;
}
