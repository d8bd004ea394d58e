import {dirname, isAbsolute, relative, sep} from 'node:path';
import {wordDataNote, wordsFor, type MessageKey, type Words} from '../../words/index.js';
import {themeFor} from '../theme.js';
import type {Report} from '../types.js';
import {calloutLink, calloutView, exceptions} from './callouts.js';
import {pageGeometry} from './geometry.js';
import {historyView} from './history.js';
import {cautions, methodsParagraphs, methodsRow} from './methods.js';
import {orderSeries} from './order.js';
import {flatten, reportOutline} from './outline.js';
import {seriesView} from './series.js';
import {summaryRow} from './summary.js';
import {driverLines, groupChartData, structureParagraphs, varianceRows} from './structure.js';
import type {ViewModel} from './types.js';

export type * from './types.js';
export {pageGeometry, type PageGeometry} from './geometry.js';
export {reportOutline} from './outline.js';
export {seriesFigureSlots} from './figures.js';

/** The headline callouts shown on the summary page. */
const HEADLINE_CALLOUTS = 6;

/**
 * Report → view model, section by section:
 *
 *   cover ─► summary (paragraph, headline callouts, table) ─► series (summary.ts, series.ts, figures.ts)
 *         ─► history ─► methods (plain sentences, one table) ─► data notes ─► outline (bookmarks)
 *
 * Every word comes from the words module in the pack's language, every number from its one formatter. Pure (no
 * I/O); `html.ts` draws the charts and fills the templates. `logo` is the already-inlined data: URI (or null).
 */
export function buildView(report: Report, logo: string | null): ViewModel {
  const {plan} = report;
  const w = wordsFor(plan.locale);
  const theme = themeFor(plan.branding.accent, plan.branding.font);
  const geometry = pageGeometry(plan.branding.paper, plan.branding.orientation);
  const ordered = orderSeries(report);
  const visible = report.series.filter((s) => !s.plan.hidden);
  const labels = new Map(report.series.map((s) => [s.plan.id, s.plan.label]));
  const series = ordered.map(({entry, kicker}) =>
    seriesView(plan, entry, kicker, w, groupChartData(entry.plan.id, report.groups, labels, report.period)),
  );
  const charts = new Set(series.flatMap((s) => s.rows.flat().map((slot) => slot.chart.id)));
  const link = calloutLink(charts, new Set(labels.keys()));
  series.forEach((view, k) => {
    view.callouts = exceptions(ordered[k].entry.callouts).map((c) => calloutView(c, w, labels, link));
  });
  const period = w.periodLong(plan.frequency, report.period);
  return {
    // The language of the words: English for a locale that has none of its own here.
    lang: w.language.fallback ? 'en' : w.locale,
    locale: w.locale,
    labels: templateLabels(w),
    cover: {
      title: plan.title,
      subtitle: plan.subtitle,
      organisation: plan.organisation,
      period,
      preparedBy: plan.preparedBy,
      confidentiality: plan.confidentiality,
      logo,
      logoAlt: plan.organisation ? w.t('label.logoOf', {organisation: plan.organisation}) : w.t('label.logo'),
    },
    fallback: w.language.fallback ? w.t('label.fallback', {locale: plan.locale}) : null,
    commentary: report.commentary,
    headline: report.callouts.slice(0, HEADLINE_CALLOUTS).map((c) => calloutView(c, w, labels, link)),
    summary: visible.map((s) => summaryRow(s, w, theme)),
    summaryNote: w.t('summary.note', {previous: w.t('previous.period', {frequency: plan.frequency})}),
    drivers: driverLines(report),
    variance: varianceRows(visible, w),
    series,
    history: historyView(report, w, theme, geometry, labels),
    methods: {
      paragraphs: [...methodsParagraphs(w), ...structureParagraphs(report, w)],
      rows: ordered.map(({entry}) => methodsRow(entry, w)),
    },
    cautions: cautions(w),
    inputs: report.inputs.map((i) => ({
      path:
        i.sheet === undefined
          ? shownPath(plan.packFile, i.file)
          : w.t('label.sheetOf', {file: shownPath(plan.packFile, i.file), sheet: i.sheet}),
      sha256: i.sha256,
      size: w.t('label.bytes', {size: w.number(i.bytes, 0)}),
      rows: w.number(i.rows, 0),
    })),
    notes: report.notes.map((n) => {
      const file = shownPath(plan.packFile, n.file);
      // The reader knows a series by its label, not by the id the pack file gives it.
      const note = n.series == null ? n : {...n, series: labels.get(n.series) ?? n.series};
      return {where: n.line != null ? w.t('label.lineOf', {file, line: String(n.line)}) : file, message: wordDataNote(w, note)};
    }),
    builtWith: w.t('label.builtWith', {version: report.toolVersion, period}),
    version: report.toolVersion,
    period,
    outline: flatten(reportOutline(report)).map(({title, dest}) => ({title, dest})),
  };
}

