import {relative, dirname, isAbsolute} from 'node:path';
import type {TopLevelSpec} from 'vega-lite';
import type {SeriesAnalysis} from '../analyse/types.js';
import type {Callout} from '../narrate/types.js';
import {parsePeriod, periodsPerYear, type Frequency} from '../time/period.js';
import type {Plan, SeriesPlan} from '../config/plan.js';
import type {Report, ReportSeries} from './types.js';
import type {OutlineEntry} from './pdfOutline.js';
import {formatter, type Formatter} from './format.js';
import {themeFor, type Theme} from './theme.js';
import type {ChartContext} from './charts/common.js';
import {overviewChart} from './charts/overview.js';
import {seasonalChart} from './charts/seasonal.js';
import {yearOnYearChart} from './charts/yearOnYear.js';
import {irregularChart} from './charts/irregular.js';
import {forecastChart} from './charts/forecast.js';
import {cycleChart} from './charts/cycle.js';
import {trackingChart} from './charts/tracking.js';
import {phaseLabels} from '../analyse/cycle/index.js';
import {sparkline} from './charts/sparkline.js';
import {
  CAUTIONS,
  CYCLE_METHOD,
  DECOMPOSITION_METHOD,
  MEASURE,
  OUTLIER_WORD,
  REVISION_KIND,
  SECTION,
  SEVERITY,
  plural,
  pValue,
} from './words.js';
import {
  contributionsSlot,
  driverLines,
  structureMethodItems,
  varianceKeyFigures,
  varianceRows,
  type VarianceRow,
} from './structureView.js';

/**
 * Report → view model: every string the templates print, already formatted for the pack's locale, plus the
 * chart specs still to be drawn. Pure (no I/O); `html.ts` draws the charts and fills the templates.
 *
 * Strings here are plain text; the templates escape them. Only chart SVG (ours) is inserted unescaped.
 */
export type ChartPart = 'overview' | 'seasonal' | 'yoy' | 'irregular' | 'forecast' | 'cycle' | 'tracking';

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

export interface CalloutView {
  id: string;
  severity: string;
  severityLabel: string;
  text: string;
  /** `#chart-…` or `#series-…`, or null. */
  href: string | null;
  series: string | null;
}

