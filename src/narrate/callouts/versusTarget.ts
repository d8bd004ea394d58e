import {chartId, type Rule} from '../context.js';
import * as say from '../wording.js';

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
  run({series: s, combination, plan, fmt, analysis: a}) {
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
          text: say.versusTarget({
            label: s.label,
            span: span === 'period' ? fmt.period(a.frequency, a.end) : null,
            actual: fmt.value(x.actual, s.unit),
            target: fmt.value(x.target, s.unit),
            percent: fmt.size(x.percent),
            above: x.difference > 0,
            favourable: x.favourable,
            calendar: calendar === null ? null : fmt.signed(calendar, s.unit),
          }),
          figures: {
            actual: x.actual,
            target: x.target,
            difference: x.difference,
            percent: x.percent,
            calendarPart: x.calendarPart,
          },
          chart: chartId(s.id, 'overview'),
          magnitude: Math.min(10, Math.abs(x.percent) / threshold),
          periodsAgo: 0,
        },
      ];
    });
  },
};
