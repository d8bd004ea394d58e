import {dirname, relative, sep, isAbsolute} from 'node:path';
import {wordDataNote, wordNote, wordsFor, type Words} from '../words/index.js';
import {z} from 'zod';
import type {Report, ReportSeries} from './types.js';
import type {Callout} from '../narrate/types.js';
import type {History} from '../archive/types.js';
import {formatPeriod, periodsPerYear, type Frequency} from '../time/period.js';
import {InputError} from '../errors.js';

/** Schema tag written into every results.json; bump it (v2) for any breaking change to the shape. */
export const RESULTS_SCHEMA = 'ebbflow/results/v1';

/** A figure: NaN and ±Infinity are written as null, everything else at full precision. */
const figure = z.number().nullable();
/**
 * Long arrays are checked with one predicate rather than a schema per element: element-wise
 * checking made reading an archived pack about 40 times slower than JSON.parse (measured).
 */
const figures = z.custom<(number | null)[]>(
  (v) => Array.isArray(v) && v.every((x) => x === null || typeof x === 'number'),
  {message: 'expected an array of numbers or null'},
);
const labels = z.custom<string[]>((v) => Array.isArray(v) && v.every((x) => typeof x === 'string'), {
  message: 'expected an array of period labels',
});
const flags = z.custom<boolean[]>((v) => Array.isArray(v) && v.every((x) => typeof x === 'boolean'), {
  message: 'expected an array of true/false',
});
const record = z.record(z.string(), z.unknown());

const calloutSchema = z.object({
  id: z.string(),
  seriesId: z.string().nullable(),
  rule: z.string(),
  severity: z.enum(['info', 'watch', 'alert']),
  rank: z.number(),
  text: z.string(),
  figures: z.record(z.string(), figure),
  chart: z.string().nullable(),
});

const decompositionSchema = z.object({
  method: z.enum(['stl', 'classical']),
  model: z.enum(['additive', 'multiplicative']),
  modelReason: z.string(),
  trend: figures,
  seasonal: figures,
  irregular: figures,
  adjusted: figures,
  calendar: z
    .object({
      effect: figures,
      regressors: z.array(
        z.object({
          name: z.string(),
          coefficient: figure,
          standardError: figure,
          tStatistic: figure,
          pValue: figure,
          significant: z.boolean(),
          description: z.string(),
        }),
      ),
    })
    .nullable(),
  filled: flags,
  diagnostics: z.object({
    varianceShares: z.object({trend: figure, seasonal: figure, irregular: figure}),
    residualSeasonality: z.object({test: z.string(), statistic: figure, pValue: figure, detected: z.boolean()}),
    seasonalStability: figure,
    revision: z.object({meanAbsPp: figure, periodsTested: z.number()}).nullable(),
  }),
  options: record,
});

const testResult = z.object({statistic: figure, pValue: figure});

const cycleSchema = z.object({
  method: z.enum(['hp', 'bandpass']),
  trend: figures,
  gap: figures,
  phase: z.enum(['rising-above', 'falling-above', 'falling-below', 'rising-below']),
  phaseLabel: z.string(),
  direction: z.enum(['rising', 'falling', 'flat']),
  turningPoints: z.array(z.object({period: z.string(), type: z.enum(['peak', 'trough']), provisional: z.boolean()})),
  periodsSinceTurn: z.number().nullable(),
  amplitudeRatio: figure,
  stationarity: z
    .object({
      test: z.string(),
      level: testResult.extend({stationary: z.boolean()}),
      differences: testResult.extend({stationary: z.boolean()}),
      variance: testResult.extend({test: z.string(), constant: z.boolean()}),
    })
    .nullable(),
  options: record,
});

const changesSchema = z.object({
  yearOnYear: figure,
  periodOnPeriodAdjusted: figure,
  annualised: figure,
  yearToDate: figure,
  trend: figure,
  trendAnnualised: figure,
  trendDirection: z.enum(['rising', 'falling', 'flat']),
  yearOnYearSeries: figures,
});

const forecastSchema = z.object({
  method: z.string(),
  periods: labels,
  mean: figures,
  levels: z.array(z.number()),
  lower: z.record(z.string(), figures),
  upper: z.record(z.string(), figures),
  backtest: z
    .object({
      mase: figure,
      smape: figure,
      origins: z.number(),
      horizon: z.number(),
      benchmarks: z.array(z.object({method: z.string(), mase: figure, smape: figure})),
      points: z.array(z.object({period: z.string(), forecast: figure})),
    })
    .nullable(),
  notes: z.array(z.string()),
  options: record,
});

const outturnSchema = z.object({
  fiscalYear: z.string(),
  actualToDate: figure,
  periodsActual: z.number(),
  forecastRemaining: figure,
  periodsRemaining: z.number(),
  total: figure,
  level: z.number(),
  lower: figure,
  upper: figure,
  target: figure,
  gapPct: figure,
});

const seriesSchema = z.object({
  id: z.string(),
  label: z.string(),
  unit: z.string().nullable(),
  kind: z.enum(['flow', 'stock']),
  hidden: z.boolean(),
  target: z.string().nullable(),
  periods: labels,
  original: figures,
  decomposition: decompositionSchema.nullable(),
  notAdjustedReason: z.string().nullable(),
  outliers: z.array(
    z.object({period: z.string(), kind: z.enum(['additive', 'level-shift', 'temporary']), score: figure}),
  ),
  cycle: cycleSchema.nullable(),
  changes: changesSchema,
  forecast: forecastSchema.nullable(),
  outturn: outturnSchema.nullable(),
  callouts: z.array(calloutSchema),
  notes: z.array(z.string()),
  options: record,
});

