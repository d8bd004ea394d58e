import type {TopLevelSpec} from 'vega-lite';

/**
 * The view model: every string the templates print, already worded and formatted for the pack's language and
 * locale, plus the chart specs still to be drawn. Plain data (handlebars sees only own properties); strings are
 * plain text and the templates escape them. Only chart SVG (ours) is inserted unescaped.
 */
export interface ChartJob {
  id: string;
  caption: string;
  /** Accessible one-line title. */
  title: string;
  spec: TopLevelSpec;
  size: 'full' | 'half';
  /** A short reading note printed under the chart, or null. */
  note: string | null;
}

export interface FigureSlot {
  chart: ChartJob;
  /** Filled by html.ts with the drawn SVG. */
  svg: unknown;
  /** Filled by html.ts: the chart's title and description, read out in place of the drawing. */
  alt?: string;
}

export interface CalloutView {
  id: string;
  severity: string;
  severityLabel: string;
  text: string;
  /** `#chart-…` or `#series-…`, or null. */
  href: string | null;
  series: string | null;
}

export interface KeyFigure {
  label: string;
  value: string;
}

export interface ForecastRow {
  period: string;
  mean: string;
  inner: string;
  outer: string;
}

export interface SeriesView {
  id: string;
  anchor: string;
  title: string;
  unit: string | null;
  kicker: string | null;
  keyFigures: KeyFigure[];
  /** The section's opening paragraph. */
  commentary: string;
  /** The exceptions among the series' callouts (alerts and watches). */
  callouts: CalloutView[];
  notes: string[];
  rows: FigureSlot[][];
  forecast: {
    caption: string;
    innerLabel: string;
    outerLabel: string;
    rows: ForecastRow[];
    accuracy: string | null;
    outturn: string | null;
  } | null;
}

export interface SummaryRow {
  anchor: string;
  label: string;
  unit: string | null;
  latestPeriod: string;
  latest: string;
  yoy: string;
  adjusted: string;
  trend: string;
  trendClass: string;
  phase: string;
  outlook: string;
  flags: string[];
  spark: string;
}

/** One row of the appendix's compact table. */
export interface MethodsRow {
  anchor: string;
  series: string;
  model: string;
  window: string;
  calendar: string;
  outliers: string;
  forecast: string;
  mase: string;
  cautions: string;
}

export interface HistoryView {
  previous: string;
  revisions: {series: string; period: string; measure: string; kind: string; previous: string; current: string; change: string; large: boolean}[];
  tracking: {series: string; publishedIn: string; horizon: string; forecast: string; actual: string; error: string; inside: string}[];
  /** Sentence on the smaller revisions left out of the table, or null when none were left out. */
  revisionsNote: string | null;
  /** Sentence pointing to the full tracking export, or null when there is nothing to check. */
  trackingNote: string | null;
  summary: {series: string; count: string; mase: string; coverage: string}[];
  chart: FigureSlot | null;
  /** Lead-in of the table of forecasts made for the review period. */
  madeFor: string;
}

export interface ViewModel {
  /** Language of the words, for the page's `lang` attribute. */
  lang: string;
  /** Locale of numbers and dates (charts follow it). */
  locale: string;
  /** Every fixed label and heading the templates print, in the pack's language. */
  labels: Record<string, string>;
  cover: {
    title: string;
    subtitle: string | null;
    organisation: string | null;
    period: string;
    preparedBy: string | null;
    confidentiality: string | null;
    logo: string | null;
    logoAlt: string;
  };
  /** Said once, on the summary page, when the pack's locale has no words of its own here; else null. */
  fallback: string | null;
  /** The summary's opening paragraph. */
  commentary: string;
  headline: CalloutView[];
  summary: SummaryRow[];
  summaryNote: string;
  /** The main driver of each group's total, one sentence each. */
  drivers: string[];
  /** Series with a target: actual against target for the period and the fiscal year to date. */
  variance: VarianceRow[];
  series: SeriesView[];
  history: HistoryView | null;
  methods: {paragraphs: string[]; rows: MethodsRow[]};
  cautions: string[];
  inputs: {path: string; sha256: string; size: string; rows: string}[];
  notes: {where: string; message: string}[];
  builtWith: string;
  version: string;
  period: string;
  /** Sections the PDF bookmarks point to, for the page's hidden list of links to them. */
  outline: {title: string; dest: string}[];
}

/** One row of the summary's variance table. */
export interface VarianceRow {
  anchor: string;
  label: string;
  period: VarianceCells;
  yearToDate: VarianceCells;
}

export interface VarianceCells {
  actual: string;
  target: string;
  percent: string;
  favourable: string;
  calendar: string;
  /** `good` or `bad`, for the cell's colour. */
  tone: 'good' | 'bad';
}
