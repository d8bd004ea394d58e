import {formatPeriod, parsePeriod} from '../../time/period.js';
import {chartId, type Rule} from '../context.js';
import * as say from '../wording.js';

/**
 * How the most recent published forecast for the review period fared: the shortest-horizon forecast made in
 * an earlier pack, set against the actual now in (percent error, or percentage points for rates). Watch when
 * the actual fell outside the quoted range, info otherwise.
 */
export const forecastCheckRule: Rule = {
  name: 'forecast-check',
  run({history, series: s, analysis: a, fmt, isRate}) {
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
        text: say.forecastCheck({
          label: s.label,
          period: fmt.period(a.frequency, a.end),
          publishedIn: published === undefined ? row.publishedIn : fmt.period(a.frequency, published),
          forecast: fmt.value(row.forecast, s.unit),
          actual: fmt.value(row.actual, s.unit),
          error: say.change(fmt, error, isRate),
          inside,
          level,
        }),
        figures: {
          forecast: row.forecast,
          actual: row.actual,
          error: row.error,
          errorChange: error,
          horizon: row.horizon,
        },
        chart: chartId(s.id, 'forecast'),
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
