import {dirname, relative, sep, isAbsolute} from 'node:path';
import type {Plan, SeriesPlan} from '../config/plan.js';
import type {DataNote} from '../ingest/types.js';
import type {SeriesAnalysis} from '../analyse/types.js';
import {formatPeriod, periodsPerYear, type Frequency} from '../time/period.js';
import {wordDataNote, wordNote, wordsFor, type Words} from '../words/index.js';
import {RESULTS_SCHEMA, type Results, type SeriesResults} from './schema.js';
import type {History} from './historyTypes.js';
import {bands, num, nums} from './figures.js';
import type {GroupResult, ReconciledBacktest, SeriesCombination} from '../combine/index.js';
import {groupResults, versusTargetResults} from './structure.js';

/**
 * A ranked plain-language statement with the numbers behind it, as results.json keeps it. The narrate stage's
 * callouts are of this type (declared here, below narrate, so that results.json can be written from them).
 */
export interface CalloutRecord {
  /** Stable id, e.g. `net-sales/yoy`; also the HTML anchor suffix. */
  id: string;
  /** Series the callout is about, or null for pack-level callouts. */
  seriesId: string | null;
  /** Rule that produced it, e.g. `latest-change`, `large-residual`. */
  rule: string;
  severity: 'info' | 'watch' | 'alert';
  /** Higher ranks come first in the summary. Deterministic. */
  rank: number;
  text: string;
  /** The raw figures quoted in the text, full precision, for checks and exports. */
  figures: Record<string, number>;
  /** Id of the chart the callout refers to (HTML anchor), e.g. `chart-net-sales-overview`. */
  chart: string | null;
}

/** One series of a pack as results.json records it. */
export interface ResultsSeriesInput {
  plan: SeriesPlan;
  analysis: SeriesAnalysis;
  callouts: readonly CalloutRecord[];
  /** What the combine stage found for the series (target variance, reconciliation); absent when nothing. */
  combination?: SeriesCombination | null;
}

/** Everything results.json is written from: plain data of the stages before render. */
export interface ResultsInput {
  plan: Plan;
  periodLabel: string;
  series: readonly ResultsSeriesInput[];
  callouts: readonly CalloutRecord[];
  notes: readonly DataNote[];
  history: History | null;
  /** Groups with a total, from the combine stage (none when absent). */
  groups?: readonly (GroupResult & {backtest: ReconciledBacktest | null})[];
}

/**
 * The results.json object of a report: the ARCHITECTURE.md `ebbflow/results/v2` contract.
 *
 * Periods are written as canonical labels (`2026-10`), never as indices; NaN and ±Infinity become
 * null; keys come out in a fixed order (the order built here, and sorted keys inside free-form
 * records such as `options` and `figures`), so the same report always gives the same bytes.
 * Paths of data notes are written relative to the pack file's folder, so archives can be moved.
 *
 * Complexity: O(total array length).
 */
export function toResults(report: ResultsInput): Results {
  const {plan} = report;
  const f = plan.frequency;
  const words = wordsFor(plan.locale);
  const base = dirname(plan.packFile);
  return {
    schema: RESULTS_SCHEMA,
    pack: {
      id: plan.id,
      title: plan.title,
      subtitle: plan.subtitle,
      organisation: plan.organisation,
      period: report.periodLabel,
      frequency: periodsPerYear[f] as 12 | 4 | 52,
      locale: plan.locale,
      fiscalYearStart: plan.fiscalYearStart,
    },
    series: report.series.map((s) => seriesResults(s, f, words)),
    groups: (report.groups ?? []).map(groupResults),
    callouts: report.callouts.map(callout),
    notes: report.notes.map((n) => ({file: portablePath(base, n.file), line: n.line, message: wordDataNote(words, n)})),
    history: report.history === null ? null : history(report.history),
  };
}

/** results.json text: 2-space indent, full precision, trailing newline. */
export function resultsJson(report: ResultsInput): string {
  return [...resultsJsonChunks(report)].join('');
}

/**
 * results.json as a sequence of text pieces whose concatenation is exactly {@link resultsJson}: the pack header,
 * then one piece per series, then the pack callouts, notes and history.
 *
 * Why: a pack of 10,000 series gives a results.json of several hundred MB, above V8's longest string, and building
 * the whole object first holds every series twice. Here only one series' results object and text exist at a time.
 * Each piece is `JSON.stringify(…, null, 2)` of one part, re-indented to its depth; JSON.stringify escapes line
 * breaks inside strings, so indenting after every line break gives the same bytes as stringifying the whole.
 *
 * Complexity: O(total array length); memory O(largest series).
 */
