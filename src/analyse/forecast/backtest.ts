import type {Backtest} from './types.js';
import {accuracy} from './accuracy.js';
import {fitMethod, type MethodFit} from './methods.js';

/**
 * Rolling-origin back-test: refit the method on the first n − k, n − k + 1, …, n − 1 values and forecast up to
 * `horizon` periods from each origin (fewer at the last origins, where the data end); pool all errors into one
 * MASE (each origin scaled by its own in-sample seasonal-naive MAE) and one sMAPE. Benchmarks (seasonal naive,
 * Naive2) go through the same origins. The one-step forecasts from every origin are kept for the chart, and the
 * main method's whole path from every origin for the back-test of reconciled forecasts.
 * The method is refitted from `fit`, its fit on the full series (method.ts): each origin keeps the model classes
 * chosen there — the ETS models kept, the ARIMA order — and re-estimates them (a few fits instead of up to
 * fifteen ETS models and nine ARIMA orders; common practice for back-testing automatic methods), from the usual
 * start values at the first origin, then each origin starts from the estimates of the one before, which saw only
 * earlier data, so no estimate carries information from beyond its origin.
 *
 * Why: a forecast's honest accuracy is measured on data it has not seen (Tashman 2000); the report compares
 * the method with simple benchmarks on the same origins.
 * Reference: L. J. Tashman (2000), Out-of-sample tests of forecasting accuracy, IJF 16, 437–450;
 * Hyndman & Koehler (2006) for MASE.
 *
 * Complexity: k refits of the method and of each benchmark. NaN policy: rejects NaN (prepared series only).
 * Returns null when fewer than one origin leaves at least `minTrain` values to fit.
 */
export function rollingBacktest(
  values: Float64Array,
  {
    fit,
    period,
    horizon,
    origins,
    minTrain,
    offset = 0,
  }: {
    fit: MethodFit;
    period: number;
    horizon: number;
    origins: number;
    minTrain: number;
    offset?: number;
  },
): Backtest | null {
  const n = values.length;
  const k = Math.min(origins, n - minTrain);
  if (k < 1) return null;
  const h = Math.max(1, Math.min(horizon, k));
  const benchmarks = ['Seasonal naive', 'Naive2'];
  const totals = Array.from({length: 1 + benchmarks.length}, () => ({scaled: 0, smape: 0, count: 0}));
  const points: {offset: number; forecast: number}[] = [];
  const paths: {offset: number; mean: number[]}[] = [];
  let last = fit;
  for (let o = n - k; o < n; o++) {
    const train = values.subarray(0, o);
    const steps = Math.min(h, n - o);
    const actual = values.subarray(o, o + steps);
    last = last.refit(train, {warm: o > n - k});
    const fits = [last, fitMethod('seasonal-naive', train, {period}), fitMethod('naive2', train, {period})];
    fits.forEach((f, j) => {
      const fc = f.forecast({h: steps, levels: [], runningTotals: false}).forecast;
      const acc = accuracy(fc.mean, actual, {insample: train, period});
      const t = totals[j];
      t.scaled += acc.MASE * steps;
      t.smape += acc.sMAPE * steps;
      t.count += steps;
      if (j === 0) {
        points.push({offset: offset + o, forecast: fc.mean[0]});
        paths.push({offset: offset + o, mean: Array.from(fc.mean)});
      }
    });
  }
  const score = (j: number) => ({mase: totals[j].scaled / totals[j].count, smape: totals[j].smape / totals[j].count});
  return {
    origins: k,
    horizon: h,
    ...score(0),
    benchmarks: benchmarks.map((method, j) => ({method, ...score(j + 1)})),
    points,
    paths,
  };
}
