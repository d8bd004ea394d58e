import type {AdjustmentDiagnostics} from '../analyse/index.js';
import type {Variance} from './versusTarget.js';

export type {Variance};

/** Contributions at one period: the total's change (percent) and each part's contribution (percentage points). */
export interface ContributionsAt {
  period: string;
  total: number;
  parts: Record<string, number>;
}

/** A group with a total, as combined: its check, contributions and the direct/indirect comparison. */
export interface GroupResult {
  id: string;
  title: string;
  total: string;
  parts: string[];
  adjustTotal: 'direct' | 'indirect';
  reconcile: 'mint' | 'ols' | 'bottom-up' | 'none';
  /** Largest gap between the total and the sum of its parts when both come from data; null when they add up. */
  partsGap: {period: string; gap: number; percent: number; periods: number} | null;
  contributions: {
    yearOnYear: ContributionsAt;
    /** On seasonally adjusted parts; the total here is the indirect total (the sum of the adjusted parts). */
    periodOnPeriodAdjusted: ContributionsAt;
    /** Every period from the first with a year-on-year figure to the review period. */
    history: {
      period: string;
      yearOnYear: Omit<ContributionsAt, 'period'>;
      periodOnPeriodAdjusted: Omit<ContributionsAt, 'period'>;
    }[];
  };
  /** The indirectly adjusted total (sum of adjusted parts) against the directly adjusted one. */
  indirect: {
    residualSeasonality: AdjustmentDiagnostics['residualSeasonality'];
    largestDifference: {period: string | null; percent: number};
  } | null;
}

/** Base against reconciled forecasts of one hierarchy, scored on the back-test origins every series shares. */
export interface ReconciledBacktest {
  method: 'mint' | 'ols' | 'bottom-up';
  origins: number;
  horizon: number;
  /** MASE of each series: base and reconciled. */
  series: Record<string, {base: number; reconciled: number}>;
  /** Mean MASE over the hierarchy's series. */
  base: number;
  reconciled: number;
}

/** What combine adds to one series. */
export interface SeriesCombination {
  better: 'higher' | 'lower';
  /** Variance against the target for the review period and the fiscal year to date; null without a target. */
  versusTarget: {period: Variance; yearToDate: Variance} | null;
  /** The forecast mean before reconciliation, when the forecast was reconciled. */
  baseMean: number[] | null;
  reconciliation: {method: 'mint' | 'ols' | 'bottom-up'; group: string} | null;
}
