import type {Forecast} from './model.js';

/**
 * The shape every forecasting method of the dispatch (methods.ts) has: fit → forecast → refit.
 *
 * - `fitMethod(name, values, {period})` fits (selection included) and gives a `MethodFit`;
 * - `forecast({h, levels})` forecasts from that fit, as often as needed, and says what ran (`MethodRun`);
 * - `refit(values, {warm})` fits the same method to other data — a back-test origin — re-estimating the model
 *   classes this fit chose (the ETS models kept, the ARIMA order) instead of searching again, from the usual
 *   start values (`warm: false`) or from this fit's estimates (`warm: true`). Whatever a method needs for that
 *   (its warm-start state) stays inside the method's fit; callers see only this interface.
 */
export interface MethodFit {
  /** Point forecasts and intervals for `h` periods; running totals too unless `runningTotals` is false. */
  forecast(options: MethodForecastOptions): MethodRun;
  refit(values: Float64Array, options: {warm: boolean}): MethodFit;
}

/** What a method's forecast gives, whatever the method. */
export interface MethodRun {
  forecast: Forecast;
  /** Chosen model and parameters, for the result's options. */
  details: Record<string, unknown>;
}

export interface MethodForecastOptions {
  h: number;
  levels: number[];
  /** Intervals for running totals of the forecasts, where the method gives them. Default: true. */
  runningTotals?: boolean;
}
