import type {Forecast} from './model.js';

/**
 * Combination of forecasts: the mean of the point forecasts and, for each level, the mean of the lower and of the
 * upper bounds (quantile averaging), equally weighted or by `weights` (summing to 1), optionally widened about the
 * mean by `scale`; running-total bounds are combined the same way when every member has them.
 *
 * Why: combinations of a few good methods are more accurate than the methods alone (Makridakis & Hibon
 * 2000; Petropoulos & Svetunkov 2020); averaging quantiles rather than probabilities keeps the intervals from
 * becoming too wide (Lichtendahl, Grushka-Cockayne & Winkler 2013, Management Science 59, 1594–1611), and the
 * scale, measured on the M3 data, corrects the remaining miscalibration.
 * Complexity: O(k·h·levels). NaN policy: NaN in → NaN out. All forecasts must share h and levels.
 */
export function averageForecasts(
  forecasts: Forecast[],
  method: string,
  scale: Record<number, number> = {},
  weights?: ArrayLike<number>,
): Forecast {
  if (forecasts.length === 0) throw new RangeError('nothing to combine');
  const h = forecasts[0].mean.length;
  const levels = forecasts[0].levels;
  const k = forecasts.length;
  const share = weights ? (x: number, j: number) => weights[j] * x : (x: number) => x / k;
  const mean = new Float64Array(h);
  forecasts.forEach((f, j) => {
    for (let i = 0; i < h; i++) mean[i] += share(f.mean[i], j);
  });
  const lower = new Map<number, Float64Array>();
  const upper = new Map<number, Float64Array>();
  for (const level of levels) {
    const lo = new Float64Array(h);
    const hi = new Float64Array(h);
    forecasts.forEach((f, j) => {
      const fl = f.lower.get(level)!;
      const fu = f.upper.get(level)!;
      for (let i = 0; i < h; i++) {
        lo[i] += share(fl[i], j);
        hi[i] += share(fu[i], j);
      }
    });
    const s = scale[level] ?? 1;
    if (s !== 1) {
      for (let i = 0; i < h; i++) {
        lo[i] = mean[i] - s * (mean[i] - lo[i]);
        hi[i] = mean[i] + s * (hi[i] - mean[i]);
      }
    }
    lower.set(level, lo);
    upper.set(level, hi);
  }
  const out: Forecast = {method, mean, levels, lower, upper};
  if (forecasts.every((f) => f.fitted)) {
    const fitted = new Float64Array(forecasts[0].fitted!.length);
    forecasts.forEach((f, j) => {
      for (let t = 0; t < fitted.length; t++) fitted[t] += share(f.fitted![t], j);
    });
    out.fitted = fitted;
  }
  if (forecasts.every((f) => f.runningTotals)) {
    const totalMean = new Float64Array(h);
    let running = 0;
    for (let i = 0; i < h; i++) totalMean[i] = running += mean[i];
    const tl = new Map<number, Float64Array>();
    const tu = new Map<number, Float64Array>();
    for (const level of levels) {
      const s = scale[level] ?? 1;
      const lo = new Float64Array(h);
      const hi = new Float64Array(h);
      for (let i = 0; i < h; i++) {
        let a = 0;
        let b = 0;
        forecasts.forEach((f, j) => {
          a += share(f.runningTotals!.lower.get(level)![i], j);
          b += share(f.runningTotals!.upper.get(level)![i], j);
        });
        lo[i] = totalMean[i] - s * (totalMean[i] - a);
        hi[i] = totalMean[i] + s * (b - totalMean[i]);
      }
      tl.set(level, lo);
      tu.set(level, hi);
    }
    out.runningTotals = {lower: tl, upper: tu};
  }
  return out;
}
