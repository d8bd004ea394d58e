import type {Backtest} from './types.js';
import {accuracy} from './accuracy.js';
import type {ArimaOrder} from './arima.js';
import {runMethod, type EtsStart, type MethodName} from './methods.js';

/**
 * Rolling-origin back-test: refit the method on the first n − k, n − k + 1, …, n − 1 values and forecast up to
 * `horizon` periods from each origin (fewer at the last origins, where the data end); pool all errors into one
 * MASE (each origin scaled by its own in-sample seasonal-naive MAE) and one sMAPE. Benchmarks (seasonal naive,
 * Naive2) go through the same origins. The one-step forecasts from every origin are kept for the chart, and the
 * main method's whole path from every origin for the back-test of reconciled forecasts.
 * With `etsModels` the ETS part keeps the model classes chosen on the full series and re-estimates them at each
 * origin (a few fits instead of up to fifteen; common practice for back-testing automatic methods): from the
 * usual start values at the first origin, then each origin starts from the estimates of the one before, which
 * saw only earlier data, so no estimate carries information from beyond its origin. With `arimaOrder` the ARIMA
 * part likewise re-estimates the order chosen on the full series instead of searching all nine again.
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
    method,
    period,
    horizon,
    origins,
    minTrain,
    offset = 0,
    etsModels,
    arimaOrder,
  }: {
    method: MethodName;
    period: number;
    horizon: number;
    origins: number;
    minTrain: number;
    offset?: number;
    etsModels?: EtsStart[];
    arimaOrder?: ArimaOrder;
  },
): Backtest | null {
  const n = values.length;
  const k = Math.min(origins, n - minTrain);
  if (k < 1) return null;
  const h = Math.max(1, Math.min(horizon, k));
  const methods: {label: string; name: MethodName}[] = [
    {label: 'main', name: method},
    {label: 'Seasonal naive', name: 'seasonal-naive'},
    {label: 'Naive2', name: 'naive2'},
  ];
  const totals = methods.map(() => ({scaled: 0, smape: 0, count: 0}));
  const points: {offset: number; forecast: number}[] = [];
  const paths: {offset: number; mean: number[]}[] = [];
  let models = etsModels?.map(({spec}) => ({spec}));
  for (let o = n - k; o < n; o++) {
    const train = values.subarray(0, o);
    const steps = Math.min(h, n - o);
    const actual = values.subarray(o, o + steps);
    methods.forEach((m, j) => {
      const run = runMethod(m.name, train, {
        period,
        h: steps,
        levels: [80],
        etsModels: j === 0 ? models : undefined,
        arimaOrder: j === 0 ? arimaOrder : undefined,
        runningTotals: false,
      });
      if (j === 0 && run.etsModels) models = run.etsModels;
      const fc = run.forecast;
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
    benchmarks: methods.slice(1).map((m, j) => ({method: m.label, ...score(j + 1)})),
    points,
    paths,
  };
}