const historySchema = z.object({
  previousPeriod: z.string(),
  revisions: z.array(
    z.object({
      seriesId: z.string(),
      period: z.string(),
      kind: z.enum(['data', 'estimate']),
      measure: z.enum(['original', 'adjusted', 'trend-direction', 'cycle-phase']),
      previous: z.union([z.number(), z.string()]),
      current: z.union([z.number(), z.string()]),
      revisionPct: figure,
      large: z.boolean(),
    }),
  ),
  tracking: z.array(
    z.object({
      seriesId: z.string(),
      publishedIn: z.string(),
      period: z.string(),
      horizon: z.number(),
      forecast: figure,
      actual: figure,
      error: figure,
      inside: z.record(z.string(), z.boolean()),
    }),
  ),
  trackingSummary: z.array(
    z.object({
      seriesId: z.string(),
      count: z.number(),
      mase: figure,
      coverage: z.record(z.string(), figure),
    }),
  ),
});

/** The shape of results.json (`ebbflow/results/v1`), checked by {@link parseResults}. Unknown keys are ignored. */
export const resultsSchema = z.object({
  schema: z.literal(RESULTS_SCHEMA),
  pack: z.object({
    id: z.string(),
    title: z.string(),
    subtitle: z.string().nullable(),
    organisation: z.string().nullable(),
    /** Review period label, e.g. `2026-10`. */
    period: z.string(),
    /** Periods per year: 12, 4 or 52. */
    frequency: z.union([z.literal(12), z.literal(4), z.literal(52)]),
    locale: z.string(),
    fiscalYearStart: z.number(),
  }),
  series: z.array(seriesSchema),
  callouts: z.array(calloutSchema),
  notes: z.array(z.object({file: z.string(), line: z.number().nullable(), message: z.string()})),
  history: historySchema.nullable(),
});

/** Contents of results.json: every figure the report shows, NaN written as null. */
export type ResultsV1 = z.infer<typeof resultsSchema>;
export type SeriesResults = ResultsV1['series'][number];

/** Frequency name for the `pack.frequency` number of a results file. */
export function frequencyOf(periods: 12 | 4 | 52): Frequency {
  return periods === 12 ? 'monthly' : periods === 4 ? 'quarterly' : 'weekly';
}

/**
 * The results.json object of a report: the ARCHITECTURE.md `ebbflow/results/v1` contract.
 *
 * Periods are written as canonical labels (`2026-10`), never as indices; NaN and ±Infinity become
 * null; keys come out in a fixed order (the order built here, and sorted keys inside free-form
 * records such as `options` and `figures`), so the same report always gives the same bytes.
 * Paths of data notes are written relative to the pack file's folder, so archives can be moved.
 *
 * Complexity: O(total array length).
 */
export function toResults(report: Report): ResultsV1 {
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
    callouts: report.callouts.map(callout),
    notes: report.notes.map((n) => ({file: portablePath(base, n.file), line: n.line, message: wordDataNote(words, n)})),
    history: report.history === null ? null : history(report.history),
  };
}

/** results.json text: 2-space indent, full precision, trailing newline. */
export function resultsJson(report: Report): string {
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
export function* resultsJsonChunks(report: Report): Generator<string> {
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

/**
 * Read and check a results.json written by this or an earlier version of ebbflow. Throws an
 * {@link InputError} naming `file` and the first offending field when the text is not JSON, has
 * another schema tag, or does not have the v1 shape.
 */
export function parseResults(text: string, file = 'results.json'): ResultsV1 {
  const problem = (message: string) => new InputError([{file, line: null, column: null, message}]);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    throw problem(`unreadable results file: ${(e as Error).message}`);
  }
  const tag = (data as {schema?: unknown} | null)?.schema;
  if (tag !== RESULTS_SCHEMA) {
    throw problem(`unreadable results file: schema is ${JSON.stringify(tag ?? null)}, expected "${RESULTS_SCHEMA}"`);
  }
  const parsed = resultsSchema.safeParse(data);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const at = issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('');
    throw problem(`unreadable results file: ${at.replace(/^\./, '') || '(top level)'}: ${issue.message}`);
  }
  return parsed.data;
}

function seriesResults(s: ReportSeries, f: Frequency, words: Words): SeriesResults {
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
          },
    outturn: a.outturn === null ? null : (plain(a.outturn) as SeriesResults['outturn']),
    callouts: s.callouts.map(callout),
    notes: a.notes.map((n) => wordNote(words, n)),
    options: plain(a.options) as Record<string, unknown>,
  };
}

type SeriesCycle = NonNullable<SeriesResults['cycle']>;

function callout(c: Callout): ResultsV1['callouts'][number] {
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
function history(h: History): NonNullable<ResultsV1['history']> {
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
      inside: plain(t.inside) as Record<string, boolean>,
    })),
    trackingSummary: h.trackingSummary.map((t) => ({
      seriesId: t.seriesId,
      count: t.count,
      mase: t.mase === null ? null : num(t.mase),
      coverage: plain(t.coverage) as Record<string, number | null>,
    })),
  };
}

function num(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}

function nums(xs: ArrayLike<number>): (number | null)[] {
  return Array.from(xs, num);
}

/** Bands keyed by level, in ascending numeric order of the level. */
function bands(b: Record<string, number[]>): Record<string, (number | null)[]> {
  const out: Record<string, (number | null)[]> = {};
  for (const key of Object.keys(b).sort((x, y) => Number(x) - Number(y) || (x < y ? -1 : 1))) out[key] = nums(b[key]);
  return out;
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
