/** Result of the forecasting engine (`forecastSeries`). */
export interface ForecastResult {
  /** Model name, e.g. `ETS(M,Ad,M)`, `Theta`, `Seasonal naive`, `Combination (ETS, Theta, Damped)`. */
  method: string;
  /** Index (into the series' periods, continuing past the last value) of the first forecast period. */
  startOffset: number;
  mean: number[];
  levels: number[];
  /** Keyed by level as a string, e.g. `lower["80"]`. */
  lower: Record<string, number[]>;
  upper: Record<string, number[]>;
  backtest: Backtest | null;
  /** Resolved options and chosen parameters. */
  options: Record<string, unknown>;
  /** Warnings such as fallbacks for short series. */
  notes: string[];
  /**
   * In-sample one-step forecast errors yₜ − ŷₜ|ₜ₋₁ of the chosen method, aligned with the series' values (NaN where
   * the method gives none, e.g. before its first fitted value or at missing values); empty when the method defines
   * no fitted values. Forecast reconciliation (MinT) estimates the error covariance across series from these.
   */
  residuals: number[];
  /**
   * Optional: intervals for running totals of the forecasts, `lower["80"][k]` bounding mean[0] + … + mean[k]
   * (ETS: simulated sample paths; Theta: closed form; combinations: members' bounds averaged). Used by the
   * fiscal-year outturn of flows; absent for methods without a joint error model.
   */
  runningTotals?: {lower: Record<string, number[]>; upper: Record<string, number[]>};
}

export interface Backtest {
  origins: number;
  horizon: number;
  /** MASE scaled by in-sample seasonal-naive MAE (Hyndman & Koehler 2006). */
  mase: number;
  /** Symmetric MAPE, percent (M3 definition). */
  smape: number;
  /** The same for the benchmarks, so the report can compare. */
  benchmarks: {method: string; mase: number; smape: number}[];
  /** One-step-ahead back-test forecasts for the chart: offset into the series and value. */
  points: {offset: number; forecast: number}[];
  /** The main method's forecasts from every origin: offset into the series of the first forecast, and the means. */
  paths: {offset: number; mean: number[]}[];
}

/** Fiscal-year outturn: actual year-to-date plus forecast to year end. */
export interface Outturn {
  /** Label of the fiscal year, e.g. `FY2026` or `FY2026/27`. */
  fiscalYear: string;
  actualToDate: number;
  periodsActual: number;
  forecastRemaining: number;
  periodsRemaining: number;
  total: number;
  level: number;
  lower: number;
  upper: number;
  target: number | null;
  /** (total − target) / target × 100, or null. */
  gapPct: number | null;
}
