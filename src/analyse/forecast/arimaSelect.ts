import {kpss} from '../cycle/kpss.js';
import {arimaAicc, fitArima, type ArimaFit} from './arima.js';

/**
 * Automatic non-seasonal ARIMA: difference once when the KPSS test rejects level stationarity at 5%, then fit
 * every ARIMA(p, d, q) with p, q ≤ 2 by conditional sum of squares (arima.ts), with a mean (d = 0) or a drift
 * (d = 1), and keep the smallest AICc. Meant for seasonally adjusted (or non-seasonal) data.
 *
 * Why: the differencing test and the small order search follow Hyndman & Khandakar's automatic procedure; the
 * full 3 × 3 search is cheap at these orders, so no stepwise search is needed. The drift is always kept with
 * d = 1 (measured on M3, see methods.ts).
 * Reference: R. J. Hyndman and Y. Khandakar (2008), Automatic time series forecasting: the forecast package for
 * R, Journal of Statistical Software 27(3); KPSS as cycle/kpss.ts.
 *
 * Complexity: nine CSS fits. NaN policy: rejects NaN. Returns null when the series is too short for any fit.
 */
const MAX_ORDER = 2;

export function selectArima(values: Float64Array): ArimaFit | null {
  const varying = values.some((v) => v !== values[0]);
  const d: 0 | 1 = values.length >= 3 && varying && kpss(values).pValue < 0.05 ? 1 : 0;
  let best: ArimaFit | null = null;
  let bestAicc = Infinity;
  for (let p = 0; p <= MAX_ORDER; p++) {
    for (let q = 0; q <= MAX_ORDER; q++) {
      const fit = fitArima(values, {p, d, q, constant: true});
      const aicc = fit ? arimaAicc(fit) : Infinity;
      if (fit && aicc < bestAicc) {
        best = fit;
        bestAicc = aicc;
      }
    }
  }
  return best;
}
