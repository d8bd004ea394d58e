import type {AnalysisOptions, Plan, SeriesPlan} from '../../src/config/plan.js';
import type {Adjustment, Changes, SeriesAnalysis} from '../../src/analyse/types.js';
import {monthIndex} from '../../src/time/period.js';

/** Hand-built inputs for the callout rules: a monthly series ending in October 2026 unless told otherwise. */
export const OCT_2026 = monthIndex(2026, 10);

export const options: AnalysisOptions = analysisOptions({decomposition: {model: 'multiplicative'}});

export function makePlan(over: Partial<Plan> = {}): Plan {
  return planFixture({
    packFile: '/packs/demo.yaml',
    id: 'demo',
    title: 'Demo',
    period: OCT_2026,
    formats: ['html'],
    fiscalYearStart: 4,
    outDir: '/out',
    ...over,
  });
}

export function makeSeriesPlan(over: Partial<SeriesPlan> = {}): SeriesPlan {
  return seriesPlanFixture({
    id: 'net-sales',
    label: 'Net sales',
    unit: 'EUR k',
    column: 'net_sales',
    analysis: options,
    line: 1,
    ...over,
  });
}

export function makeChanges(over: Partial<Changes> = {}): Changes {
  return {
    yearOnYear: NaN,
    periodOnPeriodAdjusted: NaN,
    periodOnPeriodAnnualised: NaN,
    trend: NaN,
    trendAnnualised: NaN,
    yearToDate: NaN,
    yearOnYearSeries: [],
    trendDirection: 'flat',
    ...over,
  };
}

export function makeAdjustment(n: number, over: Partial<Adjustment> = {}): Adjustment {
  return {
    method: 'stl',
    model: 'multiplicative',
    modelReason: '',
    trend: new Array<number>(n).fill(NaN),
    seasonal: new Array<number>(n).fill(1),
    irregular: new Array<number>(n).fill(1),
    adjusted: new Array<number>(n).fill(NaN),
    calendar: null,
    outliers: [],
    filled: new Array<boolean>(n).fill(false),
    diagnostics: {
      varianceShares: {trend: 0, seasonal: 0, irregular: 0},
      residualSeasonality: {test: '', statistic: 0, pValue: 1, detected: false},
      seasonalStability: 0,
      revision: null,
    },
    options: {},
    ...over,
  };
}

/** An analysis of `original` ending at `end`; every part not given is absent. */
export function makeAnalysis(original: number[], over: Partial<SeriesAnalysis> = {}, end = OCT_2026): SeriesAnalysis {
  return {
    id: 'net-sales',
    frequency: 'monthly',
    start: end - original.length + 1,
    end,
    original,
    adjustment: null,
    notAdjustedReason: null,
    changes: makeChanges(),
    cycle: null,
    forecast: null,
    outturn: null,
    notes: [],
    options,
    ...over,
  };
}

/** Repeat a short pattern to length n. */
export function cycleOf(pattern: number[], n: number): number[] {
  return Array.from({length: n}, (_, i) => pattern[i % pattern.length]);
}

import type {History} from '../../src/results/index.js';
import type {Draft, Rule} from '../../src/narrate/context.js';
import {wordsFor} from '../../src/words/index.js';
import type {GroupResult, SeriesCombination} from '../../src/combine/index.js';
import {analysisOptions, planFixture, seriesPlanFixture} from '../fixtures/plans.js';

/** Run one rule on one series with the en-GB (or given) locale. */
export function runRule(
  rule: Rule,
  analysis: SeriesAnalysis,
  args: {
    series?: Partial<SeriesPlan>;
    plan?: Partial<Plan>;
    history?: History | null;
    combination?: SeriesCombination | null;
    groups?: GroupResult[];
  } = {},
): Draft[] {
  const plan = makePlan(args.plan);
  const series = makeSeriesPlan(args.series);
  return rule.run({
    plan,
    period: analysis.end,
    series,
    analysis,
    history: args.history ?? null,
    words: wordsFor(plan.locale),
    isRate: series.unit === '%',
    combination: args.combination ?? null,
    groups: args.groups ?? [],
    labels: new Map(plan.series.map((p) => [p.id, p.label])),
  });
}
