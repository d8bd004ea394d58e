import type {Plan, SeriesPlan} from '../config/plan.js';
import type {InputFile, DataNote} from '../ingest/types.js';
import type {SeriesAnalysis} from '../analyse/types.js';
import type {Callout} from '../narrate/types.js';
import type {History} from '../results/index.js';
import type {GroupResult, ReconciledBacktest, SeriesCombination} from '../combine/index.js';

/** Everything the render stage needs; plain data. */
export interface Report {
  plan: Plan;
  /** Review period index and canonical label (`2026-10`). */
  period: number;
  periodLabel: string;
  toolVersion: string;
  series: ReportSeries[];
  /** Pack-level callouts, ranked (the summary's headline callouts come first). */
  callouts: Callout[];
  inputs: InputFile[];
  notes: DataNote[];
  /** Comparison with earlier archived packs; null for the first pack of an archive. */
  history: History | null;
  /** Groups with a total (contributions, direct against indirect adjustment, reconciled back-test), in pack order. */
  groups: (GroupResult & {backtest: ReconciledBacktest | null})[];
}

export interface ReportSeries {
  plan: SeriesPlan;
  analysis: SeriesAnalysis;
  /** This series' callouts, ranked. */
  callouts: Callout[];
  /** Variance against target and forecast reconciliation (combine stage); null when the series has neither. */
  combination: SeriesCombination | null;
}
