/**
 * Shapes shared by every forecasting model: fit → forecast → accuracy.
 */

/** Point forecasts and prediction intervals, keyed by level (e.g. 80, 95). */
export interface Forecast {
  method: string;
  mean: Float64Array;
  levels: number[];
  lower: Map<number, Float64Array>;
  upper: Map<number, Float64Array>;
  /** Intervals for running totals of the forecasts (steps 1 … k), when the model can give them. */
  runningTotals?: RunningTotals;
  /**
   * In-sample one-step forecasts ŷₜ|ₜ₋₁, aligned with the fitted values (NaN where the model gives none), when the
   * model defines them.
   */
  fitted?: Float64Array;
}

/** Lower and upper bounds, by level, of T_k = y_{n+1} + … + y_{n+k} for k = 1 … h. */
export interface RunningTotals {
  lower: Map<number, Float64Array>;
  upper: Map<number, Float64Array>;
}

/** Options every `forecast…` function takes. */
export interface ForecastOptions {
  /** Periods ahead (≥ 1). */
  h: number;
  /** Interval levels in percent, each in (0, 100). Default: [80, 95]. */
  levels?: number[];
}

/** Check horizon and levels where they come in; returns levels sorted ascending. */
export function checkForecastOptions({h, levels = [80, 95]}: ForecastOptions): number[] {
  if (!Number.isInteger(h) || h < 1) throw new RangeError(`invalid horizon: ${h}`);
  for (const level of levels) if (!(level > 0 && level < 100)) throw new RangeError(`invalid level: ${level}`);
  return [...levels].sort((a, b) => a - b);
}
