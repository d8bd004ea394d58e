import {z} from 'zod';
import {DATE_FORMAT} from '../time/parseDate.js';
import {isTimeZone} from '../time/zone.js';
import {SLUG} from './slug.js';

/**
 * The pack file's schema: the one description of which keys exist and what values they take.
 * Objects are strict (unknown keys are errors). Optional keys also accept null, which means "not set".
 * Relations between entries (references, unique ids, files on disk) are checked in `crossCheck.ts`.
 */

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

export const decompositionSchema = z.strictObject({
  method: z.enum(['stl', 'classical']).nullish(),
  model: z.enum(['additive', 'multiplicative', 'auto']).nullish(),
  seasonalWindow: z.union([z.literal('periodic'), seasonalSpan], {error: seasonalMessage}).nullish(),
  trendWindow: oddWindow(3).nullish(),
  lowpassWindow: oddWindow(3).nullish(),
  robust: z.boolean().nullish(),
  seasonalDegree: degree.nullish(),
  trendDegree: degree.nullish(),
  lowpassDegree: degree.nullish(),
  innerIterations: z.number().int().min(1).nullish(),
  outerIterations: z.number().int().min(0).nullish(),
});

export const calendarSchema = z.strictObject({
  workingDays: z.enum(['auto', 'off']).nullish(),
  easter: z.enum(['auto', 'off']).nullish(),
  holidays: z.array(isoDate).nullish(),
});

export const outliersSchema = z.strictObject({enabled: z.boolean().nullish()});

export const forecastSchema = z.strictObject({
  method: z.enum(['auto', 'ets', 'theta', 'arima', 'seasonal-naive', 'combination']).nullish(),
  horizon: z.number().int().min(1).nullish(),
  levels: z
    .array(z.number().min(50, {error: 'must be between 50 and 99.9'}).max(99.9, {error: 'must be between 50 and 99.9'}))
    .min(1)
    .nullish(),
  backtestOrigins: z.number().int().min(0).nullish(),
});

export const cycleSchema = z.strictObject({
  method: z.enum(['hp', 'bandpass']).nullish(),
  lambda: z.number().positive().nullish(),
});

/** The analysis blocks, allowed under `defaults:` and in each series. */
const analysisShape = {
  decomposition: decompositionSchema.nullish(),
  calendar: calendarSchema.nullish(),
  outliers: outliersSchema.nullish(),
  forecast: forecastSchema.nullish(),
  cycle: cycleSchema.nullish(),
};

export const formatSchema = z.enum(['html', 'pdf', 'json', 'csv', 'xlsx']);

const packSection = z.strictObject({
  id: slug.nullish(),
  title: text,
  subtitle: optionalText,
  organisation: optionalText,
  preparedBy: optionalText,
  confidentiality: optionalText,
  frequency: z.enum(['monthly', 'quarterly', 'weekly']),
  period: text.nullish(),
  formats: z.array(formatSchema).min(1).nullish(),
  locale: locale.nullish(),
  fiscalYearStart: z.number().int().min(1).max(12).nullish(),
  browser: optionalText,
  outDir: optionalText,
});

