/**
 * Forecast accuracy against outcomes: ME, RMSE, MAE, MAPE, sMAPE (M3 definition, percent:
 * mean of 200·|y − f| / (|y| + |f|)) and MASE (mean |y − f| divided by the in-sample mean absolute seasonal
 * difference |x_t − x_{t−m}|; lag 1 when the sample is not longer than m).
 *
 * Why: the report shows how well the method did in back-tests, on scale-free measures comparable across series.
 * Reference: R. J. Hyndman and A. B. Koehler (2006), Another look at measures of forecast accuracy, IJF 22,
 * 679–688 (MASE); Makridakis & Hibon (2000) (sMAPE); the M4 competition's published scoring code uses the same
 * seasonal scaling.
 *
 * Complexity: O(n + h). NaN policy: skips pairs where the outcome or forecast is NaN; MASE is NaN when the
 * scale is zero (a constant sample), sMAPE terms with y = f = 0 count as 0.
 */
export interface Accuracy {
  ME: number;
  RMSE: number;
  MAE: number;
  MAPE: number;
  sMAPE: number;
  MASE: number;
}

/** In-sample mean absolute seasonal difference (the MASE denominator). */
export function maseScale(insample: Float64Array, period: number): number {
  const lag = insample.length > period ? period : 1;
  let sum = 0;
  let count = 0;
  for (let t = lag; t < insample.length; t++) {
    const d = Math.abs(insample[t] - insample[t - lag]);
    if (Number.isNaN(d)) continue;
    sum += d;
    count++;
  }
  return count > 0 ? sum / count : NaN;
}

export function accuracy(
  mean: ArrayLike<number>,
  actual: ArrayLike<number>,
  {insample, period}: {insample: Float64Array; period: number},
): Accuracy {
  let me = 0;
  let mse = 0;
  let mae = 0;
  let mape = 0;
  let smape = 0;
  let count = 0;
  const len = Math.min(mean.length, actual.length);
  for (let i = 0; i < len; i++) {
    const y = actual[i];
    const f = mean[i];
    if (Number.isNaN(y) || Number.isNaN(f)) continue;
    const e = y - f;
    me += e;
    mse += e * e;
    mae += Math.abs(e);
    mape += (100 * Math.abs(e)) / Math.abs(y);
    const denom = Math.abs(y) + Math.abs(f);
    smape += denom === 0 ? 0 : (200 * Math.abs(e)) / denom;
    count++;
  }
  if (count === 0) return {ME: NaN, RMSE: NaN, MAE: NaN, MAPE: NaN, sMAPE: NaN, MASE: NaN};
  const scale = maseScale(insample, period);
  return {
    ME: me / count,
    RMSE: Math.sqrt(mse / count),
    MAE: mae / count,
    MAPE: mape / count,
    sMAPE: smape / count,
    MASE: scale > 0 ? mae / count / scale : NaN,
  };
}
