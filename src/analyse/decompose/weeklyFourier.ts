import {leastSquares} from '../numeric/leastSquares.js';
import {loess} from '../numeric/loess.js';
import {periodStartDay} from '../../time/period.js';
import {nextOdd} from './stl.js';

/** Mean length of the Gregorian year in days. */
const YEAR_DAYS = 365.2425;

export interface WeeklyFourierOptions {
  /** Weekly period index of values[0] (see time/period.ts). */
  start: number;
  /** Sine/cosine pairs of the yearly cycle. Default: 10 (a seasonal shape with detail down to about five weeks). */
  harmonics?: number;
  /** Trend LOESS window in weeks (odd). Default: nextodd(1.5 · 365.2425/7) = 79. */
  trendWindow?: number | null;
  /** Bisquare robustness weights (5 passes) against outliers. Default: false. */
  robust?: boolean;
}

export interface WeeklyFourierResult {
  trend: Float64Array;
  seasonal: Float64Array;
  remainder: Float64Array;
  options: {method: 'fourier'; harmonics: number; trendWindow: number; robust: boolean; backfitRounds: number};
}

const BACKFIT_ROUNDS = 4;
const ROBUST_PASSES = 5;

/**
 * Decomposition of a weekly series whose year is 365.2425/7 ≈ 52.18 weeks, so no whole number of weeks repeats:
 * the seasonal is a Fourier series in the date, s(t) = Σ_k a_k sin(2πk·d/365.2425) + b_k cos(2πk·d/365.2425),
 * with d the day number of the week's Thursday (the day that names the ISO week), fitted by least squares; the
 * trend is a degree-1 LOESS of the deseasonalised series. The two are fitted alternately (backfitting, 4 rounds).
 * Because the seasonal is a function of the date, ISO years with 53 weeks need no special handling: week 53
 * simply gets the seasonal value of its dates. The seasonal shape is the same every year (like STL's periodic).
 *
 * Reference: Hastie & Tibshirani (1990), Generalized Additive Models, §4.4 (backfitting); the Fourier seasonal
 * for non-integer periods as in Hyndman & Athanasopoulos, Forecasting: Principles and Practice (3rd ed.), §12.1.
 *
 * Complexity: O(rounds · n · (harmonics² + trendWindow)). NaN policy: rejects NaN (fill gaps first).
 */
export function weeklyFourier(values: Float64Array, options: WeeklyFourierOptions): WeeklyFourierResult {
  const n = values.length;
  const harmonics = options.harmonics ?? 10;
  const trendWindow = options.trendWindow ?? nextOdd(1.5 * (YEAR_DAYS / 7));
  const robust = options.robust ?? false;
  for (const v of values) if (!Number.isFinite(v)) throw new RangeError('weekly decomposition requires finite values');
  if (n <= 2 * harmonics + 1) throw new RangeError('weekly decomposition requires more weeks than harmonics');
  const columns: Float64Array[] = [new Float64Array(n).fill(1)];
  for (let k = 1; k <= harmonics; k++) {
    const sin = new Float64Array(n);
    const cos = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const angle = (2 * Math.PI * k * (periodStartDay('weekly', options.start + i) + 3)) / YEAR_DAYS;
      sin[i] = Math.sin(angle);
      cos[i] = Math.cos(angle);
    }
    columns.push(sin, cos);
  }
  const trend = new Float64Array(n);
  const seasonal = new Float64Array(n);
  let weights: Float64Array | null = null;
  for (let pass = 0; pass <= (robust ? ROBUST_PASSES : 0); pass++) {
    for (let round = 0; round < BACKFIT_ROUNDS; round++) {
      fitSeasonalInto(values, trend, columns, weights, seasonal);
      const deseasonalised = values.map((v, i) => v - seasonal[i]);
      trend.set(loess(deseasonalised, {span: trendWindow, degree: 1, jump: 1, weights}));
    }
    weights = bisquareWeights(values.map((v, i) => v - trend[i] - seasonal[i]));
  }
  const remainder = values.map((v, i) => v - trend[i] - seasonal[i]);
  return {
    trend,
    seasonal,
    remainder,
    options: {method: 'fourier', harmonics, trendWindow, robust, backfitRounds: BACKFIT_ROUNDS},
  };
}

/** Weighted least squares of values − trend on the Fourier columns; the intercept stays out of the seasonal. */
function fitSeasonalInto(
  values: Float64Array,
  trend: Float64Array,
  columns: Float64Array[],
  weights: Float64Array | null,
  out: Float64Array,
): void {
  const n = values.length;
  const root = weights === null ? null : weights.map(Math.sqrt);
  const y = values.map((v, i) => (v - trend[i]) * (root === null ? 1 : root[i]));
  const x = root === null ? columns : columns.map((c) => c.map((v, i) => v * root[i]));
  const {coefficients} = leastSquares(y, x);
  out.fill(0);
  for (let j = 1; j < columns.length; j++) for (let i = 0; i < n; i++) out[i] += coefficients[j] * columns[j][i];
}

/** Bisquare weights with h = 6 · median |r| (the robustness weights of STL, Cleveland et al. 1990, §2.3). */
function bisquareWeights(residuals: Float64Array): Float64Array {
  const abs = residuals.map(Math.abs);
  const sorted = Float64Array.from(abs).sort();
  const n = sorted.length;
  const h = 3 * (sorted[(n - 1) >> 1] + sorted[n >> 1]);
  // A weight floor keeps the weighted design full rank when many residuals are zero.
  return abs.map((r) => (h === 0 ? 1 : Math.max(1e-6, r < h ? (1 - (r / h) ** 2) ** 2 : 0)));
}
