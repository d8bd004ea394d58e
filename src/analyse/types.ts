import type {Note} from '../words/index.js';
import type {AnalysisOptions} from '../config/plan.js';
import type {Frequency} from '../time/period.js';
import type {Adjustment} from './decompose/types.js';
import type {CycleResult} from './cycle/types.js';
import type {ForecastResult, Outturn} from './forecast/types.js';

export type {Adjustment, CycleResult, ForecastResult, Outturn};

/** What `analyseSeries` needs: plain data, no I/O. Values end at the review period. */
export interface SeriesInput {
  id: string;
  frequency: Frequency;
  /** Period index of values[0]. */
  start: number;
  /** One value per period, NaN where missing. */
  values: Float64Array;
  kind: 'flow' | 'stock';
  /** First month (1–12) of the fiscal year. */
  fiscalYearStart: number;
  /** Target/budget series on the same calendar (same start), or null. */
  target: {start: number; values: Float64Array} | null;
  options: AnalysisOptions;
  /** Irregular threshold in robust sigmas for large residuals. */
  residualSigma: number;
}

/** Period-on-period figures for the latest period, in percent (NaN when not computable). */
export interface Changes {
  /** Latest original vs same period a year earlier. */
  yearOnYear: number;
  /** Latest seasonally adjusted vs previous period. */
  periodOnPeriodAdjusted: number;
  /** The same, compounded over a year. */
  periodOnPeriodAnnualised: number;
  /** Trend-cycle change over the latest period. */
  trend: number;
  /** Trend-cycle change compounded over a year. */
  trendAnnualised: number;
  /** Fiscal year-to-date total vs the same span a year earlier (flows), or average (stocks). */
  yearToDate: number;
  /** Year-on-year change per period, aligned with values (NaN for the first year). */
  yearOnYearSeries: number[];
  /** Direction of the trend-cycle over the last three periods. */
  trendDirection: 'rising' | 'falling' | 'flat';
}

/** Everything computed for one series; results.json is this with NaN written as null. */
export interface SeriesAnalysis {
  id: string;
  frequency: Frequency;
  start: number;
  /** Period index of the last value (the review period). */
  end: number;
  original: number[];
  /** Null with `notAdjustedReason` when the series is too short or unsuitable. */
  adjustment: Adjustment | null;
  notAdjustedReason: Note | null;
  changes: Changes;
  cycle: CycleResult | null;
  forecast: ForecastResult | null;
  outturn: Outturn | null;
  /** Warnings about this series not held elsewhere (`notAdjustedReason` and `forecast.notes` hold their own). */
  notes: Note[];
  options: AnalysisOptions;
}
