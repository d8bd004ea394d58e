import type {Forecast} from './model.js';
import type {SeasonalAdjustment} from './seasonalAdjustment.js';

/**
 * Reseasonalise a forecast made on seasonally adjusted data: the mean and every interval bound get the
 * seasonal pattern back (multiplied by the factors, or shifted by the differences).
 *
 * Why: benchmark methods (Naive2, SES/Holt/damped of Comb S-H-D) and non-seasonal models on weekly data
 * forecast the adjusted series; the report needs the original scale.
 * Complexity: O(h·levels). NaN policy: NaN in → NaN out.
 */
export function reseasonalise<F extends Forecast>(
  forecast: F,
  adjustment: SeasonalAdjustment,
  method = forecast.method,
): F {
  if (!adjustment.seasonal) return {...forecast, method};
  const lower = new Map<number, Float64Array>();
  const upper = new Map<number, Float64Array>();
  for (const level of forecast.levels) {
    lower.set(level, adjustment.restore(forecast.lower.get(level)!));
    upper.set(level, adjustment.restore(forecast.upper.get(level)!));
  }
  // Running totals and in-sample fits of the adjusted series do not carry over to the original scale; the caller
  // recomputes them (inSampleSeasonal.ts for the fits).
  return {
    ...forecast,
    method,
    mean: adjustment.restore(forecast.mean),
    lower,
    upper,
    runningTotals: undefined,
    fitted: undefined,
  };
}
