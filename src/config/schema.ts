import {z} from 'zod';
import {DATE_FORMAT} from '../time/parseDate.js';
import {isTimeZone} from '../time/zone.js';
import {defaultConfig} from './defaults.js';
import {SLUG} from './slug.js';

/**
 * The pack file's schema: the one description of which keys exist and what values they take.
 * Objects are strict (unknown keys are errors). Optional keys also accept null, which means "not set".
 * Relations between entries (references, unique ids, files on disk) are checked in `crossCheck.ts`.
 *
 * Every key carries a description and, where it does not depend on the data, its default (`doc`): the JSON
 * Schema that editors use (`ebbflow schema`, `jsonSchema.ts`) is generated from this file, so a new key needs
 * its `.meta(doc(…))` too (a test fails otherwise).
 */

/** Metadata of one key for the JSON Schema: what it means and, when fixed, its default (from `defaults.ts`). */
function doc(description: string, ...fallback: [unknown?]): {description: string; default?: unknown} {
  return fallback.length === 0 ? {description} : {description, default: fallback[0]};
}
const d = defaultConfig;
const da = defaultConfig.analysis;

const text = z.string().min(1, {error: 'must not be empty'});
const optionalText = text.nullish();
const slug = z.string().regex(SLUG, {error: 'must be lowercase letters, digits and hyphens, e.g. net-sales'});
const oddWindow = (min: number) =>
  z
    .number()
    .int()
    .min(min)
    .refine((v) => v % 2 === 1, {error: `must be an odd whole number ≥ ${min}`});
const seasonalMessage = 'must be periodic or an odd whole number ≥ 7';
const seasonalSpan = z
  .number({error: seasonalMessage})
  .int({error: seasonalMessage})
  .min(7, {error: seasonalMessage})
  .refine((v) => v % 2 === 1, {error: seasonalMessage});
const degree = z.union([z.literal(0), z.literal(1)], {error: 'must be 0 or 1'});

const isoDate = z.string().refine(
  (s) => {
    const m = s.match(/^(\d{4})-(\d{2})-(\d{2})$/);
    if (!m) return false;
    const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
    const t = new Date(Date.UTC(y, mo - 1, d));
    return t.getUTCFullYear() === y && t.getUTCMonth() === mo - 1 && t.getUTCDate() === d;
  },
  {error: 'must be a date written YYYY-MM-DD'},
);

const locale = z.string().refine(
  (s) => {
    try {
      return Intl.getCanonicalLocales(s).length === 1;
    } catch {
      return false;
    }
  },
  {error: 'must be a language tag such as en-GB or de-DE'},
);

export const decompositionSchema = z
  .strictObject({
    method: z
      .enum(['stl', 'classical'])
      .nullish()
      .meta(doc('Seasonal decomposition: STL (LOESS) or classical moving averages.', da.decomposition.method)),
    model: z
      .enum(['additive', 'multiplicative', 'auto'])
      .nullish()
      .meta(
        doc(
          'How trend, season and irregular combine; auto picks multiplicative for positive series whose seasonal swing grows with the level.',
          da.decomposition.model,
        ),
      ),
    seasonalWindow: z
      .union([z.literal('periodic'), seasonalSpan], {error: seasonalMessage})
      .nullish()
      .meta(
        doc(
          'STL seasonal smoothing span (odd, at least 7) or periodic (one fixed pattern). Default: 13 for STL, periodic for classical.',
        ),
      ),
    trendWindow: oddWindow(3)
      .nullish()
      .meta(
        doc(
          "STL trend span (odd, at least 3). Default: STL's rule, the smallest odd integer ≥ 1.5·period / (1 − 1.5 / seasonalWindow).",
        ),
      ),
    lowpassWindow: oddWindow(3)
      .nullish()
      .meta(doc("STL low-pass span (odd, at least 3). Default: STL's rule, the smallest odd integer ≥ period.")),
    robust: z
      .boolean()
      .nullish()
      .meta(doc('Down-weight unusual values while decomposing (robust STL).', da.decomposition.robust)),
    seasonalDegree: degree.nullish().meta(doc('Degree of the local seasonal fits, 0 or 1. Default: 0.')),
    trendDegree: degree.nullish().meta(doc('Degree of the local trend fits, 0 or 1. Default: 1.')),
    lowpassDegree: degree.nullish().meta(doc('Degree of the low-pass fits, 0 or 1. Default: the trend degree.')),
    innerIterations: z
      .number()
      .int()
      .min(1)
      .nullish()
      .meta(doc('STL inner loop passes. Default: 1 when robust, else 2.')),
    outerIterations: z
      .number()
      .int()
      .min(0)
      .nullish()
      .meta(doc('STL robustness passes. Default: 15 when robust, else 0.')),
  })
  .meta({id: 'decomposition'});

