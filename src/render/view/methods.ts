import {periodsPerYear} from '../../time/period.js';
import {shortMethod, type Words} from '../../words/index.js';
import type {ReportSeries} from '../types.js';
import type {MethodsRow} from './types.js';

/** The appendix's plain sentences on what was done, with the published sources, in order. */
export function methodsParagraphs(w: Words): string[] {
  return [
    w.t('methods.adjustment'),
    w.t('methods.calendar'),
    w.t('methods.cycle'),
    w.t('methods.forecast'),
    w.t('methods.backtest'),
    w.t('methods.parameters'),
  ];
}

/** The cautions every reader should know, in order. */
export function cautions(w: Words): string[] {
  return [w.t('caution.estimates'), w.t('caution.ranges'), w.t('caution.short'), w.t('caution.endPoint'), w.t('caution.advice')];
}

/**
 * One row of the appendix's table: adjustment method and model, seasonal window (years of the seasonal
 * smoother, or "fixed" for a periodic, classical or Fourier pattern), the calendar effects found significant,
 * the number of unusual values, the forecast model by family, the back-test MASE and the cautions that apply.
 * Every setting behind these stays in results.json, the manifest and the workbook's methods sheet.
 */
export function methodsRow(s: ReportSeries, w: Words): MethodsRow {
  const a = s.analysis;
  const adj = a.adjustment;
  const options = (adj?.options ?? {}) as {method?: unknown; seasonalWindow?: unknown; periodic?: unknown};
  const method = adj ? (a.frequency === 'weekly' ? w.t('method.fourier') : w.t(`method.${adj.method}`)) : null;
  const window =
    adj && options.method === 'stl' && options.periodic !== true && typeof options.seasonalWindow === 'number'
      ? w.t('label.windowCell', {years: options.seasonalWindow})
      : adj
        ? w.t('label.periodic')
        : '–';
  const calendar = (adj?.calendar?.regressors ?? [])
    .filter((r) => r.significant)
    .map((r) => (['working-days', 'holidays', 'easter'].includes(r.name) ? w.t(`regressor.${r.name as 'easter'}`) : r.name));
  const fc = a.forecast;
  const b = fc?.backtest ?? null;
  const notes: string[] = [];
  if (a.original.length < 3 * periodsPerYear[a.frequency]) notes.push(w.t('caution.cell.short'));
  if (!adj) notes.push(w.t('caution.cell.notAdjusted'));
  if (adj?.diagnostics.residualSeasonality.detected) notes.push(w.t('caution.cell.residualSeasonality'));
  // A level shift breaks the series: what came before says less about what follows.
  const breaks = (adj?.outliers ?? [])
    .filter((o) => o.kind === 'level-shift')
    .map((o) => w.period(a.frequency, a.start + o.index));
  if (breaks.length > 0) notes.push(w.t('caution.cell.break', {periods: w.list(breaks)}));
  const filled = adj?.filled.filter(Boolean).length ?? 0;
  if (filled > 0) notes.push(w.t('caution.cell.filled', {n: filled}));
  if (!fc) notes.push(w.t('caution.cell.noForecast'));
  if (b && Number.isFinite(b.mase) && b.mase > 1) notes.push(w.t('caution.cell.backtest'));
  return {
    anchor: `methods-${s.plan.id}`,
    series: s.plan.label,
    model: adj && method ? w.t('label.modelCell', {method, model: w.t(`model.${adj.model}`)}) : w.t('label.notAdjusted'),
    window,
    calendar: calendar.length > 0 ? w.list(calendar, calendar.length) : adj ? w.t('label.none') : '–',
    outliers: adj ? w.number(adj.outliers.length, 0) : '–',
    forecast: fc ? shortMethod(w, fc.method, true) : '–',
    mase: b ? w.number(b.mase, 2) : '–',
    cautions: notes.join('; ') || '–',
  };
}
