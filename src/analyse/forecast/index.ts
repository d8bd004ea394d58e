/** Forecasting engine: the what-next forecast with its back-test, and the fiscal-year outturn. */
export {forecastSeries} from './forecastSeries.js';
export {fiscalOutturn, outturnUsesRunningTotals} from './fiscalOutturn.js';
export type {Backtest, ForecastResult, Outturn} from './types.js';
