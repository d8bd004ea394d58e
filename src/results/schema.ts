import {z} from 'zod';
import type {Frequency} from '../time/period.js';
import {groupSchema, reconciliationSchema, versusTargetSchema} from './structure.js';

/**
 * Schema tag written into every results.json; bump it for any breaking change to the shape. v2 added `groups[]`,
 * and per series `better`, `versusTarget`, `forecast.baseMean` and `forecast.reconciliation`.
 */
export const RESULTS_SCHEMA = 'ebbflow/results/v2';

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
  /** The forecast mean before reconciliation, when `mean` is reconciled (v2); else null. */
  baseMean: figures.nullable(),
  reconciliation: reconciliationSchema.nullable(),
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
  kind: z.enum(['flow', 'stock', 'ratio']),
  hidden: z.boolean(),
  target: z.string().nullable(),
  better: z.enum(['higher', 'lower']),
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
  versusTarget: versusTargetSchema,
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

/** The shape of results.json (`ebbflow/results/v2`), checked by {@link parseResults}. Unknown keys are ignored. */
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
  groups: z.array(groupSchema),
  callouts: z.array(calloutSchema),
  notes: z.array(z.object({file: z.string(), line: z.number().nullable(), message: z.string()})),
  history: historySchema.nullable(),
});

/** Contents of results.json: every figure the report shows, NaN written as null. */
export type Results = z.infer<typeof resultsSchema>;
export type SeriesResults = Results['series'][number];

/** Frequency name for the `pack.frequency` number of a results file. */
export function frequencyOf(periods: 12 | 4 | 52): Frequency {
  return periods === 12 ? 'monthly' : periods === 4 ? 'quarterly' : 'weekly';
}
