import type {SeriesAnalysis} from '../../analyse/types.js';
import {fiscalYears} from '../../time/fiscal.js';
import {periodsPerYear} from '../../time/period.js';
import {phaseWords, type Words} from '../../words/index.js';
import type {ReportSeries} from '../types.js';
import type {Theme} from '../theme.js';
import {sparkline} from '../charts/sparkline.js';
import type {SummaryRow} from './types.js';

/** One row of the summary table. */
export function summaryRow(s: ReportSeries, w: Words, theme: Theme): SummaryRow {
  const a = s.analysis;
  const c = a.changes;
  const flags: string[] = [];
  const outliers = a.adjustment?.outliers.length ?? 0;
  if (outliers > 0) flags.push(w.t('flag.unusual', {n: outliers}));
  if (a.adjustment === null) flags.push(w.t('flag.notAdjusted'));
  if (a.original.length < 3 * periodsPerYear[a.frequency]) flags.push(w.t('flag.short'));
  const filled = a.adjustment?.filled.filter(Boolean).length ?? 0;
  if (filled > 0) flags.push(w.t('flag.filled', {n: filled}));
  if (a.notes.length > 0) flags.push(w.t('flag.notes', {n: a.notes.length}));
  const recent = a.original.slice(-3 * periodsPerYear[a.frequency]);
  return {
    anchor: `#series-${s.plan.id}`,
    label: s.plan.label,
    unit: s.plan.unit,
    latestPeriod: w.period(a.frequency, a.end),
    latest: w.number(a.original[a.original.length - 1]),
    yoy: w.percent(c.yearOnYear),
    adjusted: w.percent(c.periodOnPeriodAdjusted),
    trend: a.adjustment ? w.t(`direction.${c.trendDirection}`) : '–',
    trendClass: a.adjustment ? `trend-${c.trendDirection}` : 'trend-none',
    phase: a.cycle ? phaseWords(w, a.cycle) : '–',
    outlook: outlook(a, w),
    flags,
    spark: sparkline(recent, {colour: theme.deep, label: w.t('summary.spark', {label: s.plan.label, n: String(recent.length)})}),
  };
}

/** The fiscal-year outturn against target where a target is set, else the next forecast with its inner range. */
function outlook(a: SeriesAnalysis, w: Words): string {
  const o = a.outturn;
  if (o && o.target !== null) {
    const years = fiscalYears(o.fiscalYear);
    return w.t('summary.outturn', {years, total: w.number(o.total), target: w.number(o.target), gap: w.percent(o.gapPct)});
  }
  const fc = a.forecast;
  if (fc && fc.mean.length > 0) {
    const inner = String(Math.min(...fc.levels));
    const lo = fc.lower[inner]?.[0];
    const hi = fc.upper[inner]?.[0];
    const period = w.period(a.frequency, a.start + fc.startOffset);
    const mean = w.number(fc.mean[0]);
    return lo !== undefined && hi !== undefined
      ? w.t('summary.forecast', {period, mean, low: w.number(lo), high: w.number(hi)})
      : w.t('summary.forecastNoRange', {period, mean});
  }
  return '–';
}
