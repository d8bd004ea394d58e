import type {Plan, SeriesPlan} from '../config/plan.js';
import type {SeriesAnalysis} from '../analyse/types.js';
import type {History} from '../results/index.js';
import type {GroupResult, SeriesCombination} from '../combine/index.js';
import type {Callout} from './types.js';
import type {Words} from '../words/index.js';

/** What a callout rule sees: one visible series with its analysis, the pack, and the archive history. */
export interface RuleContext {
  plan: Plan;
  /** Review period index. */
  period: number;
  series: SeriesPlan;
  analysis: SeriesAnalysis;
  history: History | null;
  /** Words and numbers in the pack's language and locale. */
  words: Words;
  /** True when the series is a rate in percent (unit `%`): its changes are stated in percentage points. */
  isRate: boolean;
  /** What the combine stage found for this series (variance against target, reconciliation), or null. */
  combination: SeriesCombination | null;
  /** Every group with a total (contributions of its parts), in pack order. */
  groups: readonly GroupResult[];
  /** Every series' label by id (built once per pack: a rule that builds it per series is quadratic). */
  labels: ReadonlyMap<string, string>;
}

/**
 * A callout before ranking. `magnitude` is the size of what it reports relative to the series' usual
 * variability (roughly: robust z-score, 0–10); `periodsAgo` is how far before the review period it happened.
 */
export interface Draft {
  /** Suffix making the id unique when a rule yields several callouts (e.g. the period of an outlier). */
  key: string | null;
  severity: Callout['severity'];
  text: string;
  figures: Record<string, number>;
  chart: string | null;
  magnitude: number;
  periodsAgo: number;
}

/** A rule turns one series into zero or more drafts. Pure and deterministic. */
export interface Rule {
  /** Rule name, e.g. `year-on-year`; becomes `Callout.rule` and part of the id. */
  name: string;
  run(ctx: RuleContext): Draft[];
}
