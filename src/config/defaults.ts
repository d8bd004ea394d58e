import type {AnalysisOptions, Branding, OutputFormat, SourcePlan, Thresholds} from './plan.js';
import type {Frequency} from '../time/period.js';

/** Analysis options as written in `defaults:` before the values that depend on the data are resolved. */
export interface AnalysisDefaults {
  decomposition: Omit<AnalysisOptions['decomposition'], 'seasonalWindow'> & {
    seasonalWindow: 'periodic' | number | null;
  };
  calendar: AnalysisOptions['calendar'];
  outliers: AnalysisOptions['outliers'];
  forecast: Omit<AnalysisOptions['forecast'], 'horizon'> & {horizon: number | null};
  cycle: AnalysisOptions['cycle'];
}

/**
 * Every default of the pack file, in one place. `loadPlan` deep-merges this object, then the pack's
 * `defaults:` block, then each series' own blocks; a key left empty (null) in the pack counts as not set.
 */
export const defaultConfig = {
  pack: {
    /** Default: `html, pdf, json, csv, xlsx` (everything). */
    formats: ['html', 'pdf', 'json', 'csv', 'xlsx'] as OutputFormat[],
    /** Default: `en-GB`. */
    locale: 'en-GB',
    /** Default: 1 (January; the fiscal year is the calendar year). */
    fiscalYearStart: 1,
    /** Default: `out` in the current directory. */
    outDir: 'out',
  },
  branding: {
    /** Default: none. */
    logo: null,
    /** Default: `#1d6f64` (ebbflow teal). */
    accent: '#1d6f64',
    /** Default: `Liberation Sans`. */
    font: 'Liberation Sans',
    /** Default: `A4`. */
    paper: 'A4',
    /** Default: `portrait`. */
    orientation: 'portrait',
    /** Default: none. */
    footer: null,
    /** Default: none (the built-in templates). */
    templates: null,
    /** Default: false (bookmarks are written either way). */
    taggedPdf: false,
  } satisfies Branding as Branding,
  thresholds: {
    /** Default: 3 robust standard deviations (common practice for flagging irregulars). */
    residualSigma: 3,
    /** Default: 1 percent. */
    revisionPct: 1,
    /** Default: 2 percent. */
    targetPct: 2,
  } satisfies Thresholds as Thresholds,
  source: {
    /** Default: `wide` (one column per series). */
    layout: 'wide',
    /** Default: `date`. */
    dateColumn: 'date',
    /** Default: `auto` (comma, semicolon or tab, sniffed from the header line). */
    delimiter: 'auto',
    /** Default: `.`. */
    decimal: '.',
    /** Default: `utf-8`. */
    encoding: 'utf-8',
    /** Default: 1 (the first line or row holds the header). */
    headerRow: 1,
    /** Default: `UTC`. */
    timeZone: 'UTC',
    /** Default: `missing`. */
    emptyMeans: 'missing',
    /** Default: 60 seconds. */
    timeoutSeconds: 60,
  } satisfies Partial<SourcePlan> as Pick<
    SourcePlan,
    'layout' | 'dateColumn' | 'delimiter' | 'decimal' | 'encoding' | 'headerRow' | 'timeZone' | 'emptyMeans' | 'timeoutSeconds'
  >,
  series: {
    /** Default: `flow`. */
    kind: 'flow',
    /** Default: none. */
    unit: null,
    /** Default: none. */
    target: null,
    /** Default: false. */
    hidden: false,
    /** Default: `higher`. */
    better: 'higher',
  } as {kind: 'flow'; unit: string | null; target: string | null; hidden: boolean; better: 'higher' | 'lower'},
  group: {
    /** Default: `direct`. */
    adjustTotal: 'direct',
    /** Default: `mint`. */
    reconcile: 'mint',
  } as {adjustTotal: 'direct' | 'indirect'; reconcile: 'mint' | 'ols' | 'bottom-up' | 'none'},
  analysis: {
    decomposition: {
      /** Default: `stl`. */
      method: 'stl',
      /** Default: `auto` (multiplicative for strictly positive series whose seasonal swing grows with the level). */
      model: 'auto',
      /** Default: null = 13 for STL (common practice), `periodic` for classical. */
      seasonalWindow: null,
      /** Default: null = STL's rule, the smallest odd integer ≥ 1.5·period / (1 − 1.5 / seasonalWindow). */
      trendWindow: null,
      /** Default: null = STL's rule, the smallest odd integer ≥ period. */
      lowpassWindow: null,
      /** Default: true. */
      robust: true,
      /** Default: null = 0. */
      seasonalDegree: null,
      /** Default: null = 1. */
      trendDegree: null,
      /** Default: null = the trend degree. */
      lowpassDegree: null,
      /** Default: null = 1 when robust, else 2. */
      innerIterations: null,
      /** Default: null = 15 when robust, else 0. */
      outerIterations: null,
    },
    calendar: {
      /** Default: `auto`. */
      workingDays: 'auto',
      /** Default: `auto`. */
      easter: 'auto',
      /** Default: none. */
      holidays: [],
    },
    outliers: {
      /** Default: true. */
      enabled: true,
    },
    forecast: {
      /** Default: `auto`. */
      method: 'auto',
      /** Default: null = 12 monthly, 4 quarterly, 13 weekly. */
      horizon: null,
      /** Default: 80 and 95 percent. */
      levels: [80, 95],
      /** Default: 6. */
      backtestOrigins: 6,
    },
    cycle: {
      /** Default: `hp`. */
      method: 'hp',
      /** Default: null = 129600 monthly, 1600 quarterly (Ravn and Uhlig 2002), chosen by the cycle engine. */
      lambda: null,
    },
  } satisfies AnalysisDefaults as AnalysisDefaults,
};

/** Forecast horizon when `forecast.horizon` is not set: one year ahead (13 weeks for weekly data). */
export const defaultHorizon: Record<Frequency, number> = {monthly: 12, quarterly: 4, weekly: 13};

/** STL seasonal window when `decomposition.seasonalWindow` is not set (common practice); classical uses `periodic`. */
export const defaultStlSeasonalWindow = 13;
