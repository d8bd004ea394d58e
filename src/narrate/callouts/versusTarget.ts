import type {Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';

/** An unfavourable variance this many times the pack's `thresholds.targetPct` is an alert (common practice: 2.5). */
export const ALERT_MULTIPLE = 2.5;

/**
 * Variance against target beyond `thresholds.targetPct`, for the review period and for the fiscal year to date:
 * actual, target, the percent and which side is favourable (`better`), and the part the calendar explains when
 * the seasonal engine kept a calendar effect. Severity: favourable → info; unfavourable → watch, alert from
 * {@link ALERT_MULTIPLE} × the threshold.
 */
export const versusTargetRule: Rule = {
  name: 'versus-target',
  run({series: s, combination, plan, words: w, analysis: a}) {
    const v = combination?.versusTarget;
    if (!v) return [];
    const threshold = plan.thresholds.targetPct;
    return (['period', 'yearToDate'] as const).flatMap((span) => {
      const x = v[span];
      if (!Number.isFinite(x.percent) || Math.abs(x.percent) <= threshold) return [];
      const severity = x.favourable ? 'info' : Math.abs(x.percent) >= ALERT_MULTIPLE * threshold ? 'alert' : 'watch';
      const calendar =
        Number.isFinite(x.calendarPart) && x.calendarPart !== 0 && s.kind === 'flow' ? x.calendarPart : null;
      return [
        {
          key: span === 'period' ? 'period' : 'year-to-date',
          severity,
          text: w.t('callout.versusTarget', {
            label: s.label,
            span: span === 'period' ? 'period' : 'yearToDate',
            period: w.periodLong(a.frequency, a.end),
            actual: w.value(x.actual, s.unit),
            target: w.value(x.target, s.unit),
            percent: w.share(x.percent),
            above: x.difference > 0 ? 'yes' : 'no',
            favourable: x.favourable ? 'yes' : 'no',
            calendar: calendar === null ? 'none' : w.signed(calendar, s.unit),
          }),
          figures: {
            actual: x.actual,
            target: x.target,
            difference: x.difference,
            percent: x.percent,
            calendarPart: x.calendarPart,
          },
          chart: chartAnchor(s.id, 'overview'),
          magnitude: Math.min(10, Math.abs(x.percent) / threshold),
          periodsAgo: 0,
        },
      ];
    });
  },
};