/** The fixed labels and headings of the templates, by the name the templates use (`{{labels.series}}`). */
const TEMPLATE_LABELS = {
  summary: 'section.summary',
  headline: 'section.headline',
  table: 'section.table',
  history: 'section.history',
  revisions: 'section.revisions',
  tracking: 'section.tracking',
  methods: 'section.methods',
  howMade: 'section.howMade',
  perSeries: 'section.perSeries',
  cautions: 'section.cautions',
  dataNotes: 'section.dataNotes',
  preparedBy: 'label.preparedBy',
  seeChart: 'label.seeChart',
  series: 'label.series',
  latest: 'label.latest',
  yoy: 'label.yearOnYearColumn',
  adjustedVsPrevious: 'label.adjustedVsPrevious',
  trend: 'label.trend',
  cycle: 'label.cycle',
  outlook: 'label.outlook',
  flags: 'label.flags',
  lastYears: 'label.lastYears',
  aboutSeries: 'label.aboutSeries',
  period: 'label.period',
  forecast: 'label.forecast',
  figure: 'label.figure',
  why: 'label.why',
  before: 'label.before',
  now: 'label.now',
  change: 'label.change',
  large: 'label.large',
  forecastsChecked: 'label.forecastsChecked',
  maseSoFar: 'label.maseSoFar',
  insideRanges: 'label.insideRanges',
  published: 'label.published',
  stepsAhead: 'label.stepsAhead',
  actual: 'label.actual',
  actualMinusForecast: 'label.actualMinusForecast',
  ranges: 'label.ranges',
  noRevision: 'label.noRevision',
  noTracking: 'label.noTracking',
  inputFile: 'label.inputFile',
  size: 'label.size',
  rows: 'label.rows',
  dataNotesHeading: 'label.dataNotesHeading',
  noDataNotes: 'label.noDataNotes',
  model: 'label.model',
  seasonalWindow: 'label.seasonalWindow',
  calendarFound: 'label.calendarFound',
  outliers: 'label.outliers',
  forecastModel: 'label.forecastModel',
  mase: 'label.mase',
  cautionsColumn: 'label.cautionsColumn',
  drivers: 'summary.drivers',
  variance: 'summary.variance',
  varianceYearToDate: 'summary.varianceYearToDate',
  varianceActual: 'summary.varianceActual',
  varianceTarget: 'summary.varianceTarget',
  varianceDifference: 'summary.varianceDifference',
  varianceCalendar: 'summary.varianceCalendar',
  varianceNote: 'summary.varianceNote',
} as const satisfies Record<string, MessageKey>;

function templateLabels(w: Words): Record<keyof typeof TEMPLATE_LABELS, string> {
  const out = {} as Record<keyof typeof TEMPLATE_LABELS, string>;
  for (const [name, key] of Object.entries(TEMPLATE_LABELS)) out[name as keyof typeof TEMPLATE_LABELS] = w.t(key);
  return out;
}

/** A file as the report names it: relative to the pack's folder; a query source's name (not a path) as it is. */
function shownPath(packFile: string, file: string): string {
  return isAbsolute(file) ? relative(dirname(packFile), file).split(sep).join('/') || file : file;
}
