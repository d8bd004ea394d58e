import type {Note} from '../../words/index.js';
/** Result of the trend/cycle engine (`analyseCycle`). Arrays are aligned with the input values. */
export interface CycleResult {
  method: 'hp' | 'bandpass';
  /** Long-run trend (HP trend, or series minus band-pass cycle). */
  trend: number[];
  /** Deviation from long-run trend, percent of trend. */
  gap: number[];
  /** Plain-words phase of the latest period (names of our own), e.g. `above trend, rising`. */
  phase: 'rising-above' | 'falling-above' | 'falling-below' | 'rising-below';
  phaseLabel: string;
  direction: 'rising' | 'falling' | 'flat';
  turningPoints: TurningPoint[];
  /** Periods since the last dated turning point, or null when none. */
  periodsSinceTurn: number | null;
  /** Amplitude of the current cycle relative to the mean of past complete cycles, or null. */
  amplitudeRatio: number | null;
  stationarity: Stationarity | null;
  options: Record<string, unknown>;
  /** What the turning points were dated on: the gap (growth cycle) by default. */
  turningPointBasis?: 'gap' | 'level';
  /** How the gap is scaled: percent of trend, or percent of the mean absolute value for series that reach zero. */
  gapScale?: 'trend' | 'mean-absolute';
  /** One-sided (real-time) trend for the latest periods: trend[i] belongs to index start + i (HP only). */
  realTime?: {start: number; trend: number[]; gap: number[]};
  /** End-point caution in plain words: the latest trend values are provisional. */
  caution?: Note;
  /** What was done to the data (e.g. gaps filled), plain sentences. */
  notes?: Note[];
}

export interface TurningPoint {
  index: number;
  type: 'peak' | 'trough';
  /** Near the end of the data, so a later turn may still move it. */
  provisional: boolean;
}

export interface Stationarity {
  test: string;
  level: {statistic: number; pValue: number; stationary: boolean};
  differences: {statistic: number; pValue: number; stationary: boolean};
  variance: {test: string; statistic: number; pValue: number; constant: boolean};
  /** Lags chosen by AIC for the level and difference regressions. */
  lags?: {level: number; differences: number};
  /** KPSS cross-check (H₀ stationary; p-value interpolated in the published table, clipped to 0.01–0.10). */
  kpss?: {
    level: {statistic: number; pValue: number; stationary: boolean};
    differences: {statistic: number; pValue: number; stationary: boolean};
  };
  /** Plain words, e.g. `stationary in mean after differencing; stationary in variance`. */
  summary?: string;
}
