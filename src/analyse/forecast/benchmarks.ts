import {fitEts} from './etsFit.js';
import {forecastEts} from './etsForecast.js';
import type {EtsSpec} from './etsModel.js';
import type {Forecast, ForecastOptions} from './model.js';
import {forecastNaive} from './naive.js';
import {reseasonalise} from './adjustedForecast.js';
import {averageForecasts} from './averageForecasts.js';
import {seasonalAdjustment} from './seasonalAdjustment.js';
import {inSampleSeasonal} from './inSampleSeasonal.js';

/**
 * The M3 benchmark methods on classically seasonally adjusted data (adjusted only when the 90% seasonality
 * test says seasonal), forecasts reseasonalised:
 * - Naive2: the naive method on adjusted data;
 * - SES, Holt and damped trend: ETS(A,N,N), ETS(A,A,N), ETS(A,Ad,N) fitted by least squares;
 * - Comb S-H-D: the average of the SES, Holt and damped forecasts (intervals: average of their bounds).
 *
 * Reference: S. Makridakis and M. Hibon (2000), The M3-Competition: results, conclusions and implications,
 * IJF 16, 451–476; E. S. Gardner and E. McKenzie (1985), Forecasting trends in time series, Management
 * Science 31, 1237–1246 (damped trend).
 *
 * Complexity: O(E·n) per smoothing fit. NaN policy: rejects NaN. Needs n ≥ 4 for the smoothing methods.
 */
export type BenchmarkName = 'Naive2' | 'SES' | 'Holt' | 'Damped' | 'Comb S-H-D';

const SPECS: Record<'SES' | 'Holt' | 'Damped', EtsSpec> = {
  SES: {error: 'A', trend: 'N', damped: false, season: 'N', period: 1},
  Holt: {error: 'A', trend: 'A', damped: false, season: 'N', period: 1},
  Damped: {error: 'A', trend: 'A', damped: true, season: 'N', period: 1},
};

export function forecastBenchmarks(
  values: Float64Array,
  period: number,
  options: ForecastOptions,
  which: BenchmarkName[] = ['Naive2', 'SES', 'Holt', 'Damped', 'Comb S-H-D'],
): Map<BenchmarkName, Forecast> {
  const sa = seasonalAdjustment(values, period);
  const out = new Map<BenchmarkName, Forecast>();
  // In-sample one-step forecasts on the original scale, for every method here (forecast reconciliation uses them).
  const withFitted = (fc: Forecast, name: string): Forecast => ({
    ...reseasonalise(fc, sa, name),
    fitted: fc.fitted && inSampleSeasonal(fc.fitted, values, sa),
  });
  if (which.includes('Naive2')) out.set('Naive2', withFitted(forecastNaive(sa.adjusted, options), 'Naive2'));
  const smooth = new Map<string, Forecast>();
  for (const name of ['SES', 'Holt', 'Damped'] as const) {
    if (!which.includes(name) && !which.includes('Comb S-H-D')) continue;
    const fit = fitEts(sa.adjusted, SPECS[name], {optCrit: 'mse'});
    const fc = fit ? {...forecastEts(fit, options), fitted: fit.fitted} : forecastNaive(sa.adjusted, options);
    smooth.set(name, withFitted(fc, name));
  }
  for (const name of ['SES', 'Holt', 'Damped'] as const) if (which.includes(name)) out.set(name, smooth.get(name)!);
  if (which.includes('Comb S-H-D')) {
    const members = [smooth.get('SES')!, smooth.get('Holt')!, smooth.get('Damped')!];
    out.set('Comb S-H-D', averageForecasts(members, 'Comb S-H-D'));
  }
  return out;
}
