import {parsePeriod} from '../../time/period.js';
import type {Words} from '../../words/index.js';
import {measureValue} from '../../narrate/callouts/revisions.js';
import {trackingChart} from '../charts/tracking.js';
import type {Theme} from '../theme.js';
import type {Report} from '../types.js';
import type {PageGeometry} from './geometry.js';
import type {FigureSlot, HistoryView} from './types.js';

/** Forecast horizons listed in the tracking table; longer ones stay in the export and the summary. */
const TRACKING_TABLE_HORIZON = 3;

/**
 * History section. Hidden series are left out everywhere. The revisions table lists the large revisions
 * and every change of trend direction or cycle phase, with one sentence counting the smaller ones; the
 * tracking table lists the forecasts made for the review period itself (up to three steps ahead). The
 * summary table and the chart use every tracked forecast of the visible series; the exports hold all rows.
 */
export function historyView(
  report: Report,
  w: Words,
  theme: Theme,
  geometry: PageGeometry,
  labels: Map<string, string>,
): HistoryView | null {
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
    return index === undefined ? p : w.period(frequency, index);
  };
  const value = (measure: string, v: number | string) => {
    if (typeof v === 'number') return w.number(v);
    return measure === 'cycle-phase' || measure === 'trend-direction' ? measureValue(w, measure, v) : v;
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
            id: 'chart-tracking',
            caption: w.t('chart.tracking'),
            title: w.t('chart.trackingTitle'),
            size: 'full',
            note: null,
            spec: trackingChart(
              {points, level: Number(inner), description: w.t('describe.tracking', {n: String(points.length), level: inner})},
              {frequency, theme, width: geometry.width, height: 170, unit: null, seasonNames: [], words: w},
            ),
          },
          svg: null,
        }
      : null;
  const listed = revisions.filter((r) => r.large || r.measure === 'trend-direction' || r.measure === 'cycle-phase');
  const smaller = revisions.length - listed.length;
  const threshold = report.plan.thresholds.revisionPct;
  const thresholdText = w.share(threshold, Number.isInteger(threshold) ? 0 : Number.isInteger(threshold * 10) ? 1 : 2);
  const current = tracking.filter((t) => t.period === report.periodLabel && t.horizon <= TRACKING_TABLE_HORIZON);
  return {
    previous: w.t('label.comparedWith', {period: period(h.previousPeriod)}),
    revisions: listed.map((r) => ({
      series: label(r.seriesId),
      period: period(r.period),
      measure: w.t(`measure.${r.measure}`),
      kind: w.t(`revision.${r.kind}`),
      previous: value(r.measure, r.previous),
      current: value(r.measure, r.current),
      change: r.revisionPct === null ? '–' : w.percent(r.revisionPct),
      // Only numeric revisions are flagged: a changed call is listed anyway and has no size.
      large: r.large && (r.measure === 'original' || r.measure === 'adjusted'),
    })),
    revisionsNote:
      smaller === 0
        ? null
        : smaller === 1
          ? w.t('history.smallerOne', {threshold: thresholdText})
          : w.t('history.smallerMany', {count: w.number(smaller, 0), threshold: thresholdText}),
    tracking: current.map((t) => ({
      series: label(t.seriesId),
      publishedIn: period(t.publishedIn),
      horizon: w.number(t.horizon, 0),
      forecast: w.number(t.forecast),
      actual: w.number(t.actual),
      error: w.number(t.error),
      inside: levels.map((l) => w.t(t.inside[l] ? 'label.inside' : 'label.outside', {level: l})).join(', '),
    })),
    trackingNote:
      tracking.length > 0
        ? tracking.length === 1
          ? w.t('history.trackingOne')
          : w.t('history.trackingMany', {count: w.number(tracking.length, 0)})
        : null,
    summary: shown(h.trackingSummary).map((s) => ({
      series: label(s.seriesId),
      count: w.number(s.count, 0),
      mase: s.mase === null ? '–' : w.number(s.mase, 2),
      coverage: Object.keys(s.coverage)
        .sort((x, y) => Number(x) - Number(y))
        .map((l) => w.t('label.insideShare', {share: w.share(s.coverage[l] * 100, 0), level: l}))
        .join('; '),
    })),
    chart,
    madeFor: w.t('label.madeFor', {period: w.periodLong(frequency, report.period)}),
  };
}
