import {reseasonalise} from './adjustedForecast.js';
import {arimaRunningTotals, fitArima, forecastArima, type ArimaFit, type ArimaOrder} from './arima.js';
import {inSampleSeasonal} from './inSampleSeasonal.js';
import {selectArima} from './arimaSelect.js';
import type {Forecast} from './model.js';
import type {SeasonalAdjustment} from './seasonalAdjustment.js';

/** An ARIMA fit on adjusted data: its forecast and details, and the order to refit at a back-test origin. */
export interface ArimaMember {
  details: Record<string, unknown>;
  forecast: (options: {h: number; levels: number[]}) => Forecast;
  /** The order given, or (when none was given) the one chosen here. */
  order: ArimaOrder;
  /** The fit, to warm-start the refit at the next back-test origin. */
  fit: ArimaFit;
}

/**
 * Automatic non-seasonal ARIMA (arimaSelect.ts) on seasonally adjusted data: the forecast is reseasonalised, with
 * running totals from the ARIMA error weights (and the seasonal factors when multiplicative). With `order` that
 * order is refitted instead of searched (falling back to the search when it cannot be fitted); the member keeps
 * the given order, so every back-test origin re-estimates the order chosen on the full series, starting from
 * `start` (the fit at the origin before) when given.
 *
 * Used by the `arima` method on robust-STL-adjusted data and by `ets-theta-arima` on the adjustment its Theta
 * member shares (methods.ts). Null when the series is too short for any order.
 * Complexity: up to nine ARIMA fits (search) or one (refit). NaN policy: rejects NaN.
 */
export function fitArimaMember(
  values: Float64Array,
  adjustment: SeasonalAdjustment,
  order?: ArimaOrder,
  start?: ArimaFit,
): ArimaMember | null {
  const fit = (order && fitArima(adjustment.adjusted, order, start)) || selectArima(adjustment.adjusted);
  if (!fit) return null;
  const {p, d, q} = fit.order;
  return {
    details: {
      order: [p, d, q],
      ar: Array.from(fit.ar),
      ma: Array.from(fit.ma),
      constant: fit.constant,
      sigma2: fit.sigma2,
      seasonalAdjustment: adjustment.kind,
    },
    forecast: ({h, levels}) => {
      const plain = forecastArima(fit, {h, levels});
      const label = adjustment.seasonal ? `${fit.method} on STL-adjusted data` : fit.method;
      const forecast = reseasonalise(plain, adjustment, label);
      forecast.fitted = inSampleSeasonal(arimaFitted(adjustment.adjusted, fit), values, adjustment);
      if (adjustment.seasonal) {
        const factors = adjustment.kind === 'multiplicative' ? adjustment.ahead(h) : undefined;
        forecast.runningTotals = arimaRunningTotals(fit, forecast.mean, forecast.levels, factors);
      }
      return forecast;
    },
    order: order ?? fit.order,
    fit,
  };
}

/**
 * In-sample one-step ARIMA forecasts of the series it was fitted to: yₜ − eₜ where the CSS recursion has a residual
 * (from t = p on, of the differenced series when d = 1); NaN before.
 */
function arimaFitted(y: Float64Array, fit: ArimaFit): Float64Array {
  const d = fit.order.d;
  return Float64Array.from(y, (v, t) => (t - d >= fit.order.p ? v - fit.residuals[t - d] : NaN));
}
