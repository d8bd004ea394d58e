import type {Rule} from '../context.js';
import {fiscalYears} from '../../time/fiscal.js';
import type {Words} from '../../words/index.js';
import {chartAnchor} from '../chartAnchor.js';

/** Outturn gap to target at or below which the callout is watch (−2%) or alert (−5%); common practice. */
export const WATCH_GAP_PCT = -2;
export const ALERT_GAP_PCT = -5;

/**
 * Fiscal-year outturn (actuals to date plus forecast to year end) with its range, and against the target
 * when the series has one. Severity: alert at a gap of −5% or worse, watch at −2% or worse or when the
 * target lies above the whole range; info otherwise (including any gap above target).
 */
export const outturnRule: Rule = {
  name: 'outturn',
  run({analysis: a, series: s, words: w}) {
    const o = a.outturn;
    if (!o || !Number.isFinite(o.total)) return [];
    const gap = o.target !== null && o.gapPct !== null && Number.isFinite(o.gapPct) ? o.gapPct : null;
    const severity =
      gap === null
        ? 'info'
        : gap <= ALERT_GAP_PCT
          ? 'alert'
          : gap <= WATCH_GAP_PCT || o.target! > o.upper
            ? 'watch'
            : 'info';
    return [
      {
        key: null,
        severity,
        text: outturnText(w, {
          label: s.label,
          stock: s.kind === 'stock',
          closed: o.periodsRemaining === 0,
          years: fiscalYears(o.fiscalYear),
          total: w.value(o.total, s.unit),
          level: String(o.level),
          range: w.range(o.lower, o.upper, s.unit),
          actual: w.periods(a.frequency, o.periodsActual),
          forecast: w.periods(a.frequency, o.periodsRemaining),
          target: gap === null ? null : {value: w.value(o.target!, s.unit), gap},
        }),
        figures: {
          total: o.total,
          lower: o.lower,
          upper: o.upper,
          level: o.level,
          actualToDate: o.actualToDate,
          forecastRemaining: o.forecastRemaining,
          ...(gap === null ? {} : {target: o.target!, gapPct: gap}),
        },
        chart: chartAnchor(s.id, 'forecast'),
        magnitude: gap === null ? 0.5 : Math.abs(gap) / 2,
        periodsAgo: 0,
      },
    ];
  },
};

/** The outturn sentence; "in line with" the target within half a percent of it. */
function outturnText(
  w: Words,
  a: {
    label: string;
    stock: boolean;
    closed: boolean;
    years: string;
    total: string;
    level: string;
    range: string;
    actual: string;
    forecast: string;
    target: {value: string; gap: number} | null;
  },
): string {
  const {target, stock, closed, ...values} = a;
  const base = w.t(closed ? 'callout.outturnClosed' : stock ? 'callout.outturnStock' : 'callout.outturnFlow', values);
  if (!target) return w.t('callout.outturnEnd', {base});
  if (Math.abs(target.gap) < 0.5) return w.t('callout.outturnInLine', {base, target: target.value});
  const above = target.gap > 0 ? 'yes' : 'no';
  return w.t('callout.outturnGap', {base, gap: w.share(target.gap), above, target: target.value});
}
