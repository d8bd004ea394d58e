import type {SeriesAnalysis} from '../../analyse/types.js';
import type {Plan} from '../../config/plan.js';
import {fiscalYears} from '../../time/fiscal.js';
import {methodName, phaseWords, shortMethod, wordNote, type Words} from '../../words/index.js';
import type {ReportSeries} from '../types.js';
import {seriesFigureRows} from './figures.js';
import type {GroupChartData} from '../charts/seriesChart.js';
import {varianceKeyFigures} from './structure.js';
import type {SeriesView} from './types.js';

/**
 * One series section: key figures, the paragraph, charts from the chart registry and the forecast table.
 * The callouts are filled in by `buildView` once every chart anchor is known.
 */
export function seriesView(plan: Plan, s: ReportSeries, kicker: string | null, w: Words, group: GroupChartData | null): SeriesView {
  const a = s.analysis;
  const f = a.frequency;
  const notes = [
    ...(a.adjustment === null && a.notAdjustedReason ? [a.notAdjustedReason] : []),
    ...a.notes.filter((n) => n !== a.notAdjustedReason),
    ...(a.forecast?.notes ?? []),
  ].map((n) => wordNote(w, n));
  if (a.forecast === null) notes.push(w.t('note.noForecast'));
  if (a.cycle === null) notes.push(w.t('note.noCycle'));
  const rows = seriesFigureRows(plan, s.plan, a, w, group);
  if (rows.length === 0) notes.push(w.t('note.noValuesToChart'));
  return {
    id: s.plan.id,
    anchor: `series-${s.plan.id}`,
    title: s.plan.label,
    unit: s.plan.unit,
    kicker,
    keyFigures: [
      {label: w.t('label.latestIn', {period: w.period(f, a.end)}), value: w.number(a.original[a.original.length - 1])},
      {label: w.t('term.yearOnYear'), value: w.percent(a.changes.yearOnYear)},
      {label: w.t('label.adjustedOnPrevious'), value: w.percent(a.changes.periodOnPeriodAdjusted)},
      {label: w.t('term.trendCycle'), value: a.adjustment ? w.t(`direction.${a.changes.trendDirection}`) : '–'},
      {label: w.t('label.cycle'), value: a.cycle ? phaseWords(w, a.cycle) : '–'},
      ...varianceKeyFigures(s, w),
    ],
    commentary: s.commentary,
    callouts: [],
    notes,
    rows,
    forecast: forecastTable(a, w),
  };
}

function forecastTable(a: SeriesAnalysis, w: Words): SeriesView['forecast'] {
  const fc = a.forecast;
  if (!fc || !fc.mean.some(Number.isFinite)) return null;
  const levels = [...fc.levels].sort((x, y) => x - y);
  const inner = String(levels[0]);
  const outer = String(levels[levels.length - 1]);
  const range = (level: string, h: number) => w.t('unit.range', {low: w.number(fc.lower[level]?.[h]), high: w.number(fc.upper[level]?.[h])});
  const b = fc.backtest;
  const o = a.outturn;
  return {
    caption: w.t('label.forecastCaption', {method: shortMethod(w, fc.method)}),
    innerLabel: w.t('label.levelRange', {level: inner}),
    outerLabel: w.t('label.levelRange', {level: outer}),
    rows: fc.mean.map((m, h) => ({
      period: w.period(a.frequency, a.start + fc.startOffset + h),
      mean: w.number(m),
      inner: range(inner, h),
      outer: range(outer, h),
    })),
    accuracy: b
      ? w.t('forecast.accuracy', {
          origins: b.origins,
          horizon: b.horizon,
          mase: w.number(b.mase, 2),
          smape: w.share(b.smape),
          better: b.mase < 1 ? 'yes' : 'no',
          benchmarks: b.benchmarks.length === 0 ? 'none' : w.list(b.benchmarks.map((m) => w.t('forecast.benchmark', {method: methodName(w, m.method), mase: w.number(m.mase, 2)})), 9),
        })
      : null,
    outturn:
      o && Number.isFinite(o.total)
        ? w.t(o.periodsRemaining === 0 ? 'forecast.outturnClosed' : 'forecast.outturn', {
            years: fiscalYears(o.fiscalYear),
            actual: w.number(o.actualToDate),
            periodsActual: w.periods(a.frequency, o.periodsActual),
            forecast: w.number(o.forecastRemaining),
            periodsRemaining: w.periods(a.frequency, o.periodsRemaining),
            total: w.number(o.total),
            level: String(o.level),
            range: w.t('unit.range', {low: w.number(o.lower), high: w.number(o.upper)}),
            target: o.target === null ? 'none' : w.number(o.target),
            gap: w.percent(o.gapPct),
          })
        : null,
  };
}