export const calendarSchema = z
  .strictObject({
    workingDays: z
      .enum(['auto', 'off'])
      .nullish()
      .meta(
        doc(
          'Working-day effect: auto estimates it for flow series and removes it only when significant; off leaves it.',
          da.calendar.workingDays,
        ),
      ),
    easter: z
      .enum(['auto', 'off'])
      .nullish()
      .meta(
        doc(
          'Easter effect: auto estimates it for flow series and removes it only when significant; off leaves it.',
          da.calendar.easter,
        ),
      ),
    holidays: z
      .array(isoDate)
      .nullish()
      .meta(doc('Extra non-working days, each written YYYY-MM-DD.', da.calendar.holidays)),
  })
  .meta({id: 'calendar'});

export const outliersSchema = z
  .strictObject({
    enabled: z
      .boolean()
      .nullish()
      .meta(doc('Find additive outliers, level shifts and temporary changes.', da.outliers.enabled)),
  })
  .meta({id: 'outliers'});

export const forecastSchema = z
  .strictObject({
    method: z
      .enum(['auto', 'ets', 'theta', 'arima', 'seasonal-naive', 'combination'])
      .nullish()
      .meta(
        doc(
          'Forecast method; auto is a weighted mean of ETS, Theta and ARIMA forecasts (the most accurate mix measured on M3).',
          da.forecast.method,
        ),
      ),
    horizon: z
      .number()
      .int()
      .min(1)
      .nullish()
      .meta(doc('Periods to forecast. Default: 12 monthly, 4 quarterly, 13 weekly.')),
    levels: z
      .array(
        z.number().min(50, {error: 'must be between 50 and 99.9'}).max(99.9, {error: 'must be between 50 and 99.9'}),
      )
      .min(1)
      .nullish()
      .meta(doc('Prediction interval levels in percent, each from 50 to 99.9.', da.forecast.levels)),
    backtestOrigins: z
      .number()
      .int()
      .min(0)
      .nullish()
      .meta(doc('Forecast origins of the rolling back-test (0: none).', da.forecast.backtestOrigins)),
  })
  .meta({id: 'forecast'});

export const cycleSchema = z
  .strictObject({
    method: z
      .enum(['hp', 'bandpass'])
      .nullish()
      .meta(doc('Trend and cycle split: Hodrick-Prescott filter or a band-pass filter.', da.cycle.method)),
    lambda: z
      .number()
      .positive()
      .nullish()
      .meta(doc('Hodrick-Prescott smoothing. Default: 129600 monthly, 1600 quarterly (Ravn and Uhlig 2002).')),
  })
  .meta({id: 'cycle'});

/** The analysis blocks, allowed under `defaults:` and in each series. */
const analysisShape = {
  decomposition: decompositionSchema.nullish().meta(doc('Seasonal adjustment settings.')),
  calendar: calendarSchema.nullish().meta(doc('Calendar effects: working days, Easter, holidays.')),
  outliers: outliersSchema.nullish().meta(doc('Unusual values.')),
  forecast: forecastSchema.nullish().meta(doc('Forecasts and their back-test.')),
  cycle: cycleSchema.nullish().meta(doc('Trend, cycle and turning points.')),
};

export const formatSchema = z.enum(['html', 'pdf', 'json', 'csv', 'xlsx']);