export interface FigureSlot {
  chart: ChartJob;
  /** Filled by html.ts with the drawn SVG. */
  svg: unknown;
  /** Filled by html.ts: the chart's title and description, read out in place of the drawing. */
  alt?: string;
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
  callouts: CalloutView[];
  notes: string[];
  rows: FigureSlot[][];
  forecast: {
    method: string;
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

export interface MethodsView {
  anchor: string;
  title: string;
  items: KeyFigure[];
  regressors: {name: string; coefficient: string; t: string; p: string; description: string}[];
  notes: string[];
}

export interface ViewModel {
  lang: string;
  words: typeof SECTION;
  cover: {
    title: string;
    subtitle: string | null;
    organisation: string | null;
    period: string;
    preparedBy: string | null;
    confidentiality: string | null;
    logo: string | null;
  };
  headline: CalloutView[];
  summary: SummaryRow[];
  /** Series with a target: actual against target for the period and the fiscal year to date. */
  variance: VarianceRow[];
  /** The main driver of each group's total, one sentence each. */
  drivers: string[];
  summaryNote: string;
  series: SeriesView[];
  history: {
    previous: string;
    revisions: {series: string; period: string; measure: string; kind: string; previous: string; current: string; change: string; large: boolean}[];
    tracking: {series: string; publishedIn: string; horizon: string; forecast: string; actual: string; error: string; inside: string}[];
    /** Sentence on the smaller revisions left out of the table, or null when none were left out. */
    revisionsNote: string | null;
    /** Sentence pointing to the full tracking export, or null when there is nothing to check. */
    trackingNote: string | null;
    summary: {series: string; count: string; mase: string; coverage: string}[];
    chart: FigureSlot | null;
  } | null;
  methods: MethodsView[];
  cautions: string[];
  inputs: {path: string; sha256: string; size: string; rows: string}[];
  notes: {where: string; message: string}[];
  version: string;
  period: string;
  /** Sections the PDF bookmarks point to, for the page's hidden list of links to them. */
  outline: {title: string; dest: string}[];
}

export interface PageGeometry {
  /** Content width in CSS px (96 per inch). */
  width: number;
}

/** Content width of the page in CSS px, for the paper, orientation and the margins in styles.css (16 mm). */
export function pageGeometry(paper: 'A4' | 'Letter', orientation: 'portrait' | 'landscape'): PageGeometry {
  const [w, h] = paper === 'A4' ? [210, 297] : [215.9, 279.4];
  const across = orientation === 'portrait' ? w : h;
  return {width: Math.floor(((across - 32) * 96) / 25.4)};
}

export function chartAnchor(seriesId: string, part: ChartPart): string {
  return part === 'tracking' ? 'chart-tracking' : `chart-${seriesId}-${part}`;
}

/** Build the view model. `logo` is the already-inlined data: URI (or null). */
export function buildView(report: Report, logo: string | null): ViewModel {
  const {plan} = report;
  const f = formatter(plan.locale);
  const theme = themeFor(plan.branding.accent, plan.branding.font);
  const geometry = pageGeometry(plan.branding.paper, plan.branding.orientation);
  const visible = report.series.filter((s) => !s.plan.hidden);
  const ordered = orderSeries(report, visible);
  const labels = new Map(report.series.map((s) => [s.plan.id, s.plan.label]));
  const series = ordered.map(({entry, kicker}) => seriesView(entry, kicker, f, theme, geometry, report.plan.frequency));
  // A group's total shows its parts' contributions under its overview chart.
  ordered.forEach(({entry}, k) => {
    const ctx: ChartContext = {frequency: plan.frequency, theme, width: geometry.width, height: 210, unit: null, seasonNames: []};
    const slot = contributionsSlot(entry.plan.id, entry.plan.label, report.groups, labels, ctx, report.period, f);
    if (slot) series[k].rows.splice(Math.min(1, series[k].rows.length), 0, [slot]);
  });
  const anchors = new Set(series.flatMap((s) => s.rows.flat().map((slot) => slot.chart.id)));
  const link = (c: Callout) =>
    c.chart && anchors.has(c.chart) ? `#${c.chart}` : c.seriesId && labels.has(c.seriesId) ? `#series-${c.seriesId}` : null;
  series.forEach((view, k) => {
    view.callouts = ordered[k].entry.callouts.map((c) => calloutView(c, labels, link));
  });
  return {
    lang: f.locale,
    words: SECTION,
    cover: {
      title: plan.title,
      subtitle: plan.subtitle,
      organisation: plan.organisation,
      period: f.periodLong(plan.frequency, report.period),
      preparedBy: plan.preparedBy,
      confidentiality: plan.confidentiality,
      logo,
    },
    headline: report.callouts.slice(0, 6).map((c) => calloutView(c, labels, link)),
    summary: visible.map((s) => summaryRow(s, f, theme)),
    variance: varianceRows(visible, f),
    drivers: driverLines(report),
    summaryNote: summaryNote(plan.frequency),
    series,
    history: historyView(report, f, theme, geometry, labels),
    methods: visible.map((s) => {
      const m = methodsView(s, f);
      return {...m, items: [...m.items, ...structureMethodItems(s, report.groups, f)]};
    }),
    cautions: CAUTIONS,
    inputs: report.inputs.map((i) => ({
      path: isAbsolute(i.file) ? relative(dirname(plan.packFile), i.file) || i.file : i.file,
      sha256: i.sha256,
      size: `${f.number(i.bytes, 0)} bytes`,
      rows: f.number(i.rows, 0),
    })),
    notes: report.notes.map((n) => ({
      where: `${relative(dirname(plan.packFile), n.file) || n.file}${n.line != null ? `, line ${n.line}` : ''}`,
      message: n.message,
    })),
    version: report.toolVersion,
    period: f.periodLong(plan.frequency, report.period),
    outline: flatten(reportOutline(report)).map(({title, dest}) => ({title, dest})),
  };
}

/**
 * The chart slots of one series exactly as its section will hold them, from the plan and the series' analysis
 * alone, so that charts can be drawn while other series are still being analysed.
 */
export function seriesFigureSlots(plan: Plan, series: SeriesPlan, analysis: SeriesAnalysis): FigureSlot[] {
  const f = formatter(plan.locale);
  const theme = themeFor(plan.branding.accent, plan.branding.font);
  const geometry = pageGeometry(plan.branding.paper, plan.branding.orientation);
  return seriesView({plan: series, analysis, callouts: [], combination: null}, null, f, theme, geometry, plan.frequency)
    .rows.flat();
}

interface Placed {
  entry: ReportSeries;
  kicker: string | null;
  /** Index of the pack's group that placed the series, or null. */
  group: number | null;
}

/** Groups first, in plan order (a group's total before its parts); then every visible series not in a group. */
function orderSeries(report: Report, visible: ReportSeries[]): Placed[] {
  const byId = new Map(visible.map((s) => [s.plan.id, s]));
  const placed = new Set<string>();
  const out: Placed[] = [];
  report.plan.groups.forEach((group, index) => {
    for (const id of group.total === null ? group.series : [group.total, ...group.series]) {
      const entry = byId.get(id);
      if (!entry || placed.has(id)) continue;
      placed.add(id);
      out.push({entry, kicker: group.title, group: index});
    }
  });
  for (const entry of visible) if (!placed.has(entry.plan.id)) out.push({entry, kicker: null, group: null});
  return out;
}

/**
 * The PDF's bookmarks: the summary; each series section, under its group's title when the pack groups them;
 * the history section when there is one; the methods appendix with an entry per series; the data notes.
 * The page carries a hidden list of links to these ids, which is what makes the browser record them.
 */
export function reportOutline(report: Report): OutlineEntry[] {
  const visible = report.series.filter((s) => !s.plan.hidden);
  const series: OutlineEntry[] = [];
  let lastGroup: number | null = null;
  for (const {entry, kicker, group} of orderSeries(report, visible)) {
    const item: OutlineEntry = {title: entry.plan.label, dest: `series-${entry.plan.id}`, children: []};
    if (group === null || kicker === null) series.push(item);
    else if (group === lastGroup) series[series.length - 1].children.push(item);
    else series.push({title: kicker, dest: item.dest, children: [item]});
    lastGroup = group;
  }
  const methods = visible.map((s) => ({title: s.plan.label, dest: `methods-${s.plan.id}`, children: []}));
  return [
    {title: SECTION.summary, dest: 'summary', children: []},
    ...series,
    ...(report.history ? [{title: SECTION.history, dest: 'history', children: []}] : []),
    {title: SECTION.methods, dest: 'methods', children: methods},
    {title: SECTION.dataNotes, dest: 'data-notes', children: []},
  ];
}

/** Every entry of an outline, parents before their children. */
function flatten(entries: OutlineEntry[]): OutlineEntry[] {
  return entries.flatMap((e) => [e, ...flatten(e.children)]);
}

function calloutView(c: Callout, labels: Map<string, string>, link: (c: Callout) => string | null): CalloutView {
  return {
    id: `callout-${c.id.replace(/[^A-Za-z0-9_-]/g, '-')}`,
    severity: c.severity,
    severityLabel: SEVERITY[c.severity] ?? c.severity,
    text: c.text,
    href: link(c),
    series: c.seriesId ? (labels.get(c.seriesId) ?? null) : null,
  };
}

function hasFinite(values: number[]): boolean {
  return values.some(Number.isFinite);
}

function last<T>(values: T[]): T | undefined {
  return values[values.length - 1];
}

function summaryNote(frequency: Frequency): string {
  const p = frequency === 'monthly' ? 'month' : frequency === 'quarterly' ? 'quarter' : 'week';
  return `Changes are in percent. “Adjusted” compares the seasonally adjusted figure with the previous ${p}. The outlook shows the fiscal-year outturn against target where a target is set, otherwise the forecast for the next ${p} with its 80% range.`;
}

function summaryRow(s: ReportSeries, f: Formatter, theme: Theme): SummaryRow {
  const a = s.analysis;
  const c = a.changes;
  const flags: string[] = [];
  const outliers = a.adjustment?.outliers.length ?? 0;
  if (outliers > 0) flags.push(plural(outliers, 'unusual value', 'unusual values'));
  if (a.adjustment === null) flags.push('not adjusted');
  if (a.original.length < 3 * periodsPerYear[a.frequency]) flags.push('short series');
  const filled = a.adjustment?.filled.filter(Boolean).length ?? 0;
  if (filled > 0) flags.push(plural(filled, 'gap filled', 'gaps filled'));
  if (a.notes.length > 0) flags.push(plural(a.notes.length, 'data note', 'data notes'));
  const recent = a.original.slice(-3 * periodsPerYear[a.frequency]);
  return {
    anchor: `#series-${s.plan.id}`,
    label: s.plan.label,
    unit: s.plan.unit,
    latestPeriod: f.period(a.frequency, a.end),
    latest: f.number(last(a.original)),
    yoy: f.percent(c.yearOnYear),
    adjusted: f.percent(c.periodOnPeriodAdjusted),
    trend: a.adjustment ? c.trendDirection : '–',
    trendClass: a.adjustment ? `trend-${c.trendDirection}` : 'trend-none',
    phase: a.cycle?.phaseLabel ?? '–',
    outlook: outlook(a, f),
    flags,
    spark: sparkline(recent, {colour: theme.deep, label: `${s.plan.label}: last ${recent.length} periods`}),
  };
}

function outlook(a: SeriesAnalysis, f: Formatter): string {
  const o = a.outturn;
  if (o && o.target !== null) {
    return `${o.fiscalYear}: ${f.number(o.total)} vs target ${f.number(o.target)} (${f.percent(o.gapPct)})`;
  }
  const fc = a.forecast;
  if (fc && fc.mean.length > 0) {
    const inner = String(Math.min(...fc.levels));
    const lo = fc.lower[inner]?.[0];
    const hi = fc.upper[inner]?.[0];
    const range = lo !== undefined && hi !== undefined ? ` (${f.number(lo)}–${f.number(hi)})` : '';
    return `${f.period(a.frequency, a.start + fc.startOffset)}: ${f.number(fc.mean[0])}${range}`;
  }
  return '–';
}

function seriesView(
  s: ReportSeries,
  kicker: string | null,
  f: Formatter,
  theme: Theme,
  geometry: PageGeometry,
  frequency: Frequency,
): SeriesView {
  const a = s.analysis;
  const id = s.plan.id;
  const name = s.plan.label;
  const seasonNames = Array.from({length: periodsPerYear[frequency]}, (_, k) => f.season(frequency, k));
  const half = Math.floor((geometry.width - 18) / 2);
  const ctx = (size: 'full' | 'half'): ChartContext => ({
    frequency,
    theme,
    width: size === 'full' ? geometry.width : half,
    height: size === 'full' ? 210 : 180,
    unit: s.plan.unit,
    seasonNames,
  });
  const span = `${f.period(frequency, a.start)} to ${f.period(frequency, a.end)}`;
  const slot = (part: ChartPart, size: 'full' | 'half', caption: string, spec: TopLevelSpec, note: string | null = null): FigureSlot => ({
    chart: {id: chartAnchor(id, part), caption, title: `${name}: ${caption}`, spec, size, note},
    svg: null,
  });
  const notes: string[] = [];
  if (a.adjustment === null) notes.push(a.notAdjustedReason ?? 'This series was not seasonally adjusted.');
  notes.push(...a.notes);
  if (a.forecast === null) notes.push('No forecast was made for this series.');
  else notes.push(...a.forecast.notes);
  if (a.cycle === null) notes.push('No trend and cycle estimate is shown for this series.');

  const adj = a.adjustment;
  const overview = slot(
    'overview',
    'full',
    adj ? 'Original, seasonally adjusted and trend-cycle' : 'Original values',
    overviewChart(
      {
        start: a.start,
        original: a.original,
        adjusted: adj?.adjusted ?? null,
        trend: adj?.trend ?? null,
        description: `Line chart of ${name}${s.plan.unit ? ` (${s.plan.unit})` : ''} from ${span}${adj ? ', showing original, seasonally adjusted and trend-cycle values' : ''}. Latest value ${f.number(last(a.original))} in ${f.period(frequency, a.end)}.`,
      },
      ctx('full'),
    ),
  );
  // A chart needs at least one finite value; vega would otherwise warn about an empty extent.
  if (!hasFinite(a.original)) notes.push('The series has no values to chart.');
  const rows: FigureSlot[][] = hasFinite(a.original) ? [[overview]] : [];
  const middle: FigureSlot[] = [];
  const seasonalShown = adj !== null && hasFinite(adj.seasonal);
  if (adj && seasonalShown) {
    middle.push(
      slot(
        'seasonal',
        'half',
        adj.model === 'multiplicative' ? 'Seasonal pattern by year (% vs normal)' : 'Seasonal pattern by year',
        seasonalChart(
          {
            start: a.start,
            seasonal: adj.seasonal,
            model: adj.model,
            description: `Seasonal effect of ${name} for each ${frequency === 'quarterly' ? 'quarter' : 'month'} of the year, one line per year; the latest year is drawn thicker.`,
          },
          ctx('half'),
        ),
      ),
    );
  }
  const yoyCount = a.changes.yearOnYearSeries.filter(Number.isFinite).length;
  if (yoyCount > 0) {
    middle.push(
      slot(
        'yoy',
        seasonalShown ? 'half' : 'full',
        'Change on a year earlier (%)',
        yearOnYearChart(
          {
            start: a.start,
            yearOnYear: a.changes.yearOnYearSeries,
            description: `Bar chart of the percent change of ${name} on the same period a year earlier; latest ${f.percent(a.changes.yearOnYear)}.`,
          },
          ctx(seasonalShown ? 'half' : 'full'),
        ),
      ),
    );
  }
  if (middle.length > 0) rows.push(middle);
  const lower: FigureSlot[] = [];
  const irregularShown = adj !== null && hasFinite(adj.irregular);
  const cycleShown = a.cycle !== null && hasFinite(a.cycle.gap);
  if (adj && irregularShown) {
    const labels: Record<number, string> = {};
    for (const o of adj.outliers) labels[o.index] = f.period(frequency, a.start + o.index);
    lower.push(
      slot(
        'irregular',
        cycleShown ? 'half' : 'full',
        adj.outliers.length > 0 ? 'Irregular, with flagged values' : 'Irregular',
        irregularChart(
          {
            start: a.start,
            irregular: adj.irregular,
            model: adj.model,
            outliers: adj.outliers,
            labels,
            description: `Irregular component of ${name}; ${adj.outliers.length === 0 ? 'no values flagged' : `flagged: ${adj.outliers.map((o) => `${labels[o.index]} (${OUTLIER_WORD[o.kind]})`).join(', ')}`}.`,
          },
          ctx(cycleShown ? 'half' : 'full'),
        ),
      ),
    );
  }
  if (a.cycle && cycleShown) {
    const cy = a.cycle;
    lower.push(
      slot(
        'cycle',
        irregularShown ? 'half' : 'full',
        'Deviation from long-run trend (%)',
        cycleChart(
          {
            start: a.start,
            gap: cy.gap,
            turningPoints: cy.turningPoints,
            description: `Percent gap between ${name} and its long-run trend over time, with ${cy.turningPoints.length} turning points marked; currently ${cy.phaseLabel}.`,
          },
          ctx(irregularShown ? 'half' : 'full'),
        ),
        `Now ${cy.phaseLabel}.${cy.turningPoints.some((p) => p.provisional) ? ' Hollow markers are provisional turning points.' : ''}`,
      ),
    );
  }
  if (lower.length > 0) rows.push(lower);
  let forecast: SeriesView['forecast'] = null;
  if (a.forecast && hasFinite(a.forecast.mean)) {
    const fc = a.forecast;
    const levels = [...fc.levels].sort((x, y) => x - y);
    const inner = String(levels[0]);
    const outer = String(levels[levels.length - 1]);
    rows.push([
      slot(
        'forecast',
        'full',
        `Forecast with ${levels.map((l) => `${l}%`).join(' and ')} ranges`,
        forecastChart(
          {
            start: a.start,
            original: a.original,
            forecast: fc,
            description: `Recent values of ${name} and a ${fc.mean.length}-period forecast (${fc.method}) with shaded ranges; first forecast ${f.number(fc.mean[0])} for ${f.period(frequency, a.start + fc.startOffset)}.`,
          },
          ctx('full'),
        ),
      ),
    ]);
    const range = (level: string, h: number) =>
      `${f.number(fc.lower[level]?.[h])} to ${f.number(fc.upper[level]?.[h])}`;
    forecast = {
      method: fc.method,
      innerLabel: `${inner}% range`,
      outerLabel: `${outer}% range`,
      rows: fc.mean.map((m, h) => ({
        period: f.period(frequency, a.start + fc.startOffset + h),
        mean: f.number(m),
        inner: range(inner, h),
        outer: range(outer, h),
      })),
      accuracy: accuracyWords(fc.backtest, f),
      outturn: a.outturn ? outturnWords(a, f) : null,
    };
  }
  return {
    id,
    anchor: `series-${id}`,
    title: name,
    unit: s.plan.unit,
    kicker,
    keyFigures: [
      {label: `Latest (${f.period(frequency, a.end)})`, value: f.number(last(a.original))},
      {label: 'On a year earlier', value: f.percent(a.changes.yearOnYear)},
      {label: 'Adjusted, on previous period', value: f.percent(a.changes.periodOnPeriodAdjusted)},
      {label: 'Trend-cycle', value: adj ? a.changes.trendDirection : '–'},
      {label: 'Cycle', value: a.cycle?.phaseLabel ?? '–'},
      ...varianceKeyFigures(s, f, frequency, a.end),
    ],
    // Filled by buildView once every chart anchor is known.
    callouts: [],
    notes,
    rows,
    forecast,
  };
}

function accuracyWords(b: NonNullable<SeriesAnalysis['forecast']>['backtest'], f: Formatter): string | null {
  if (!b) return null;
  const verdict =
    b.mase < 1
      ? 'smaller than the error of simply repeating last year’s value for the same period'
      : 'no smaller than the error of simply repeating last year’s value for the same period';
  const benchmarks = b.benchmarks.map((m) => `${m.method}: MASE ${f.number(m.mase, 2)}, sMAPE ${f.number(m.smape, 1)}%`).join('; ');
  return (
    `Tested by re-running the forecast from ${b.origins} earlier points in the data, up to ${b.horizon} periods ahead: ` +
    `the typical error was ${verdict} (MASE ${f.number(b.mase, 2)}; sMAPE ${f.number(b.smape, 1)}%). ` +
    (benchmarks ? `Simpler methods on the same test: ${benchmarks}. ` : '') +
    'Lower is better; a MASE below 1 beats the same-period-last-year rule.'
  );
}

function outturnWords(a: SeriesAnalysis, f: Formatter): string {
  const o = a.outturn!;
  const base = `${o.fiscalYear} outturn: ${f.number(o.actualToDate)} actual over ${o.periodsActual} periods plus ${f.number(o.forecastRemaining)} forecast for the remaining ${o.periodsRemaining}, a total of ${f.number(o.total)} (${o.level}% range ${f.number(o.lower)} to ${f.number(o.upper)})`;
  return o.target !== null ? `${base}, against a target of ${f.number(o.target)} (${f.percent(o.gapPct)}).` : `${base}.`;
}

/** Forecast horizons listed in the tracking table; longer ones stay in the export and the summary. */
const TRACKING_TABLE_HORIZON = 3;

/**
 * History section. Hidden series are left out everywhere. The revisions table lists the large revisions
 * and every change of trend direction or cycle phase, with one sentence counting the smaller ones; the
 * tracking table lists the forecasts made for the review period itself (up to three steps ahead). The
 * summary table and the chart use every tracked forecast of the visible series; the exports hold all rows.
 */
function historyView(
  report: Report,
  f: Formatter,
  theme: Theme,
  geometry: PageGeometry,
  labels: Map<string, string>,
): ViewModel['history'] {
  const h = report.history;
  if (!h) return null;
  const frequency = report.plan.frequency;
  const hidden = new Set(report.series.filter((s) => s.plan.hidden).map((s) => s.plan.id));
  const shown = <T extends {seriesId: string}>(rows: T[]) => rows.filter((r) => !hidden.has(r.seriesId));
  const revisions = shown(h.revisions);
  const tracking = shown(h.tracking);
  const label = (id: string) => labels.get(id) ?? id;
  const period = (p: string) => {
    const index = parsePeriod(frequency, p);
    return index === undefined ? p : f.period(frequency, index);
  };
  const value = (measure: string, v: number | string) => {
    if (typeof v === 'number') return f.number(v);
    return measure === 'cycle-phase' ? (phaseLabels[v as keyof typeof phaseLabels] ?? v) : v;
  };
  const levels = [...new Set(tracking.flatMap((t) => Object.keys(t.inside)))].sort((x, y) => Number(x) - Number(y));
  const inner = levels[0] ?? '80';
  const points = tracking.flatMap((t) => {
    const index = parsePeriod(frequency, t.period);
    return index === undefined || t.actual === 0
      ? []
      : [{period: index, series: label(t.seriesId), errorPct: (t.error / Math.abs(t.actual)) * 100, inside: t.inside[inner] === true}];
  });
  const chart: FigureSlot | null =
    points.length > 0
      ? {
          chart: {
            id: chartAnchor('', 'tracking'),
            caption: 'Error of earlier forecasts (% of the actual)',
            title: 'Forecast tracking',
            size: 'full',
            note: null,
            spec: trackingChart(
              {
                points,
                level: Number(inner),
                description: `Errors of ${points.length} earlier published forecasts in percent of the actual, by period; filled points fell inside the ${inner}% range.`,
              },
              {frequency, theme, width: geometry.width, height: 170, unit: null, seasonNames: []},
            ),
          },
          svg: null,
        }
      : null;
  const listed = revisions.filter((r) => r.large || r.measure === 'trend-direction' || r.measure === 'cycle-phase');
  const smaller = revisions.length - listed.length;
  const threshold = report.plan.thresholds.revisionPct;
  const thresholdText = f.share(threshold, Number.isInteger(threshold) ? 0 : Number.isInteger(threshold * 10) ? 1 : 2);
  const current = tracking.filter((t) => t.period === report.periodLabel && t.horizon <= TRACKING_TABLE_HORIZON);
  return {
    previous: period(h.previousPeriod),
    revisions: listed.map((r) => ({
      series: label(r.seriesId),
      period: period(r.period),
      measure: MEASURE[r.measure] ?? r.measure,
      kind: REVISION_KIND[r.kind] ?? r.kind,
      previous: value(r.measure, r.previous),
      current: value(r.measure, r.current),
      change: r.revisionPct === null ? '–' : f.percent(r.revisionPct),
      // Only numeric revisions are flagged: a changed call is listed anyway and has no size.
      large: r.large && (r.measure === 'original' || r.measure === 'adjusted'),
    })),
    revisionsNote:
      smaller === 0
        ? null
        : smaller === 1
          ? `1 smaller revision (under ${thresholdText}) is not listed; it is in exports/revisions.csv.`
          : `${f.number(smaller, 0)} smaller revisions (each under ${thresholdText}) are not listed; all of them are in exports/revisions.csv.`,
    tracking: current.map((t) => ({
      series: label(t.seriesId),
      publishedIn: period(t.publishedIn),
      horizon: f.number(t.horizon, 0),
      forecast: f.number(t.forecast),
      actual: f.number(t.actual),
      error: f.number(t.error),
      inside: levels.map((l) => `${l}%: ${t.inside[l] ? 'inside' : 'outside'}`).join(', '),
    })),
    trackingNote:
      tracking.length > 0
        ? tracking.length === 1
          ? 'The one checked forecast is in exports/tracking.csv.'
          : `All ${f.number(tracking.length, 0)} checked forecasts are in exports/tracking.csv.`
        : null,
    summary: shown(h.trackingSummary).map((s) => ({
      series: label(s.seriesId),
      count: f.number(s.count, 0),
      mase: s.mase === null ? '–' : f.number(s.mase, 2),
      coverage: Object.keys(s.coverage)
        .sort((x, y) => Number(x) - Number(y))
        .map((l) => `${f.share(s.coverage[l] * 100)} inside the ${l}% range`)
        .join('; '),
    })),
    chart,
  };
}

function params(options: Record<string, unknown>): string {
  const parts = Object.keys(options)
    .sort()
    .flatMap((k) => {
      const v = options[k];
      if (v === null || v === undefined || typeof v === 'object') return [];
      return [`${k} = ${typeof v === 'number' ? String(Number(v.toPrecision(6))) : String(v)}`];
    });
  return parts.length > 0 ? parts.join(', ') : 'defaults';
}

/** The ETS models a forecast averaged, with their Akaike weights, when it averaged more than one. */
function etsModels(options: Record<string, unknown>): {model: string; weight: number}[] | null {
  const ets = (options.ets ?? options) as {models?: unknown};
  const models = Array.isArray(ets.models) ? (ets.models as {model: string; weight: number}[]) : null;
  return models && models.length > 1 ? models : null;
}

/** The members of a weighted combination with their shares, when the forecast is one. */
function memberShares(options: Record<string, unknown>): {member: string; weight: number}[] | null {
  const {members, weights} = options as {members?: unknown; weights?: unknown};
  if (!Array.isArray(members) || !Array.isArray(weights) || members.length !== weights.length) return null;
  return members.map((member, i) => ({member: String(member), weight: Number(weights[i])}));
}

function methodsView(s: ReportSeries, f: Formatter): MethodsView {
  const a = s.analysis;
  const items: KeyFigure[] = [];
  const adj = a.adjustment;
  if (adj) {
    const d = adj.diagnostics;
    items.push(
      {label: 'Seasonal adjustment', value: `${DECOMPOSITION_METHOD[adj.method] ?? adj.method}, ${adj.model} model. ${adj.modelReason}`},
      {label: 'Parameters', value: params(adj.options)},
      {
        label: 'Variance shares',
        value: `trend-cycle ${f.share(d.varianceShares.trend * 100)}, seasonal ${f.share(d.varianceShares.seasonal * 100)}, irregular ${f.share(d.varianceShares.irregular * 100)}`,
      },
      {
        label: 'Seasonality left over',
        value: `${d.residualSeasonality.test} test ${f.number(d.residualSeasonality.statistic, 2)}, ${pValue(f, d.residualSeasonality.pValue)}: ${d.residualSeasonality.detected ? 'some seasonality remains; read adjusted changes with care' : 'none detected'}`,
      },
      {label: 'Seasonal stability', value: `mean year-to-year change of the seasonal effect ${f.number(d.seasonalStability, 4)} (model scale)`},
      {
        label: 'Revisions',
        value: d.revision
          ? `adjusted period-on-period changes moved by ${f.number(d.revision.meanAbsPp, 2)} percentage points on average as data were added (${d.revision.periodsTested} periods tested)`
          : 'not measured',
      },
    );
    if (adj.outliers.length > 0) {
      items.push({
        label: 'Flagged values',
        value: adj.outliers
          .map((o) => `${f.period(a.frequency, a.start + o.index)} (${OUTLIER_WORD[o.kind] ?? o.kind}, ${f.number(o.score, 1)} robust sd)`)
          .join('; '),
      });
    }
    const filled = adj.filled.flatMap((f, i) => (f ? [i] : []));
    if (filled.length > 0) {
      items.push({
        label: 'Filled values',
        value: `${filled.map((i) => f.period(a.frequency, a.start + i)).join(', ')}: missing, estimated for the decomposition only`,
      });
    }
  } else {
    items.push({label: 'Seasonal adjustment', value: a.notAdjustedReason ?? 'not applied'});
  }
  const fc = a.forecast;
  if (fc) {
    items.push({label: 'Forecast model', value: `${fc.method}; ${params(fc.options)}`});
    const shares = memberShares(fc.options);
    if (shares) {
      const value = shares.map((m) => `${m.member} ${f.share(m.weight * 100)}`).join(', ');
      items.push({label: 'Combination weights', value});
    }
    const weighted = etsModels(fc.options);
    if (weighted) {
      const value = weighted.map((m) => `${m.model} ${f.share(m.weight * 100)}`).join(', ');
      items.push({label: 'ETS models and weights', value});
    }
    items.push({label: 'Back-test', value: accuracyWords(fc.backtest, f) ?? 'not run (too little data)'});
  } else {
    items.push({label: 'Forecast model', value: 'none'});
  }
  const cy = a.cycle;
  if (cy) {
    items.push({label: 'Trend and cycle', value: `${CYCLE_METHOD[cy.method] ?? cy.method}; ${params(cy.options)}`});
    const st = cy.stationarity;
    if (st) {
      items.push({
        label: 'Stationarity',
        value:
          `${st.test}: level ${f.number(st.level.statistic, 2)} (${pValue(f, st.level.pValue)}, ${st.level.stationary ? 'stationary' : 'not stationary'}); ` +
          `differences ${f.number(st.differences.statistic, 2)} (${pValue(f, st.differences.pValue)}, ${st.differences.stationary ? 'stationary' : 'not stationary'}); ` +
          `${st.variance.test} for constant variance ${f.number(st.variance.statistic, 2)} (${pValue(f, st.variance.pValue)}, ${st.variance.constant ? 'constant' : 'changing'})`,
      });
    }
  }
  return {
    anchor: `methods-${s.plan.id}`,
    title: s.plan.label,
    items,
    regressors: (adj?.calendar?.regressors ?? []).map((r) => ({
      name: r.name,
      coefficient: f.number(r.coefficient, 4),
      t: f.number(r.tStatistic, 2),
      p: pValue(f, r.pValue),
      description: r.description,
    })),
    notes: [...a.notes, ...(fc?.notes ?? [])],
  };
}
