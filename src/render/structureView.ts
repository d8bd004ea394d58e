import type {GroupResult, ReconciledBacktest, Variance} from '../combine/index.js';
import type {Frequency} from '../time/period.js';
import {contributionsChart} from './charts/contributions.js';
import type {ChartContext} from './charts/common.js';
import type {Formatter} from './format.js';
import type {Report, ReportSeries} from './types.js';
import type {TopLevelSpec} from 'vega-lite';

/**
 * The parts of the report that the pack's structure adds: variance against target (summary table and key
 * figures), the contributions chart of a group's total, the main driver of each total for the summary, and the
 * direct/indirect and reconciliation figures of the methods section. Pure; words in the report's language.
 */

type Group = GroupResult & {backtest: ReconciledBacktest | null};

/** A key figure or methods item: a label and its value (the view's `KeyFigure`). */
interface KeyFigure {
  label: string;
  value: string;
}

/** A full-width chart slot (the view's `FigureSlot`). */
interface FigureSlot {
  chart: {id: string; caption: string; title: string; spec: TopLevelSpec; size: 'full'; note: string | null};
  svg: null;
}

/** One row of the summary's variance table. */
export interface VarianceRow {
  anchor: string;
  label: string;
  period: VarianceCells;
  yearToDate: VarianceCells;
}

interface VarianceCells {
  actual: string;
  target: string;
  percent: string;
  favourable: string;
  calendar: string;
  /** `good` or `bad`, for the row's colour (favourable or not). */
  tone: string;
}

function cells(v: Variance, unit: string | null, f: Formatter): VarianceCells {
  const value = (x: number) => `${f.number(x)}${unit && unit !== '%' ? ` ${unit}` : unit === '%' ? '%' : ''}`;
  return {
    actual: value(v.actual),
    target: value(v.target),
    percent: f.percent(v.percent),
    favourable: Number.isFinite(v.percent) ? (v.favourable ? 'favourable' : 'unfavourable') : '–',
    calendar: v.calendarPart !== 0 && Number.isFinite(v.calendarPart) ? f.number(v.calendarPart) : '–',
    tone: v.favourable ? 'good' : 'bad',
  };
}

/** The summary's variance table: every visible series with a target, in report order. */
export function varianceRows(series: readonly ReportSeries[], f: Formatter): VarianceRow[] {
  return series.flatMap((s) => {
    const v = s.combination?.versusTarget;
    if (!v || s.plan.hidden) return [];
    const unit = s.plan.unit;
    return [
      {
        anchor: `#series-${s.plan.id}`,
        label: s.plan.label,
        period: cells(v.period, unit, f),
        yearToDate: cells(v.yearToDate, unit, f),
      },
    ];
  });
}

/** Key figures of a series with a target: its variance for the review period and the fiscal year to date. */
export function varianceKeyFigures(s: ReportSeries, f: Formatter, frequency: Frequency, end: number): KeyFigure[] {
  const v = s.combination?.versusTarget;
  if (!v) return [];
  const say = (x: Variance) =>
    `${f.percent(x.percent)} (${x.favourable ? 'favourable' : 'unfavourable'}${x.calendarPart !== 0 && Number.isFinite(x.calendarPart) ? `; calendar ${f.number(x.calendarPart)}` : ''})`;
  return [
    {label: `Against target, ${f.period(frequency, end)}`, value: say(v.period)},
    {label: 'Against target, fiscal year to date', value: say(v.yearToDate)},
  ];
}

/** The contributions chart of a series that is a group's total (its first group), or null. */
export function contributionsSlot(
  seriesId: string,
  name: string,
  groups: readonly Group[],
  labels: ReadonlyMap<string, string>,
  ctx: ChartContext,
  end: number,
  f: Formatter,
): FigureSlot | null {
  const g = groups.find((x) => x.total === seriesId);
  if (!g || g.contributions.history.length === 0) return null;
  const history = g.contributions.history.map((h) => h.yearOnYear);
  // The history runs to the review period.
  const first = end - history.length + 1;
  const yoy = g.contributions.yearOnYear;
  const caption = 'Contributions to the change on a year earlier';
  const description = `Bar chart of each part's contribution to the change of ${name} on a year earlier, in percentage points, with the total's change as a mark; latest ${f.percent(yoy.total)} in ${yoy.period}.`;
  return {
    chart: {
      id: `chart-${seriesId}-contributions`,
      caption,
      title: `${name}: ${caption}`,
      spec: contributionsChart(
        {
          start: first,
          history,
          parts: g.parts.map((id) => ({id, label: labels.get(id) ?? id})),
          totalLabel: `${name}, change`,
          axisTitle: 'points of the change on a year earlier',
          periods: 3 * (ctx.frequency === 'monthly' ? 12 : ctx.frequency === 'quarterly' ? 4 : 52),
          description,
        },
        ctx,
      ),
      size: 'full',
      note: 'The bars of each period add up to the mark: the total’s change on a year earlier.',
    },
    svg: null,
  };
}

/** For the summary: the main driver of each total, one sentence each (the drivers callouts' own text). */
export function driverLines(report: Report): string[] {
  return report.series.flatMap((s) => s.callouts.filter((c) => c.rule === 'drivers').map((c) => c.text));
}

/** Methods items for a series that is a group's total or part: direct/indirect adjustment and reconciliation. */
export function structureMethodItems(s: ReportSeries, groups: readonly Group[], f: Formatter): KeyFigure[] {
  const items: KeyFigure[] = [];
  for (const g of groups.filter((x) => x.total === s.plan.id)) {
    const i = g.indirect;
    if (i) {
      const rs = i.residualSeasonality;
      items.push({
        label: `Direct and indirect adjustment (${g.title})`,
        value: `the report shows the ${g.adjustTotal} adjustment. Indirect total (sum of the adjusted parts): seasonality left over ${rs.detected ? 'detected' : 'not detected'} (F ${f.number(rs.statistic, 2)}, p ${f.number(rs.pValue, 3)}); largest difference from the direct adjustment ${f.share(i.largestDifference.percent, 2)}${i.largestDifference.period ? ` in ${i.largestDifference.period}` : ''}`,
      });
    }
    if (g.partsGap)
      items.push({
        label: 'Parts against total',
        value: `the parts do not add up in ${g.partsGap.periods} periods; largest gap ${f.number(g.partsGap.gap)} (${f.percent(g.partsGap.percent)}) in ${g.partsGap.period}`,
      });
  }
  const r = s.combination?.reconciliation;
  if (r) {
    const b = groups.find((g) => g.id === r.group)?.backtest;
    const scores = b?.series[s.plan.id];
    items.push({
      label: 'Forecast shown',
      value: `reconciled (${r.method === 'mint' ? 'MinT' : r.method === 'ols' ? 'OLS' : 'bottom-up'}) so that the forecasts of group ${r.group} add up; the base forecast is in results.json${scores ? `. Back-test MASE: base ${f.number(scores.base, 3)}, reconciled ${f.number(scores.reconciled, 3)}` : ''}`,
    });
  }
  return items;
}
