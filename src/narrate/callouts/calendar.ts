import {civilFromDays} from '../../time/period.js';
import {easterRegressor} from '../../time/calendar.js';
import {easterSunday} from '../../time/easter.js';
import type {Adjustment} from '../../analyse/types.js';
import type {Draft, Rule, RuleContext} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';

/**
 * Calendar effects that the adjustment found significant, one plain sentence each:
 *
 * - trading days / holidays: the combined calendar effect in the review period against an average period;
 * - Easter (monthly and quarterly only): the latest Easter, whether it fell earlier or later than on average,
 *   and how much that moved March and April (Q1 and Q2) against an average year: coefficient × the engine's
 *   Easter regressor (time/calendar.ts, 8-day window, centred on its long-run mean), on the log scale for
 *   multiplicative models (e^(c·x) − 1).
 *
 * Effects smaller than 0.05% (or 0.05 units) are left unsaid. Always info.
 */
export const calendarRule: Rule = {
  name: 'calendar',
  run(ctx) {
    const cal = ctx.analysis.adjustment?.calendar;
    if (!cal || !ctx.analysis.adjustment) return [];
    const out: Draft[] = [];
    const significant = cal.regressors.filter((r) => r.significant);
    if (significant.some((r) => r.name !== 'easter')) out.push(...workingDays(ctx, ctx.analysis.adjustment));
    const easter = significant.find((r) => r.name === 'easter');
    if (easter) out.push(...easterEffect(ctx, ctx.analysis.adjustment.model, easter.coefficient));
    return out;
  },
};

function workingDays({analysis: a, series: s, words: w, isRate}: RuleContext, adj: Adjustment): Draft[] {
  const effect = adj.calendar!.effect[a.end - a.start];
  const size = adj.model === 'multiplicative' ? (effect - 1) * 100 : effect;
  if (!Number.isFinite(size) || Math.abs(size) < 0.05) return [];
  const sizeText = adj.model === 'multiplicative' ? w.share(size) : w.value(Math.abs(size), isRate ? null : s.unit);
  return [
    {
      key: 'working-days',
      severity: 'info',
      text: w.t('callout.workingDays', {
        label: s.label,
        period: w.periodLong(a.frequency, a.end),
        up: size > 0 ? 'yes' : 'no',
        size: sizeText,
      }),
      figures: {effect: size},
      chart: chartAnchor(s.id, 'seasonal'),
      magnitude: 0.5,
      periodsAgo: 0,
    },
  ];
}

function easterEffect(
  {analysis: a, series: s, words: w, isRate}: RuleContext,
  model: Adjustment['model'],
  coefficient: number,
): Draft[] {
  if (a.frequency === 'weekly') return [];
  const monthly = a.frequency === 'monthly';
  const marchOf = (y: number) => (monthly ? y * 12 + 2 : y * 4);
  let year = monthly ? Math.floor((a.end - 2) / 12) : Math.floor(a.end / 4);
  if (marchOf(year) + 1 > a.end) year--;
  if (marchOf(year) < a.start) return [];
  // The engine's regressor: share of the pre-Easter window in March (Q1) / April (Q2), minus its long-run mean.
  const [xMarch, xApril] = easterRegressor(a.frequency, marchOf(year), 2);
  const effect = (x: number) => (model === 'multiplicative' ? Math.expm1(coefficient * x) * 100 : coefficient * x);
  const march = effect(xMarch);
  const april = effect(xApril);
  if (Math.abs(march) < 0.05 && Math.abs(april) < 0.05) return [];
  const signed = (x: number) => (model === 'multiplicative' ? w.percent(x) : w.signed(x, isRate ? '%' : s.unit));
  const {month, day} = civilFromDays(easterSunday(year));
  return [
    {
      key: 'easter',
      severity: 'info',
      text: w.t('callout.easter', {
        label: s.label,
        year: String(year),
        date: w.dayMonth(year, month, day),
        earlier: xMarch > 0 ? 'yes' : 'no',
        firstPeriod: w.periodLong(a.frequency, marchOf(year)),
        firstChange: signed(march),
        secondPeriod: w.periodLong(a.frequency, marchOf(year) + 1),
        secondChange: signed(april),
      }),
      figures: {year, regressorMarch: xMarch, marchEffect: march, aprilEffect: april},
      chart: chartAnchor(s.id, 'seasonal'),
      magnitude: 0.5,
      periodsAgo: a.end - (marchOf(year) + 1),
    },
  ];
}
