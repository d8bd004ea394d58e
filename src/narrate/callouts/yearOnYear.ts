import {yearAgo} from '../../time/period.js';
import type {Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';
import {robustZ} from '../robustZ.js';
import {severityFromZ} from '../severity.js';

/**
 * Latest year-on-year move: the review period's original value against the same period a year earlier,
 * in percent (percentage points for rates). Severity from the robust z-score of this change among all
 * earlier year-on-year changes of the series (see severity.ts).
 */
export const yearOnYearRule: Rule = {
  name: 'year-on-year',
  run({analysis: a, series: s, words: w, isRate}) {
    const last = a.end - a.start;
    const lag = a.end - yearAgo(a.frequency, a.end);
    const value = a.original[last];
    const previous = a.original[last - lag];
    if (!Number.isFinite(value) || !Number.isFinite(previous)) return [];
    const change = isRate ? value - previous : Number.isFinite(a.changes.yearOnYear) ? a.changes.yearOnYear : NaN;
    if (!Number.isFinite(change)) return [];
    const history: number[] = [];
    for (let i = lag; i < last; i++) {
      history.push(isRate ? a.original[i] - a.original[i - lag] : (a.changes.yearOnYearSeries[i] ?? NaN));
    }
    const z = robustZ(history, change);
    const severity = severityFromZ(z);
    return [
      {
        key: null,
        severity,
        text: w.t('callout.yearOnYear', {
          label: s.label,
          stock: s.kind === 'stock' || isRate ? 'yes' : 'no',
          value: w.value(value, s.unit),
          period: w.periodLong(a.frequency, a.end),
          change: w.change(change, isRate),
          yearAgo: w.periodLong(a.frequency, a.end - lag),
          unusual: severity !== 'info' ? 'yes' : 'no',
        }),
        figures: {value, previous, change, ...(Number.isFinite(z) ? {z} : {})},
        chart: chartAnchor(s.id, 'yoy'),
        magnitude: Number.isFinite(z) ? Math.abs(z) : 0,
        periodsAgo: 0,
      },
    ];
  },
};