export function* resultsJsonChunks(report: ResultsInput): Generator<string> {
  // Everything but the series, in toResults' key order: schema and pack before them, the rest after.
  const {schema, pack, series: none, ...tail} = toResults({...report, series: []});
  const head = JSON.stringify({schema, pack}, null, 2);
  const after = JSON.stringify(tail, null, 2);
  const f = report.plan.frequency;
  const words = wordsFor(report.plan.locale);
  if (report.series.length === 0) {
    yield `${head.slice(0, -2)},\n  "series": ${JSON.stringify(none)},\n${after.slice(2)}\n`;
    return;
  }
  yield `${head.slice(0, -2)},\n  "series": [\n`;
  for (let i = 0; i < report.series.length; i++) {
    const text = JSON.stringify(seriesResults(report.series[i], f, words), null, 2).replace(/\n/g, '\n    ');
    yield `    ${text}${i < report.series.length - 1 ? ',' : ''}\n`;
  }
  yield `  ],\n${after.slice(2)}\n`;
}

function seriesResults(s: ResultsSeriesInput, f: Frequency, words: Words): SeriesResults {
  const a = s.analysis;
  const label = (offset: number) => formatPeriod(f, a.start + offset);
  const adj = a.adjustment;
  const c = a.changes;
  return {
    id: a.id,
    label: s.plan.label,
    unit: s.plan.unit,
    kind: s.plan.kind,
    hidden: s.plan.hidden,
    target: s.plan.target,
    better: s.plan.better,
    periods: a.original.map((_, i) => label(i)),
    original: nums(a.original),
    decomposition:
      adj === null
        ? null
        : {
            method: adj.method,
            model: adj.model,
            modelReason: adj.modelReason,
            trend: nums(adj.trend),
            seasonal: nums(adj.seasonal),
            irregular: nums(adj.irregular),
            adjusted: nums(adj.adjusted),
            calendar:
              adj.calendar === null
                ? null
                : {
                    effect: nums(adj.calendar.effect),
                    regressors: adj.calendar.regressors.map((r) => ({
                      name: r.name,
                      coefficient: num(r.coefficient),
                      standardError: num(r.standardError),
                      tStatistic: num(r.tStatistic),
                      pValue: num(r.pValue),
                      significant: r.significant,
                      description: r.description,
                    })),
                  },
            filled: [...adj.filled],
            diagnostics: {
              varianceShares: {
                trend: num(adj.diagnostics.varianceShares.trend),
                seasonal: num(adj.diagnostics.varianceShares.seasonal),
                irregular: num(adj.diagnostics.varianceShares.irregular),
              },
              residualSeasonality: {
                test: adj.diagnostics.residualSeasonality.test,
                statistic: num(adj.diagnostics.residualSeasonality.statistic),
                pValue: num(adj.diagnostics.residualSeasonality.pValue),
                detected: adj.diagnostics.residualSeasonality.detected,
              },
              seasonalStability: num(adj.diagnostics.seasonalStability),
              revision:
                adj.diagnostics.revision === null
                  ? null
                  : {
                      meanAbsPp: num(adj.diagnostics.revision.meanAbsPp),
                      periodsTested: adj.diagnostics.revision.periodsTested,
                    },
            },
            options: plain(adj.options) as Record<string, unknown>,
          },
    notAdjustedReason: a.notAdjustedReason === null ? null : wordNote(words, a.notAdjustedReason),
    outliers: (adj?.outliers ?? []).map((o) => ({period: label(o.index), kind: o.kind, score: num(o.score)})),
    cycle:
      a.cycle === null
        ? null
        : {
            method: a.cycle.method,
            trend: nums(a.cycle.trend),
            gap: nums(a.cycle.gap),
            phase: a.cycle.phase,
            phaseLabel: a.cycle.phaseLabel,
            direction: a.cycle.direction,
            turningPoints: a.cycle.turningPoints.map((t) => ({
              period: label(t.index),
              type: t.type,
              provisional: t.provisional,
            })),
            periodsSinceTurn: a.cycle.periodsSinceTurn,
            amplitudeRatio: a.cycle.amplitudeRatio === null ? null : num(a.cycle.amplitudeRatio),
            stationarity: plain(a.cycle.stationarity) as SeriesCycle['stationarity'],
            options: plain(a.cycle.options) as Record<string, unknown>,
          },
    changes: {
      yearOnYear: num(c.yearOnYear),
      periodOnPeriodAdjusted: num(c.periodOnPeriodAdjusted),
      annualised: num(c.periodOnPeriodAnnualised),
      yearToDate: num(c.yearToDate),
      trend: num(c.trend),
      trendAnnualised: num(c.trendAnnualised),
      trendDirection: c.trendDirection,
      yearOnYearSeries: nums(c.yearOnYearSeries),
    },
    forecast:
      a.forecast === null
        ? null
        : {
            method: a.forecast.method,
            periods: a.forecast.mean.map((_, i) => label(a.forecast!.startOffset + i)),
            mean: nums(a.forecast.mean),
            levels: [...a.forecast.levels],
            lower: bands(a.forecast.lower),
            upper: bands(a.forecast.upper),
            backtest:
              a.forecast.backtest === null
                ? null
                : {
                    mase: num(a.forecast.backtest.mase),
                    smape: num(a.forecast.backtest.smape),
                    origins: a.forecast.backtest.origins,
                    horizon: a.forecast.backtest.horizon,
                    benchmarks: a.forecast.backtest.benchmarks.map((b) => ({
                      method: b.method,
                      mase: num(b.mase),
                      smape: num(b.smape),
                    })),
                    points: a.forecast.backtest.points.map((p) => ({
                      period: label(p.offset),
                      forecast: num(p.forecast),
                    })),
                  },
            notes: a.forecast.notes.map((n) => wordNote(words, n)),
            options: plain(a.forecast.options) as Record<string, unknown>,
            baseMean: s.combination?.baseMean ? nums(s.combination.baseMean) : null,
            reconciliation: s.combination?.reconciliation ?? null,
          },
    outturn: a.outturn === null ? null : (plain(a.outturn) as SeriesResults['outturn']),
    versusTarget: versusTargetResults(s.combination ?? undefined),
    callouts: s.callouts.map(callout),
    notes: a.notes.map((n) => wordNote(words, n)),
    options: plain(a.options) as Record<string, unknown>,
  };
}

