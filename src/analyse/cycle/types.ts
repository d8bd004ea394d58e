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
}