const packSection = z.strictObject({
  id: slug
    .nullish()
    .meta(
      doc(
        'Id of the pack (lowercase letters, digits, hyphens); names its archive folder. Default: the file name as an id.',
      ),
    ),
  title: text.meta(doc('Title of the report. Required.')),
  subtitle: optionalText.meta(doc('Shown on the cover under the title.', null)),
  organisation: optionalText.meta(doc('Organisation shown on the cover.', null)),
  preparedBy: optionalText.meta(doc('Author or team shown on the cover.', null)),
  confidentiality: optionalText.meta(doc('Marking shown on the cover, e.g. "Internal".', null)),
  frequency: z.enum(['monthly', 'quarterly', 'weekly']).meta(doc('How often the series are observed. Required.')),
  period: text
    .nullish()
    .meta(
      doc(
        'Review period, written 2026-10, 2026-Q3 or 2026-W41 to match the frequency. Default: the last period with data.',
      ),
    ),
  formats: z
    .array(formatSchema)
    .min(1)
    .nullish()
    .meta(doc('Outputs to write; --formats wins. results.json is always written.', d.pack.formats)),
  locale: locale.nullish().meta(doc('Language tag for numbers and dates (BCP 47).', d.pack.locale)),
  fiscalYearStart: z
    .number()
    .int()
    .min(1)
    .max(12)
    .nullish()
    .meta(doc('Month (1-12) the fiscal year starts in.', d.pack.fiscalYearStart)),
  browser: optionalText.meta(
    doc(
      'Chromium or Chrome to print the PDF with. Default: found automatically (EBBFLOW_CHROMIUM, CHROME_PATH, then the usual paths).',
    ),
  ),
  outDir: optionalText.meta(
    doc(
      'Folder that holds <pack id>/<period>/, relative to the pack file; --out wins. Default: out in the current directory.',
      d.pack.outDir,
    ),
  ),
});

