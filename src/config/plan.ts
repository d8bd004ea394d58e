import type {Frequency} from '../time/period.js';

/**
 * The fully-defaulted pack, produced by `loadPlan`. Nothing after config reads YAML or guesses defaults.
 * Paths are absolute. `line` fields point at the pack-file line that defined the item, for error messages.
 */
export interface Plan {
  /** Absolute path of the pack file. */
  packFile: string;
  /** Pack identifier used for the archive folder: `pack.id`, else the pack file name without extension. */
  id: string;
  title: string;
  subtitle: string | null;
  organisation: string | null;
  preparedBy: string | null;
  confidentiality: string | null;
  frequency: Frequency;
  /** Review period index (see time/period.ts); null = the last period with data in any series. */
  period: number | null;
  formats: OutputFormat[];
  /** BCP 47 locale for numbers and dates, e.g. `en-GB`. Default: `en-GB`. */
  locale: string;
  /** First month (1–12) of the fiscal year. Default: 1. */
  fiscalYearStart: number;
  branding: Branding;
  thresholds: Thresholds;
  /** Folder under which `<id>/<period>/` is written. Default: `out` beside the current directory. */
  outDir: string;
  /** Chromium/Chrome executable; null = look for one (EBBFLOW_CHROMIUM, CHROME_PATH, /usr/bin/chromium…). */
  browser: string | null;
  sources: SourcePlan[];
  series: SeriesPlan[];
  /** Report sections, in order; series not named in any group get a section of their own. */
  groups: GroupPlan[];
  /**
   * `{fromSource: ID}` entries of the pack's series list, for ingest to expand once it has read the
   * source's keys. Empty when the pack has none. Group members and targets that name no explicit
   * series are not checked by config when this is non-empty; ingest must check them after expanding.
   */
  fromSource?: FromSourcePlan[];
}

/** Every key of a long source becomes a series: id = `slugify(key)` (config/slug.ts), label = column = key. */
export interface FromSourcePlan {
  /** Id of the long source. */
  source: string;
  /** Settings shared by every series made from the source, fully resolved (target is always null). */
  template: Omit<SeriesPlan, 'id' | 'label' | 'column'>;
  /** Where the expanded series go in `Plan.series`: before the series at this index (= series.length to append). */
  position: number;
  line: number;
}

export type OutputFormat = 'html' | 'pdf' | 'json' | 'csv' | 'xlsx';

export interface Branding {
  /** Absolute path of a PNG, JPEG or SVG logo, or null. */
  logo: string | null;
  /** Accent colour as `#rrggbb`. */
  accent: string;
  /** Installed font family for text and charts. Default: `Liberation Sans`. */
  font: string;
  paper: 'A4' | 'Letter';
  orientation: 'portrait' | 'landscape';
  footer: string | null;
  /** Absolute path of a folder of templates overriding the built-in ones, or null. */
  templates: string | null;
  /** Tag the PDF's structure for screen readers (slower to print, larger file). Default: false. */
  taggedPdf: boolean;
}

export interface Thresholds {
  /** An irregular beyond this many robust sigmas is flagged. Default: 3. */
  residualSigma: number;
  /** Callout when an adjusted figure is revised by more than this many percent. Default: 1. */
  revisionPct: number;
  /** Callout when a series is further than this many percent from its target. Default: 2. */
  targetPct: number;
}

export interface SourcePlan {
  id: string;
  /** Absolute path of the CSV or XLSX file; for a query source, the pack file (problems point at its line). */
  file: string;
  layout: 'wide' | 'long' | 'across';
  dateColumn: string;
  /** Long and across layouts: the column naming the series. */
  keyColumn: string | null;
  /** Long layout: the column holding the values. */
  valueColumn: string | null;
  /** Field delimiter; `auto` sniffs comma, semicolon or tab from the header line. */
  delimiter: 'auto' | ',' | ';' | '\t';
  /** Decimal mark of numbers in the file. Default: `.`. */
  decimal: '.' | ',';
  encoding: 'utf-8' | 'windows-1252';
  line: number;
  // Data as exported (see the README's pack-file reference).
  /** `csv` or `xlsx` by the file's extension, or the query's `engine`. */
  reader: 'csv' | 'xlsx' | 'duckdb' | 'postgres';
  /** 1-based line (CSV) or row (XLSX) of the header; the lines above it are ignored. Default: 1. */
  headerRow: number;
  /** Day-first or month-first date spelling (`DD/MM/YYYY`, …), or null: only year-first dates are read. */
  dateFormat: string | null;
  /** IANA time zone in which timestamps with a UTC offset are given their date. Default: `UTC`. */
  timeZone: string;
  /** Periods without rows inside the data's span: `missing` (NaN), or `zero` for `sum` and `count`. */
  emptyMeans: 'missing' | 'zero';
  /** XLSX: the worksheet's name; null = the first sheet. */
  sheet: string | null;
  /** Query sources: the SQL text, run as is; null for files. */
  query: string | null;
  /** postgres: the environment variable holding the connection string (never the string itself). */
  connectionEnv: string | null;
  /** Query sources: statement timeout in seconds. Default: 60. */
  timeoutSeconds: number;
  /** duckdb: the folders a query may read (pack folder and `--allow-dir`), absolute with symlinks resolved. */
  readFolders: string[];
}

