import type {GroupResult, Variance} from '../../combine/index.js';
import type {Words} from '../../words/index.js';
import {parsePeriod, type Frequency} from '../../time/period.js';
import type {Report, ReportSeries} from '../types.js';
import type {GroupChartData} from '../charts/seriesChart.js';
import type {KeyFigure, VarianceCells, VarianceRow} from './types.js';

/**
 * What the pack's structure adds to the report: the variance against target (the summary's table and each series'
 * key figures), the data of a group total's contributions chart, the main driver of each total for the summary,
 * and the methods section's sentences on direct or indirect adjustment, gaps between parts and total, and
 * reconciled forecasts. Pure; every word from the words module.
 */

function cells(v: Variance, unit: string | null, w: Words): VarianceCells {
  const known = Number.isFinite(v.percent);
  return {
    actual: w.value(v.actual, unit),
    target: w.value(v.target, unit),
    percent: w.percent(v.percent),
    favourable: known ? w.t('variance.favourable', {favourable: v.favourable ? 'yes' : 'no'}) : '–',
    calendar: calendarPart(v) ? w.number(v.calendarPart) : '–',
    tone: v.favourable ? 'good' : 'bad',
  };
}

function calendarPart(v: Variance): boolean {
  return v.calendarPart !== 0 && Number.isFinite(v.calendarPart);
}

/** The summary's variance table: every visible series with a target, in report order. */
export function varianceRows(series: readonly ReportSeries[], w: Words): VarianceRow[] {
  return series.flatMap((s) => {
    const v = s.combination?.versusTarget;
    if (!v || s.plan.hidden) return [];
    const unit = s.plan.unit;
    return [{anchor: `#series-${s.plan.id}`, label: s.plan.label, period: cells(v.period, unit, w), yearToDate: cells(v.yearToDate, unit, w)}];
  });
}

/**
 * The key figure of a series with a target: its variance in percent for the review period and for the fiscal year
 * to date, in one box (the summary's variance table says which side is favourable and what the calendar explains).
 */
export function varianceKeyFigures(s: ReportSeries, w: Words): KeyFigure[] {
  const v = s.combination?.versusTarget;
  if (!v) return [];
  return [
    {
      label: w.t('label.againstTarget', {period: w.period(s.analysis.frequency, s.analysis.end)}),
      value: w.t('variance.keyFigure', {period: w.percent(v.period.percent), yearToDate: w.percent(v.yearToDate.percent)}),
    },
  ];
}

/** The contributions chart's data for a series that is a group's total (its first group), or null. */
export function groupChartData(
  seriesId: string,
  groups: readonly GroupResult[],
  labels: ReadonlyMap<string, string>,
  end: number,
): GroupChartData | null {
  const g = groups.find((x) => x.total === seriesId);
  if (!g || g.contributions.history.length === 0) return null;
  const history = g.contributions.history.map((h) => h.yearOnYear);
  return {
    // The history runs to the review period.
    start: end - history.length + 1,
    history,
    parts: g.parts.map((id) => ({id, label: labels.get(id) ?? id})),
    latest: g.contributions.yearOnYear,
  };
}

/** For the summary: the main driver of each total, one sentence each (the drivers callouts' own text). */
export function driverLines(report: Report): string[] {
  return report.series.flatMap((s) => s.callouts.filter((c) => c.rule === 'drivers').map((c) => c.text));
}

/** The methods section's sentences on each group: direct or indirect adjustment, gaps, reconciled forecasts. */
export function structureParagraphs(report: Report, w: Words): string[] {
  const frequency = report.plan.frequency;
  const labels = new Map(report.series.map((s) => [s.plan.id, s.plan.label]));
  const out: string[] = [];
  for (const g of report.groups) {
    const total = labels.get(g.total) ?? g.total;
    if (g.indirect) {
      const rs = g.indirect.residualSeasonality;
      const at = g.indirect.largestDifference.period;
      out.push(
        w.t('methods.structureIndirect', {
          total,
          group: g.title,
          shown: g.adjustTotal,
          detected: rs.detected ? 'yes' : 'no',
          statistic: w.number(rs.statistic, 2),
          p: w.number(rs.pValue, 3),
          difference: w.share(g.indirect.largestDifference.percent, 2),
          at: at ? w.t('methods.structureAt', {period: periodWords(w, frequency, at)}) : '',
        }),
      );
    }
    if (g.partsGap) {
      const gap = g.partsGap;
      out.push(
        w.t('methods.structureGap', {total, group: g.title, n: gap.periods, gap: w.number(gap.gap), percent: w.percent(gap.percent), period: periodWords(w, frequency, gap.period)}),
      );
    }
    const b = g.backtest;
    if (b) {
      const scores = b.series[g.total];
      out.push(
        w.t('methods.structureReconciled', {
          group: g.title,
          method: b.method === 'mint' ? 'MinT' : b.method === 'ols' ? 'OLS' : w.t('label.bottomUp'),
          scores: scores ? w.t('methods.structureScores', {name: total, base: w.number(scores.base, 2), reconciled: w.number(scores.reconciled, 2)}) : '',
        }),
      );
    }
  }
  return out;
}

/** A canonical period label (`2016-Q1`) in the report's words (`Q1 2016`); left as it is when it is not one. */
function periodWords(w: Words, frequency: Frequency, label: string): string {
  const index = parsePeriod(frequency, label);
  return index === undefined ? label : w.period(frequency, index);
}