const brandingSection = z.strictObject({
  logo: optionalText.meta(doc('Logo file (.png, .jpg or .svg), relative to the pack.', d.branding.logo)),
  accent: z
    .string()
    .regex(/^#[0-9a-fA-F]{6}$/, {error: 'must be a colour written #rrggbb, e.g. "#1d6f64"'})
    .nullish()
    .meta(doc('Accent colour, written #rrggbb.', d.branding.accent)),
  font: optionalText.meta(doc('Installed font family for the report and its charts.', d.branding.font)),
  paper: z.enum(['A4', 'Letter']).nullish().meta(doc('Paper size of the PDF.', d.branding.paper)),
  orientation: z
    .enum(['portrait', 'landscape'])
    .nullish()
    .meta(doc('Page orientation of the PDF.', d.branding.orientation)),
  footer: optionalText.meta(doc('Text in the footer of every page.', d.branding.footer)),
  templates: optionalText.meta(
    doc('Folder of templates that replace the built-in ones by file name.', d.branding.templates),
  ),
  taggedPdf: z
    .boolean()
    .nullish()
    .meta(doc("Tag the PDF's structure for screen readers (slower, larger file).", d.branding.taggedPdf)),
});

const thresholdsSection = z.strictObject({
  residualSigma: z
    .number()
    .positive()
    .nullish()
    .meta(doc('An irregular beyond this many robust standard deviations is flagged.', d.thresholds.residualSigma)),
  revisionPct: z
    .number()
    .min(0)
    .nullish()
    .meta(doc('A revision larger than this percentage gets a callout.', d.thresholds.revisionPct)),
  targetPct: z
    .number()
    .min(0)
    .nullish()
    .meta(
      doc(
        'A series further than this percentage from its target (period or fiscal year to date) gets a callout.',
        d.thresholds.targetPct,
      ),
    ),
});

const aggregate = z.enum(['sum', 'mean', 'last', 'first', 'min', 'max', 'count']);
const seriesAggregate = aggregate
  .nullish()
  .meta(
    doc(
      'How the rows of one period combine: sum, mean, last, first, min, max or count. Default: sum for flows, last ' +
        'for stocks, mean for ratios, and two rows for one period are a problem.',
    ),
  );

const sourceEntry = z.strictObject({
  id: slug.meta(doc('Unique id of the source, named by series. Required.')),
  file: optionalText.meta(
    doc(
      'Data file, relative to the pack: a CSV, or a workbook ending in .xlsx. Required, unless the source has a query.',
    ),
  ),
  layout: z
    .enum(['wide', 'long', 'across'])
    .nullish()
    .meta(
      doc(
        'wide: one column per series; long: key and value columns; across: one row per series, named in keyColumn, with the periods across the header (a budget sheet).',
        d.source.layout,
      ),
    ),
  dateColumn: optionalText.meta(
    doc('Column holding the period (2026-10, 2026-10-01, Oct 2026, 2026-Q3, 2026-W41).', d.source.dateColumn),
  ),
  keyColumn: optionalText.meta(doc('The column naming the series. Required when layout is long or across.')),
  valueColumn: optionalText.meta(doc('The column holding the values. Required when layout is long.')),
  delimiter: z
    .enum(['auto', ',', ';', '\t'])
    .nullish()
    .meta(doc('CSV field separator; auto sniffs it from the header line.', d.source.delimiter)),
  decimal: z
    .enum(['.', ','])
    .nullish()
    .meta(doc('Decimal mark of the numbers (CSV, and numbers typed as text in a workbook).', d.source.decimal)),
  encoding: z
    .enum(['utf-8', 'windows-1252'])
    .nullish()
    .meta(doc('Text encoding of the file (CSV).', d.source.encoding)),
  // Data as exported: header position, date spelling, workbooks and queries (crossCheck relates them).
  headerRow: z
    .number()
    .int()
    .min(1, {error: 'must be a line number from 1'})
    .nullish()
    .meta(
      doc('Line (CSV) or row (workbook) holding the column names; lines above it are ignored.', d.source.headerRow),
    ),
  dateFormat: z
    .string()
    .regex(DATE_FORMAT, {
      error: 'must be DD/MM/YYYY, MM/DD/YYYY, DD.MM.YYYY or DD-MM-YYYY, optionally with " HH:mm:ss"',
    })
    .nullish()
    .meta(
      doc(
        'Day-first or month-first dates: DD/MM/YYYY, MM/DD/YYYY, DD.MM.YYYY or DD-MM-YYYY, optionally with " HH:mm:ss". ' +
          'Default: none, only year-first dates are read.',
      ),
    ),
  timeZone: z
    .string()
    .refine(isTimeZone, {error: 'must be a time zone name such as UTC or Europe/Berlin'})
    .nullish()
    .meta(doc('IANA zone in which a timestamp written with an offset gets its date.', d.source.timeZone)),
  emptyMeans: z
    .enum(['missing', 'zero'])
    .nullish()
    .meta(
      doc('A period without rows inside the data: missing (a gap) or zero (for sum and count).', d.source.emptyMeans),
    ),
  sheet: optionalText.meta(doc('Workbooks: the sheet to read. Default: the first sheet.')),
  query: optionalText.meta(doc('One SELECT, run by engine, instead of a file.', null)),
  engine: z
    .enum(['duckdb', 'postgres'])
    .nullish()
    .meta(doc('What runs the query: embedded DuckDB or a PostgreSQL server. Required with query.')),
  connection: z
    .strictObject({
      env: z
        .string()
        .regex(/^[A-Za-z_][A-Za-z0-9_]*$/, {error: 'must be an environment variable name'})
        .meta(doc('Name of the environment variable holding the connection string. Required.')),
    })
    .nullish()
    .meta(doc('engine: postgres only: where the connection string is. Required for postgres.')),
  timeoutSeconds: z
    .number()
    .positive()
    .max(3600)
    .nullish()
    .meta(doc('A PostgreSQL query (and connection attempt) running longer is stopped.', d.source.timeoutSeconds)),
});

const seriesUnit = optionalText.meta(doc('Unit shown beside the figures, e.g. EUR k.', d.series.unit));
const seriesKind = z.enum(['flow', 'stock', 'ratio']);
const seriesKindDoc = doc(
  'flow: sums over a period (sales, orders); stock: a level (headcount, inventory); ratio: a formula numerator / ' +
    'denominator. Default: flow, or ratio for a formula whose top operation is a division.',
);
const better = z.enum(['higher', 'lower']);
const betterDoc = doc('Which side of the target is favourable (lower for costs); needs a target.', d.series.better);
const seriesLabel = optionalText.meta(doc('Name shown in the report. Default: the id.'));
const seriesTarget = optionalText.meta(
  doc("Id of another series holding this one's target or budget.", d.series.target),
);
const seriesHidden = z
  .boolean()
  .nullish()
  .meta(doc('Analyse but leave out of the report (e.g. a budget).', d.series.hidden));

const seriesEntry = z.strictObject({
  id: slug.meta(doc('Unique id of the series (lowercase letters, digits, hyphens). Required.')),
  label: seriesLabel,
  unit: seriesUnit,
  source: text.meta(doc('Id of the source the series is read from. Required (or formula instead).')),
  column: optionalText.meta(doc('Column (wide) or key (long) of the series in its source. Default: the id.')),
  kind: seriesKind.nullish().meta(seriesKindDoc),
  target: seriesTarget,
  better: better.nullish().meta(betterDoc),
  hidden: seriesHidden,
  aggregate: seriesAggregate,
  ...analysisShape,
});

/** A derived series: `formula:` over other series' ids instead of `source:` (see src/derive/formulas/). */
const formulaEntry = z.strictObject({
  id: slug.meta(doc('Unique id of the series (lowercase letters, digits, hyphens). Required.')),
  label: seriesLabel,
  unit: seriesUnit,
  formula: text.meta(
    doc(
      "Instead of source: other series' ids with + - * /, brackets, numbers and sum(a, b, …); a minus between two " +
        'ids has spaces around it (net-sales - cogs). Required.',
    ),
  ),
  kind: seriesKind.nullish().meta(seriesKindDoc),
  target: seriesTarget,
  better: better.nullish().meta(betterDoc),
  hidden: seriesHidden,
  ...analysisShape,
});

/** `{fromSource: ID, ...}`: every key of a long source becomes a series with these settings. */
const fromSourceEntry = z.strictObject({
  fromSource: text.meta(doc('Id of a long source: every key in it becomes a series with these settings. Required.')),
  unit: seriesUnit,
  kind: z
    .enum(['flow', 'stock'])
    .nullish()
    .meta(doc('flow: sums over a period (sales, orders); stock: a level (headcount, inventory).', d.series.kind)),
  hidden: seriesHidden,
  aggregate: seriesAggregate,
  ...analysisShape,
});

const groupEntry = z.strictObject({
  id: slug.meta(doc('Unique id of the group. Required.')),
  title: text.meta(doc('Heading of the report section. Required.')),
  series: z.array(text).min(1).meta(doc('Ids of the series in the section, in order. Required.')),
  total: optionalText.meta(doc("Id of a series that the group's series add up to.", null)),
  adjustTotal: z
    .enum(['direct', 'indirect'])
    .nullish()
    .meta(
      doc(
        "direct: the total's own seasonal adjustment; indirect: the sum of its adjusted parts. Needs total.",
        d.group.adjustTotal,
      ),
    ),
  reconcile: z
    .enum(['mint', 'ols', 'bottom-up', 'none'])
    .nullish()
    .meta(doc('How the forecasts of a hierarchy are made to add up; one method per hierarchy.', d.group.reconcile)),
});

export const packSchema = z
  .strictObject({
    pack: packSection.meta(doc('What the report is: title, frequency, review period, outputs.')),
    branding: brandingSection.nullish().meta(doc('Logo, colour, font and paper of the report.')),
    thresholds: thresholdsSection.nullish().meta(doc('When figures are flagged in callouts.')),
    sources: z.array(sourceEntry).min(1).meta(doc('Data files the series are read from. Required.')),
    series: z
      .array(z.union([seriesEntry, formulaEntry, fromSourceEntry]))
      .min(1)
      .meta(
        doc(
          'Series to analyse: each from a source column or key, a formula over other series, or {fromSource: ID} ' +
            'for every key of a long source. Required.',
        ),
      ),
    groups: z.array(groupEntry).nullish().meta(doc('Report sections, each a titled list of series.')),
    defaults: z
      .strictObject(analysisShape)
      .nullish()
      .meta(doc("Analysis settings for every series; a series' own blocks win.")),
  })
  .meta({title: 'ebbflow pack file', description: 'A review pack: which series, which period, which outputs.'});

/** A pack file as validated by the schema, before defaults and paths are resolved. */
export type PackConfig = z.output<typeof packSchema>;
export type SeriesEntry = z.output<typeof seriesEntry>;
export type FormulaEntry = z.output<typeof formulaEntry>;
export type FromSourceEntry = z.output<typeof fromSourceEntry>;
/** The analysis blocks as written (every key optional). */
export type AnalysisConfig = z.output<z.ZodObject<typeof analysisShape>>;
