import {formatPeriod, parsePeriod} from '../../time/period.js';
import type {Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';

/**
 * How the most recent published forecast for the review period fared: the shortest-horizon forecast made in
 * an earlier pack, set against the actual now in (percent error, or percentage points for rates). Watch when
 * the actual fell outside the quoted range, info otherwise.
 */
export const forecastCheckRule: Rule = {
  name: 'forecast-check',
  run({history, series: s, analysis: a, words: w, isRate}) {
    if (!history) return [];
    const label = formatPeriod(a.frequency, a.end);
    const rows = history.tracking
      .filter((r) => r.seriesId === s.id && r.period === label)
      .sort((x, y) => x.horizon - y.horizon || later(x.publishedIn, y.publishedIn));
    const row = rows[0];
    if (!row) return [];
    const levels = Object.keys(row.inside)
      .map(Number)
      .sort((x, y) => x - y);
    const level = levels.includes(80) ? 80 : levels[0];
    if (level === undefined) return [];
    const inside = row.inside[String(level)];
    const error = isRate ? row.actual - row.forecast : (row.actual / row.forecast - 1) * 100;
    const published = parsePeriod(a.frequency, row.publishedIn);
    return [
      {
        key: null,
        severity: inside ? 'info' : 'watch',
        text: w.t('callout.forecastCheck', {
          label: s.label,
          period: w.periodLong(a.frequency, a.end),
          publishedIn: published === undefined ? row.publishedIn : w.periodLong(a.frequency, published),
          forecast: w.value(row.forecast, s.unit),
          actual: w.value(row.actual, s.unit),
          error: w.change(error, isRate),
          inside: inside ? 'yes' : 'no',
          level: String(level),
        }),
        figures: {
          forecast: row.forecast,
          actual: row.actual,
          error: row.error,
          errorChange: error,
          horizon: row.horizon,
        },
        chart: chartAnchor(s.id, 'forecast'),
        magnitude: inside ? 0.5 : 2,
        periodsAgo: 0,
      },
    ];
  },
};

/** Latest publication first (canonical period labels sort as text within one frequency). */
function later(a: string, b: string): number {
  return a < b ? 1 : a > b ? -1 : 0;
}
