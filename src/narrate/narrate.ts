import type {Plan, SeriesPlan} from '../config/plan.js';
import type {SeriesAnalysis} from '../analyse/types.js';
import type {History} from '../results/index.js';
import {periodsPerYear} from '../time/period.js';
import type {GroupResult, SeriesCombination} from '../combine/index.js';
import type {Callout} from './types.js';
import type {RuleContext} from './context.js';
import {wordsFor} from '../words/index.js';
import {rankOf} from './rank.js';
import {rules} from './rules.js';
import {seriesParagraph} from './commentary/seriesParagraph.js';
import {packParagraph} from './commentary/packParagraph.js';

/** Headline callouts in the pack-level list, and at most this many from any one series. */
export const PACK_CALLOUTS = 10;
export const PACK_CALLOUTS_PER_SERIES = 3;

export interface NarrateInput {
  plan: Plan;
  /** Review period index. */
  period: number;
  series: {plan: SeriesPlan; analysis: SeriesAnalysis}[];
  history: History | null;
  /** The combine stage's findings: per series id, and the groups with a total. Absent for a pack without them. */
  combined?: {series: ReadonlyMap<string, SeriesCombination>; groups: readonly GroupResult[]};
}

/**
 * Analyses → ranked callouts and the commentary (a paragraph per series, one for the pack).
 *
 * Every rule (rules.ts) runs on every visible series; hidden series (targets) get none. Each series' list is
 * sorted by rank (rank.ts), ties broken by series order in the pack, then rule order, then id, so the output
 * depends only on the input. The pack-level list takes the top {@link PACK_CALLOUTS} across series, at most
 * {@link PACK_CALLOUTS_PER_SERIES} from one series, so the summary is not taken over by one noisy series.
 *
 * Pure: no I/O, no clock. Complexity: O(total callouts · log) plus the rules' own work.
 */
export interface Narration {
  /** The pack's headline callouts, ranked. */
  pack: Callout[];
  /** Each visible series' callouts, ranked. */
  bySeries: Map<string, Callout[]>;
  /** The summary's opening paragraph. */
  opening: string;
  /** Each visible series' opening paragraph. */
  paragraphs: Map<string, string>;
}

export function narrate(input: NarrateInput): Narration {
  const words = wordsFor(input.plan.locale);
  const bySeries = new Map<string, Callout[]>();
  const all: {callout: Callout; order: [number, number]}[] = [];
  const labels = new Map(input.plan.series.map((p) => [p.id, p.label]));
  input.series.forEach(({plan: series, analysis}, seriesOrder) => {
    if (series.hidden) return;
    const ctx: RuleContext = {
      plan: input.plan,
      period: input.period,
      series,
      analysis,
      history: input.history,
      words,
      isRate: series.unit === '%',
      combination: input.combined?.series.get(series.id) ?? null,
      groups: input.combined?.groups ?? [],
      labels,
    };
    const ppy = periodsPerYear[analysis.frequency];
    const list: {callout: Callout; order: [number, number]}[] = [];
    rules.forEach((rule, ruleOrder) => {
      for (const d of rule.run(ctx)) {
        const callout: Callout = {
          id: `${series.id}/${rule.name}${d.key ? `/${d.key}` : ''}`,
          seriesId: series.id,
          rule: rule.name,
          severity: d.severity,
          rank: rankOf(d.severity, d.magnitude, d.periodsAgo, ppy),
          text: d.text,
          figures: d.figures,
          chart: d.chart,
        };
        list.push({callout, order: [seriesOrder, ruleOrder]});
      }
    });
    list.sort(compare);
    bySeries.set(series.id, list.map((x) => x.callout));
    all.push(...list);
  });
  all.sort(compare);
  const perSeries = new Map<string, number>();
  const pack: Callout[] = [];
  for (const {callout} of all) {
    if (pack.length >= PACK_CALLOUTS) break;
    const used = perSeries.get(callout.seriesId ?? '') ?? 0;
    if (used >= PACK_CALLOUTS_PER_SERIES) continue;
    perSeries.set(callout.seriesId ?? '', used + 1);
    pack.push(callout);
  }
  const paragraphs = new Map<string, string>();
  const visible = input.series.filter((s) => !s.plan.hidden);
  for (const {plan: series, analysis} of visible) {
    paragraphs.set(series.id, seriesParagraph({series, analysis, callouts: bySeries.get(series.id) ?? [], words}));
  }
  const opening = packParagraph({series: visible, callouts: pack, period: input.period, words, groups: input.combined?.groups ?? []});
  return {pack, bySeries, opening, paragraphs};
}

function compare(
  x: {callout: Callout; order: [number, number]},
  y: {callout: Callout; order: [number, number]},
): number {
  return (
    y.callout.rank - x.callout.rank ||
    x.order[0] - y.order[0] ||
    x.order[1] - y.order[1] ||
    (x.callout.id < y.callout.id ? -1 : x.callout.id > y.callout.id ? 1 : 0)
  );
}
