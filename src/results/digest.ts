import {z} from 'zod';
import type {Plan} from '../config/plan.js';
import type {SeriesAnalysis} from '../analyse/types.js';
import {InputError} from '../errors.js';
import {formatPeriod, periodsPerYear} from '../time/period.js';
import type {Results} from './schema.js';
import {bands, nums} from './figures.js';

/** Schema tag of `digest.json`; bump it for any breaking change to the shape. */
export const DIGEST_SCHEMA = 'ebbflow/digest/v1';

const figures = z.custom<(number | null)[]>(
  (v) => Array.isArray(v) && v.every((x) => x === null || typeof x === 'number'),
  {message: 'expected an array of numbers or null'},
);
const labels = z.custom<string[]>((v) => Array.isArray(v) && v.every((x) => typeof x === 'string'), {
  message: 'expected an array of period labels',
});

const digestSeries = z.object({
  id: z.string(),
  periods: labels,
  original: figures,
  /** Seasonally adjusted figures, null for a series that was not adjusted. */
  adjusted: figures.nullable(),
  trendDirection: z.enum(['rising', 'falling', 'flat']),
  phase: z.enum(['rising-above', 'falling-above', 'falling-below', 'rising-below']).nullable(),
  forecast: z
    .object({
      periods: labels,
      mean: figures,
      lower: z.record(z.string(), figures),
      upper: z.record(z.string(), figures),
    })
    .nullable(),
});

const digestSchema = z.object({
  schema: z.literal(DIGEST_SCHEMA),
  pack: z.object({
    id: z.string(),
    period: z.string(),
    frequency: z.union([z.literal(12), z.literal(4), z.literal(52)]),
  }),
  series: z.array(digestSeries),
});

/**
 * What later periods read of a built period: the figures that revisions and forecast tracking compare, and
 * nothing else. A period folder keeps it as `digest.json` beside `results.json`, so that the history of a pack
 * reads a few kilobytes a series from each earlier period instead of its whole results.
 */
export type PeriodDigest = z.infer<typeof digestSchema>;
export type DigestSeries = PeriodDigest['series'][number];

/** The digest of this run's analyses, at full length (the current side of a comparison). */
export function digestOf(plan: Plan, periodLabel: string, analyses: readonly SeriesAnalysis[]): PeriodDigest {
  const f = plan.frequency;
  return {
    schema: DIGEST_SCHEMA,
    pack: {id: plan.id, period: periodLabel, frequency: periodsPerYear[f] as 12 | 4 | 52},
    series: analyses.map((a) => {
      const label = (offset: number) => formatPeriod(f, a.start + offset);
      const fc = a.forecast;
      return {
        id: a.id,
        periods: Array.from(a.original, (_, i) => label(i)),
        original: nums(a.original),
        adjusted: a.adjustment === null ? null : nums(a.adjustment.adjusted),
        trendDirection: a.changes.trendDirection,
        phase: a.cycle?.phase ?? null,
        forecast:
          fc === null
            ? null
            : {
                periods: fc.mean.map((_, i) => label(fc.startOffset + i)),
                mean: nums(fc.mean),
                lower: bands(fc.lower),
                upper: bands(fc.upper),
              },
      };
    }),
  };
}

/** The digest of a results.json written before digests were kept (the same figures, read from the full file). */
export function digestOfResults(results: Results): PeriodDigest {
  return {
    schema: DIGEST_SCHEMA,
    pack: {id: results.pack.id, period: results.pack.period, frequency: results.pack.frequency},
    series: results.series.map((s) => ({
      id: s.id,
      periods: s.periods,
      original: s.original,
      adjusted: s.decomposition?.adjusted ?? null,
      trendDirection: s.changes.trendDirection,
      phase: s.cycle?.phase ?? null,
      forecast:
        s.forecast === null
          ? null
          : {periods: s.forecast.periods, mean: s.forecast.mean, lower: s.forecast.lower, upper: s.forecast.upper},
    })),
  };
}

/**
 * `digest.json` text: the last `window` periods of each series (all that a later period compares) and the whole
 * forecast; 2-space indent, full precision, trailing newline.
 */
export function digestJson(digest: PeriodDigest, window: number): string {
  const tail = <T>(xs: T[]) => xs.slice(Math.max(0, xs.length - window));
  const series = digest.series.map((s) => ({
    ...s,
    periods: tail(s.periods),
    original: tail(s.original),
    adjusted: s.adjusted === null ? null : tail(s.adjusted),
  }));
  return `${JSON.stringify({...digest, series}, null, 2)}\n`;
}

/** Read and check a `digest.json`; an unreadable one is an {@link InputError} naming `file`. */
export function parseDigest(text: string, file: string): PeriodDigest {
  const problem = (message: string) => new InputError([{file, line: null, column: null, message}]);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    throw problem(`unreadable digest file: ${(e as Error).message}`);
  }
  const parsed = digestSchema.safeParse(data);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const at = issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('');
    throw problem(`unreadable digest file: ${at.replace(/^\./, '') || '(top level)'}: ${issue.message}`);
  }
  return parsed.data;
}
