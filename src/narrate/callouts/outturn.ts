import {chartId, type Rule} from '../context.js';
import * as say from '../wording.js';

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
  run({analysis: a, series: s, fmt}) {
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
        text: say.outturn({
          label: s.label,
          stock: s.kind === 'stock',
          fiscalYear: o.fiscalYear,
          total: fmt.value(o.total, s.unit),
          level: o.level,
          range: fmt.range(o.lower, o.upper, s.unit),
          actual: say.periods(a.frequency, o.periodsActual),
          forecast: say.periods(a.frequency, o.periodsRemaining),
          target: gap === null ? null : {value: fmt.value(o.target!, s.unit), gap, gapText: fmt.size(gap)},
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
        chart: chartId(s.id, 'forecast'),
        magnitude: gap === null ? 0.5 : Math.abs(gap) / 2,
        periodsAgo: 0,
      },
    ];
  },
};
