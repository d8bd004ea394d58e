import {centredMovingAverage} from '../numeric/centredMovingAverage.js';

export interface ClassicalOptions {
  /** Observations per seasonal cycle, an integer ≥ 2. */
  period: number;
  /** Default: `additive`. */
  model?: 'additive' | 'multiplicative';
}

export interface ClassicalResult {
  /** Centred moving average; NaN for the ⌊period/2⌋ points at each end (no full window), as in R. */
  trend: Float64Array;
  /** The seasonal figure repeated from the first observation; defined everywhere. */
  seasonal: Float64Array;
  /** values − seasonal − trend (additive) or values ÷ seasonal ÷ trend (multiplicative); NaN where trend is. */
  irregular: Float64Array;
  /** Seasonal figure by position from the first observation: sums to 0 (additive) or averages 1. */
  figure: Float64Array;
}

/**
 * Classical decomposition by moving averages (Kendall & Stuart; the method of R's `stats::decompose`): trend =
 * centred moving average over one cycle (2×period for even periods); detrended = values − trend (or ÷);
 * figure = mean detrended value per cycle position, centred to sum 0 (or scaled to mean 1); seasonal = the
 * figure repeated.
 *
 * Why: a simple, transparent decomposition with a fixed seasonal pattern, for users who want it.
 * Reference: R's `stats::decompose` (test/reference/decompose.json).
 *
 * Complexity: O(n · period). NaN policy: rejects NaN (fill gaps first).
 */
export function classicalDecomposition(
  values: Float64Array,
  {period, model = 'additive'}: ClassicalOptions,
): ClassicalResult {
  const n = values.length;
  if (!Number.isInteger(period) || period < 2) throw new RangeError(`invalid period: ${period}`);
  if (n < 2 * period) throw new RangeError('classical decomposition requires two full periods');
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(values[i])) throw new RangeError('classical decomposition requires finite values');
  }
  const multiplicative = model === 'multiplicative';
  const trend = centredMovingAverage(values, period);
  const figure = figureFromTrend(values, trend, period, multiplicative);
  const seasonal = new Float64Array(n);
  const irregular = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    seasonal[i] = figure[i % period];
    irregular[i] = multiplicative ? values[i] / seasonal[i] / trend[i] : values[i] - seasonal[i] - trend[i];
  }
  return {trend, seasonal, irregular, figure};
}

/**
 * The classical seasonal figure alone (the `figure` of {@link classicalDecomposition}, the same arithmetic):
 * figure[i] belongs to observations i, i + m, i + 2m, …, counted from the first observation, not the calendar.
 *
 * Why: forecasting deseasonalises with it too (Theta, the M3 benchmarks Naive2 and Comb S-H-D, ETS start
 * values), and must match R's `stats::decompose` there as well; one routine keeps both uses the same.
 * Reference: R's `stats::decompose` (test/reference/decompose.json).
 *
 * Complexity: O(n). NaN policy: rejects NaN (the caller fills gaps first; not checked here, as the forecasting
 * callers pass prepared series). Needs n ≥ 2m.
 */
export function classicalFigure(
  values: Float64Array,
  period: number,
  model: 'additive' | 'multiplicative',
): Float64Array {
  if (values.length < 2 * period) throw new RangeError('classical decomposition requires two full periods');
  return figureFromTrend(values, centredMovingAverage(values, period), period, model === 'multiplicative');
}

/** Mean detrended value per cycle position, centred to sum 0 (additive) or scaled to mean 1 (multiplicative). */
function figureFromTrend(
  values: Float64Array,
  trend: Float64Array,
  period: number,
  multiplicative: boolean,
): Float64Array {
  const n = values.length;
  const figure = new Float64Array(period);
  for (let j = 0; j < period; j++) {
    let sum = 0;
    let count = 0;
    for (let i = j; i < n; i += period) {
      if (Number.isNaN(trend[i])) continue;
      sum += multiplicative ? values[i] / trend[i] : values[i] - trend[i];
      count++;
    }
    figure[j] = sum / count;
  }
  let centre = 0;
  for (let j = 0; j < period; j++) centre += figure[j];
  centre /= period;
  for (let j = 0; j < period; j++) figure[j] = multiplicative ? figure[j] / centre : figure[j] - centre;
  return figure;
}
