import type {Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';
import {robustZ} from '../robustZ.js';
import {severityFromZ} from '../severity.js';

/**
 * Latest seasonally adjusted period-on-period move (percent, or percentage points for rates), with the
 * annualised rate for non-rates. Severity from its robust z-score among all earlier adjusted changes.
 * Needs a seasonal adjustment; series that were not adjusted get no such callout.
 */
export const adjustedChangeRule: Rule = {
  name: 'adjusted-change',
  run({analysis: a, series: s, words: w, isRate}) {
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
        text: w.t(Math.abs(change) < 0.05 ? 'callout.adjustedSteady' : 'callout.adjustedMove', {
          label: s.label,
          up: change > 0 ? 'yes' : 'no',
          size: w.magnitude(change, isRate),
          period: w.periodLong(a.frequency, a.end),
          previous: w.periodLong(a.frequency, a.end - 1),
          annualised:
            annualised !== null && Number.isFinite(annualised) ? w.t('callout.annualised', {value: w.percent(annualised)}) : '',
          unusual: severity !== 'info' ? 'yes' : 'no',
        }),
        figures: {
          adjusted: sa[last],
          previous: sa[last - 1],
          change,
          ...(annualised !== null && Number.isFinite(annualised) ? {annualised} : {}),
          ...(Number.isFinite(z) ? {z} : {}),
        },
        chart: chartAnchor(s.id, 'overview'),
        magnitude: Number.isFinite(z) ? Math.abs(z) : 0,
        periodsAgo: 0,
      },
    ];
  },
};
