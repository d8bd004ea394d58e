/** Result of the seasonal-adjustment engine (`adjustSeries`). Arrays are aligned with the input values. */
export interface Adjustment {
  method: 'stl' | 'classical';
  model: 'additive' | 'multiplicative';
  /** Why the model was chosen (e.g. the `auto` rule's finding), one plain sentence. */
  modelReason: string;
  trend: number[];
  /** Additive: differences; multiplicative: factors. Includes calendar effects only if `calendar` is null. */
  seasonal: number[];
  irregular: number[];
  /** Original with seasonal and significant calendar effects removed. NaN where the original is missing. */
  adjusted: number[];
  /** Combined calendar effect removed from `adjusted` (difference or factor); null when none was significant. */
  calendar: CalendarEffect | null;
  outliers: Outlier[];
  /** True where a missing value was filled for estimation. */
  filled: boolean[];
  diagnostics: AdjustmentDiagnostics;
  /** Every parameter as resolved, so the manifest shows exactly what ran. */
  options: Record<string, unknown>;
}

export interface CalendarEffect {
  /** Effect per period (additive difference or multiplicative factor), aligned with the input. */
  effect: number[];
  regressors: CalendarRegressor[];
}

export interface CalendarRegressor {
  name: 'working-days' | 'easter' | 'holidays' | string;
  /** Estimated coefficient (per unit of the regressor, in the model's scale). */
  coefficient: number;
  standardError: number;
  tStatistic: number;
  pValue: number;
  significant: boolean;
  /** Plain sentence for the report, e.g. "Each extra working day adds about 1.2% to sales." */
  description: string;
}

export interface Outlier {
  /** Index into the values array. */
  index: number;
  kind: 'additive' | 'level-shift' | 'temporary';
  /** Size in robust sigmas (irregular ÷ 1.4826·MAD), signed. */
  score: number;
}

export interface AdjustmentDiagnostics {
  /** Share of variance of the (differenced) original explained by each component, 0–1. */
  varianceShares: {trend: number; seasonal: number; irregular: number};
  /** Test for seasonality left in the adjusted series. */
  residualSeasonality: {test: string; statistic: number; pValue: number; detected: boolean};
  /** Stability of the seasonal factors: mean absolute year-to-year change of the seasonal component (model scale). */
  seasonalStability: number;
  /** Mean absolute revision of the adjusted period-on-period change (percentage points), concurrent vs latest. */
  revision: {meanAbsPp: number; periodsTested: number} | null;
}
