import {z} from 'zod';
import {RESULTS_SCHEMA} from '../results/index.js';
import type {Report} from '../render/types.js';
import {periodsPerYear} from '../time/period.js';

/**
 * The few figures of one archived period that the archive's index page shows, kept in `headlines.json` beside
 * results.json so that regenerating the index reads kilobytes per period instead of the whole results (hundreds
 * of MB for a pack of thousands of series). Older folders without the file are read from results.json.
 */
export const HEADLINES_SCHEMA = 'ebbflow/headlines/v1';

export interface Headlines {
  pack: {title: string; locale: string; frequency: 12 | 4 | 52};
  series: {label: string; unit: string | null; hidden: boolean; latest: number | null; yearOnYear: number | null}[];
}

const finite = (x: number): number | null => (Number.isFinite(x) ? x : null);

/** The headlines of a report: each series' value in the review period (last original) and year-on-year change. */
export function headlinesOf(report: Report): Headlines {
  const {plan} = report;
  return {
    pack: {title: plan.title, locale: plan.locale, frequency: periodsPerYear[plan.frequency] as 12 | 4 | 52},
    series: report.series.map((s) => {
      const original = s.analysis.original;
      return {
        label: s.plan.label,
        unit: s.plan.unit,
        hidden: s.plan.hidden,
        latest: original.length > 0 ? finite(original[original.length - 1]) : null,
        yearOnYear: finite(s.analysis.changes.yearOnYear),
      };
    }),
  };
}

/** headlines.json text: the schema tag, then the headlines; 2-space indent and a trailing newline. */
export function headlinesJson(report: Report): string {
  return `${JSON.stringify({schema: HEADLINES_SCHEMA, ...headlinesOf(report)}, null, 2)}\n`;
}

const pack = z.object({
  title: z.string(),
  locale: z.string(),
  frequency: z.union([z.literal(12), z.literal(4), z.literal(52)]),
});
const numberOrNull = z.number().nullable();
/** What a series is called and whether it is shown, the same in both files. */
const seriesName = z.object({label: z.string(), unit: z.string().nullable(), hidden: z.boolean()});

const headlinesFile = z.object({
  schema: z.literal(HEADLINES_SCHEMA),
  pack,
  series: z.array(seriesName.extend({latest: numberOrNull, yearOnYear: numberOrNull})),
});

/** Just the results.json fields the headlines come from, for folders archived before headlines.json existed. */
const resultsFile = z.object({
  schema: z.literal(RESULTS_SCHEMA),
  pack,
  series: z.array(
    seriesName.extend({original: z.array(numberOrNull), changes: z.object({yearOnYear: numberOrNull})}),
  ),
});

/** Headlines from the text of a headlines.json, or null when it is not one. */
export function parseHeadlines(text: string): Headlines | null {
  const parsed = headlinesFile.safeParse(jsonOrNull(text));
  return parsed.success ? {pack: parsed.data.pack, series: parsed.data.series} : null;
}

/** Headlines from the text of a results.json, or null when it is not one. */
export function headlinesFromResults(text: string): Headlines | null {
  const parsed = resultsFile.safeParse(jsonOrNull(text));
  if (!parsed.success) return null;
  return {
    pack: parsed.data.pack,
    series: parsed.data.series.map((s) => ({
      label: s.label,
      unit: s.unit,
      hidden: s.hidden,
      latest: s.original.length > 0 ? s.original[s.original.length - 1] : null,
      yearOnYear: s.changes.yearOnYear,
    })),
  };
}

function jsonOrNull(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}
