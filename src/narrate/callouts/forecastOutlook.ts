import type {ForecastResult} from '../../analyse/types.js';
import type {Rule} from '../context.js';
import {shortMethod} from '../../words/index.js';
import {chartAnchor} from '../chartAnchor.js';

/** The interval level quoted in sentences: 80% when computed (common practice for planning), else the first. */
export function quotedLevel(f: Pick<ForecastResult, 'levels'>): number | null {
  if (f.levels.includes(80)) return 80;
  return f.levels.length > 0 ? f.levels[0] : null;
}

/** Forecast for the next period and for the end of the horizon, each with its prediction range. Info. */
export const forecastOutlookRule: Rule = {
  name: 'forecast-outlook',
  run({analysis: a, series: s, words: w}) {
    const f = a.forecast;
    if (!f || f.mean.length === 0) return [];
    const level = quotedLevel(f);
    if (level === null) return [];
    const key = String(level);
    const at = (i: number) => ({
      index: a.start + f.startOffset + i,
      mean: f.mean[i],
      low: f.lower[key]?.[i] ?? NaN,
      high: f.upper[key]?.[i] ?? NaN,
    });
    const words = (p: ReturnType<typeof at>) => ({
      period: w.periodLong(a.frequency, p.index),
      mean: w.value(p.mean, s.unit),
      range: w.range(p.low, p.high, s.unit),
    });
    const next = at(0);
    if (!Number.isFinite(next.mean)) return [];
    const h = f.mean.length;
    const last = h > 1 ? at(h - 1) : null;
    return [
      {
        key: null,
        severity: 'info',
        text: w.t('callout.forecastOutlook', {
          label: s.label,
          level: String(level),
          ...words(next),
          tail: last ? w.t('callout.forecastTail', {...words(last), level: String(level), ahead: w.periods(a.frequency, h)}) : '',
          method: shortMethod(w, f.method),
        }),
        figures: {
          level,
          next: next.mean,
          nextLower: next.low,
          nextUpper: next.high,
          ...(last ? {horizon: h, last: last.mean, lastLower: last.low, lastUpper: last.high} : {}),
        },
        chart: chartAnchor(s.id, 'forecast'),
        magnitude: 0.5,
        periodsAgo: 0,
      },
    ];
  },
};
