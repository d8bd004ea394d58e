import {daysFromCivil, civilFromDays} from '../../time/period.js';
import type {Adjustment} from '../../analyse/types.js';
import {chartId, type Draft, type Rule, type RuleContext} from '../context.js';
import {easterSunday} from '../easterSunday.js';
import * as say from '../wording.js';

/**
 * Length of the pre-Easter window whose trade the Easter regressor spreads over March and April: 8 days,
 * the usual default of Easter regressors in seasonal-adjustment practice (common practice).
 */
export const EASTER_WINDOW_DAYS = 8;

/**
 * Calendar effects that the adjustment found significant, one plain sentence each:
 *
 * - trading days / holidays: the combined calendar effect in the review period against an average period;
 * - Easter (monthly and quarterly only): in which period(s) the latest Easter fell and by about how much it
 *   moved the series there (March falls in Q1 and April in Q2 for quarterly series), as coefficient × share of the pre-Easter window in that period (multiplicative
 *   models read the coefficient on the log scale: exp(c·share) − 1).
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

function workingDays({analysis: a, series: s, fmt, isRate}: RuleContext, adj: Adjustment): Draft[] {
  const effect = adj.calendar!.effect[a.end - a.start];
  const size = adj.model === 'multiplicative' ? (effect - 1) * 100 : effect;
  if (!Number.isFinite(size) || Math.abs(size) < 0.05) return [];
  const sizeText = adj.model === 'multiplicative' ? fmt.size(size) : fmt.value(Math.abs(size), isRate ? null : s.unit);
  return [
    {
      key: 'working-days',
      severity: 'info',
      text: say.workingDays({label: s.label, period: fmt.period(a.frequency, a.end), up: size > 0, size: sizeText}),
      figures: {effect: size},
      chart: chartId(s.id, 'seasonal'),
      magnitude: 0.5,
      periodsAgo: 0,
    },
  ];
}

function easterEffect({analysis: a, series: s, fmt, isRate}: RuleContext, model: Adjustment['model'], coefficient: number): Draft[] {
  if (a.frequency === 'weekly') return [];
  const monthly = a.frequency === 'monthly';
  const marchOf = (y: number) => (monthly ? y * 12 + 2 : y * 4);
  const aprilOf = (y: number) => (monthly ? y * 12 + 3 : y * 4 + 1);
  let year = monthly ? Math.floor((a.end - 2) / 12) : Math.floor(a.end / 4);
  let share = marchShare(year);
  if (share < 1 && aprilOf(year) > a.end) share = marchShare(--year);
  if (marchOf(year) < a.start) return [];
  const lift = (x: number) => (model === 'multiplicative' ? (Math.exp(coefficient * x) - 1) * 100 : coefficient * x);
  const say1 = (x: number) => (model === 'multiplicative' ? fmt.size(x) : fmt.value(Math.abs(x), isRate ? null : s.unit));
  const signed = (x: number) => (model === 'multiplicative' ? fmt.percent(x) : fmt.signed(x, isRate ? '%' : s.unit));
  const {month, day} = easterSunday(year);
  const date = fmt.dayMonth(year, month, day);
  const march = lift(share);
  const april = lift(1 - share);
  const periodsAgo = a.end - (share < 1 ? aprilOf(year) : marchOf(year));
  const base = {key: 'easter', severity: 'info' as const, chart: chartId(s.id, 'seasonal'), magnitude: 0.5, periodsAgo};
  if (share === 1 || share === 0) {
    const size = share === 1 ? march : april;
    if (Math.abs(size) < 0.05) return [];
    const p = share === 1 ? marchOf(year) : aprilOf(year);
    return [
      {
        ...base,
        text: say.easterOne({label: s.label, year, date, up: size > 0, period: fmt.period(a.frequency, p), size: say1(size)}),
        figures: {year, marchShare: share, effect: size},
      },
    ];
  }
  if (Math.abs(march) < 0.05 && Math.abs(april) < 0.05) return [];
  return [
    {
      ...base,
      text: say.easterSplit({
        label: s.label,
        year,
        date,
        first: {period: fmt.period(a.frequency, marchOf(year)), change: signed(march)},
        second: {period: fmt.period(a.frequency, aprilOf(year)), change: signed(april)},
      }),
      figures: {year, marchShare: share, marchEffect: march, aprilEffect: april},
    },
  ];
}

/** Share of the {@link EASTER_WINDOW_DAYS} days before Easter Sunday that fall in March. */
function marchShare(year: number): number {
  const {month, day} = easterSunday(year);
  const sunday = daysFromCivil(year, month, day);
  let march = 0;
  for (let k = 1; k <= EASTER_WINDOW_DAYS; k++) if (civilFromDays(sunday - k).month === 3) march++;
  return march / EASTER_WINDOW_DAYS;
}
