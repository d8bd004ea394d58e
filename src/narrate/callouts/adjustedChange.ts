import {chartId, type Rule} from '../context.js';
import {robustZ} from '../robustZ.js';
import {severityFromZ} from '../severity.js';
import * as say from '../wording.js';

/**
 * Latest seasonally adjusted period-on-period move (percent, or percentage points for rates), with the
 * annualised rate for non-rates. Severity from its robust z-score among all earlier adjusted changes.
 * Needs a seasonal adjustment; series that were not adjusted get no such callout.
 */
export const adjustedChangeRule: Rule = {
  name: 'adjusted-change',
  run({analysis: a, series: s, fmt, isRate}) {
    if (!a.adjustment) return [];
    const sa = a.adjustment.adjusted;
    const last = a.end - a.start;
    const step = (i: number) => (isRate ? sa[i] - sa[i - 1] : (sa[i] / sa[i - 1] - 1) * 100);
    if (last < 1) return [];
    const change = step(last);
    if (!Number.isFinite(change)) return [];
    const history: number[] = [];
    for (let i = 1; i < last; i++) history.push(step(i));
    const z = robustZ(history, change);
    const severity = severityFromZ(z);
    const annualised = isRate ? null : a.changes.periodOnPeriodAnnualised;
    return [
      {
        key: null,
        severity,
        text: say.adjustedChange({
          fmt,
          label: s.label,
          change,
          isRate,
          period: fmt.period(a.frequency, a.end),
          previous: fmt.period(a.frequency, a.end - 1),
          annualised,
          unusual: severity !== 'info',
        }),
        figures: {
          adjusted: sa[last],
          previous: sa[last - 1],
          change,
          ...(annualised !== null && Number.isFinite(annualised) ? {annualised} : {}),
          ...(Number.isFinite(z) ? {z} : {}),
        },
        chart: chartId(s.id, 'overview'),
        magnitude: Number.isFinite(z) ? Math.abs(z) : 0,
        periodsAgo: 0,
      },
    ];
  },
};