export interface SeriesPlan {
  id: string;
  label: string;
  /** Unit shown after values, e.g. `EUR k`, `orders`. */
  unit: string | null;
  /** Source id; the empty string for a derived series (`formula` set). */
  source: string;
  /** Wide layout: column name; long layout: key value; the empty string for a derived series. */
  column: string;
  /**
   * `flow` (sums over a period: sales, orders), `stock` (a level at a date: headcount, inventory) or `ratio` (a
   * formula numerator / denominator, never summed over periods: its year-to-date figure is the ratio of sums).
   * Default: `flow`; for a formula whose top operation is a division, `ratio` (resolved by derive).
   */
  kind: 'flow' | 'stock' | 'ratio';
  /** A derived series' formula over other series' ids, or null for a series read from a source. */
  formula: FormulaPlan | null;
  /** Id of another series holding the target/budget for this one, or null. */
  target: string | null;
  /** Which way a variance against the target is favourable. Default: `higher` (costs: `lower`). */
  better: 'higher' | 'lower';
  /** Hidden series are read (e.g. as targets) but get no section of their own. */
  hidden: boolean;
  /**
   * How rows falling in one period are combined; absent or null = not set: `sum` for flows, `last` for stocks,
   * `mean` for ratios, and two rows naming the same period at the pack's own frequency are then a duplicate problem.
   */
  aggregate?: Aggregate | null;
  analysis: AnalysisOptions;
  line: number;
}

/** Ways to combine the rows of one period: values' sum, mean, last or first in time, minimum, maximum, or rows. */
export type Aggregate = 'sum' | 'mean' | 'last' | 'first' | 'min' | 'max' | 'count';

/** A derived series' formula as written. */
export interface FormulaPlan {
  text: string;
  /** Pack-file line of `formula:`. */
  line: number;
  /** Whether the pack sets `kind:`; if not, derive makes a formula whose top operation is a division a ratio. */
  kindGiven: boolean;
}

export interface GroupPlan {
  id: string;
  title: string;
  /** The group's series; with a `total`, its parts. */
  series: string[];
  /** The series the parts add up to, or null for a plain report section. */
  total: string | null;
  /** How the total is seasonally adjusted: its own adjustment, or the sum of its adjusted parts. Default: `direct`. */
  adjustTotal: 'direct' | 'indirect';
  /** How forecasts of the total and parts are made to add up. Default: `mint`. */
  reconcile: 'mint' | 'ols' | 'bottom-up' | 'none';
  line: number;
}

/** Per-series analysis options after merging `defaults` with the series' own keys. */
export interface AnalysisOptions {
  decomposition: {
    method: 'stl' | 'classical';
    model: 'additive' | 'multiplicative' | 'auto';
    /** `periodic` or an odd integer ≥ 7. Default: `periodic` for classical, 13 for STL (common practice). */
    seasonalWindow: 'periodic' | number;
    /** Odd integer; null = STL's default rule. */
    trendWindow: number | null;
    /** Odd integer; null = STL's default rule. */
    lowpassWindow: number | null;
    robust: boolean;
    /** LOESS degree of the seasonal smoother (0 or 1); null = 0 (STL paper and R's default). */
    seasonalDegree: 0 | 1 | null;
    /** LOESS degree of the trend smoother; null = 1. */
    trendDegree: 0 | 1 | null;
    /** LOESS degree of the low-pass smoother; null = the trend degree. */
    lowpassDegree: 0 | 1 | null;
    /** STL inner-loop passes; null = 1 when robust, else 2 (STL paper). */
    innerIterations: number | null;
    /** STL robustness passes; null = 15 when robust, else 0 (R's default). */
    outerIterations: number | null;
  };
  calendar: {
    /** Working-day (day-of-week) regression: `auto` = flows only, kept when significant. */
    workingDays: 'auto' | 'off';
    /** Easter effect: `auto` = monthly/quarterly flows only, kept when significant. */
    easter: 'auto' | 'off';
    /** Extra holiday dates, ISO `YYYY-MM-DD`. */
    holidays: string[];
  };
  outliers: {enabled: boolean};
  forecast: {
    method: 'auto' | 'ets' | 'theta' | 'arima' | 'seasonal-naive' | 'combination';
    /** Periods ahead. Default: 12 monthly, 4 quarterly, 13 weekly. */
    horizon: number;
    levels: number[];
    /** Rolling-origin back-test origins. Default: 6. */
    backtestOrigins: number;
  };
  cycle: {
    method: 'hp' | 'bandpass';
    /** HP smoothing; null = 1600 quarterly, 129600 monthly (Ravn & Uhlig 2002), per-frequency default. */
    lambda: number | null;
  };
}