const brandingSection = z.strictObject({
  logo: optionalText,
  accent: z
    .string()
    .regex(/^#[0-9a-fA-F]{6}$/, {error: 'must be a colour written #rrggbb, e.g. "#1d6f64"'})
    .nullish(),
  font: optionalText,
  paper: z.enum(['A4', 'Letter']).nullish(),
  orientation: z.enum(['portrait', 'landscape']).nullish(),
  footer: optionalText,
  templates: optionalText,
  taggedPdf: z.boolean().nullish(),
});

const thresholdsSection = z.strictObject({
  residualSigma: z.number().positive().nullish(),
  revisionPct: z.number().min(0).nullish(),
  targetPct: z.number().min(0).nullish(),
});

const aggregate = z.enum(['sum', 'mean', 'last', 'first', 'min', 'max', 'count']);

const sourceEntry = z.strictObject({
  id: slug,
  file: optionalText,
  layout: z.enum(['wide', 'long']).nullish(),
  dateColumn: optionalText,
  keyColumn: optionalText,
  valueColumn: optionalText,
  delimiter: z.enum(['auto', ',', ';', '\t']).nullish(),
  decimal: z.enum(['.', ',']).nullish(),
  encoding: z.enum(['utf-8', 'windows-1252']).nullish(),
  // Data as exported: header position, date spelling, workbooks and queries (crossCheck relates them).
  headerRow: z.number().int().min(1, {error: 'must be a line number from 1'}).nullish(),
  dateFormat: z
    .string()
    .regex(DATE_FORMAT, {error: 'must be DD/MM/YYYY, MM/DD/YYYY, DD.MM.YYYY or DD-MM-YYYY, optionally with " HH:mm:ss"'})
    .nullish(),
  timeZone: z.string().refine(isTimeZone, {error: 'must be a time zone name such as UTC or Europe/Berlin'}).nullish(),
  emptyMeans: z.enum(['missing', 'zero']).nullish(),
  sheet: optionalText,
  query: optionalText,
  engine: z.enum(['duckdb', 'postgres']).nullish(),
  connection: z.strictObject({env: z.string().regex(/^[A-Za-z_][A-Za-z0-9_]*$/, {error: 'must be an environment variable name'})}).nullish(),
  timeoutSeconds: z.number().positive().max(3600).nullish(),
});

const seriesKind = z.enum(['flow', 'stock', 'ratio']);
const better = z.enum(['higher', 'lower']);

const seriesEntry = z.strictObject({
  id: slug,
  label: optionalText,
  unit: optionalText,
  source: text,
  column: optionalText,
  kind: seriesKind.nullish(),
  target: optionalText,
  better: better.nullish(),
  hidden: z.boolean().nullish(),
  aggregate: aggregate.nullish(),
  ...analysisShape,
});

/** A derived series: `formula:` over other series' ids instead of `source:` (see src/derive/formulas/). */
const formulaEntry = z.strictObject({
  id: slug,
  label: optionalText,
  unit: optionalText,
  formula: text,
  kind: seriesKind.nullish(),
  target: optionalText,
  better: better.nullish(),
  hidden: z.boolean().nullish(),
  ...analysisShape,
});

/** `{fromSource: ID, ...}`: every key of a long source becomes a series with these settings. */
const fromSourceEntry = z.strictObject({
  fromSource: text,
  unit: optionalText,
  kind: z.enum(['flow', 'stock']).nullish(),
  hidden: z.boolean().nullish(),
  aggregate: aggregate.nullish(),
  ...analysisShape,
});

const groupEntry = z.strictObject({
  id: slug,
  title: text,
  series: z.array(text).min(1),
  total: optionalText,
  adjustTotal: z.enum(['direct', 'indirect']).nullish(),
  reconcile: z.enum(['mint', 'ols', 'bottom-up', 'none']).nullish(),
});

export const packSchema = z.strictObject({
  pack: packSection,
  branding: brandingSection.nullish(),
  thresholds: thresholdsSection.nullish(),
  sources: z.array(sourceEntry).min(1),
  series: z.array(z.union([seriesEntry, formulaEntry, fromSourceEntry])).min(1),
  groups: z.array(groupEntry).nullish(),
  defaults: z.strictObject(analysisShape).nullish(),
});

/** A pack file as validated by the schema, before defaults and paths are resolved. */
export type PackConfig = z.output<typeof packSchema>;
export type SeriesEntry = z.output<typeof seriesEntry>;
export type FormulaEntry = z.output<typeof formulaEntry>;
export type FromSourceEntry = z.output<typeof fromSourceEntry>;
/** The analysis blocks as written (every key optional). */
export type AnalysisConfig = z.output<z.ZodObject<typeof analysisShape>>;