type SeriesCycle = NonNullable<SeriesResults['cycle']>;

function callout(c: CalloutRecord): Results['callouts'][number] {
  return {
    id: c.id,
    seriesId: c.seriesId,
    rule: c.rule,
    severity: c.severity,
    rank: c.rank,
    text: c.text,
    figures: plain(c.figures) as Record<string, number | null>,
    chart: c.chart,
  };
}

/** History in its declared key order; figures non-finite → null. */
function history(h: History): NonNullable<Results['history']> {
  return {
    previousPeriod: h.previousPeriod,
    revisions: h.revisions.map((r) => ({
      seriesId: r.seriesId,
      period: r.period,
      kind: r.kind,
      measure: r.measure,
      previous: typeof r.previous === 'number' ? (num(r.previous) ?? 'missing') : r.previous,
      current: typeof r.current === 'number' ? (num(r.current) ?? 'missing') : r.current,
      revisionPct: r.revisionPct === null ? null : num(r.revisionPct),
      large: r.large,
    })),
    tracking: h.tracking.map((t) => ({
      seriesId: t.seriesId,
      publishedIn: t.publishedIn,
      period: t.period,
      horizon: t.horizon,
      forecast: num(t.forecast),
      actual: num(t.actual),
      error: num(t.error),
      // Shared frozen records of booleans keyed by level (see history/tracking.ts): already JSON-safe, and integer-like
      // keys enumerate in ascending order, so copying each one would only cost memory.
      inside: t.inside,
    })),
    trackingSummary: h.trackingSummary.map((t) => ({
      seriesId: t.seriesId,
      count: t.count,
      mase: t.mase === null ? null : num(t.mase),
      coverage: plain(t.coverage) as Record<string, number | null>,
    })),
  };
}

/**
 * A JSON-safe deep copy of free-form data: non-finite numbers → null, typed arrays → arrays,
 * object keys sorted, undefined members dropped (as JSON.stringify would), so map order never shows.
 */
function plain(value: unknown): unknown {
  if (typeof value === 'number') return num(value);
  if (value === null || typeof value !== 'object') return value;
  if (ArrayBuffer.isView(value)) return Array.from(value as unknown as ArrayLike<number>, num);
  if (Array.isArray(value)) return value.map((v) => (v === undefined ? null : plain(v)));
  const out: Record<string, unknown> = {};
  for (const key of Object.keys(value).sort()) {
    const v = (value as Record<string, unknown>)[key];
    if (v !== undefined && typeof v !== 'function') out[key] = plain(v);
  }
  return out;
}

/** A note's file relative to the pack folder with `/` separators; left as is when not absolute. */
function portablePath(base: string, file: string): string {
  return isAbsolute(file) ? relative(base, file).split(sep).join('/') : file;
}
