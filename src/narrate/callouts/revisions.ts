import {parsePeriod} from '../../time/period.js';
import type {Draft, Rule} from '../context.js';
import type {Words} from '../../words/index.js';
import {chartAnchor} from '../chartAnchor.js';

/**
 * Large revisions since the previous archived pack (those above the pack's `revisionPct` threshold, as
 * marked by the archive): changed input values, moved adjusted figures, and changed trend directions or
 * cycle phases. Watch; alert when a numeric revision is at least three times the threshold.
 */
export const revisionsRule: Rule = {
  name: 'revision',
  run({analysis: a, series: s, history, plan, words: w}) {
    if (!history) return [];
    const previous = parsePeriod(a.frequency, history.previousPeriod);
    const since = previous === undefined ? history.previousPeriod : w.periodLong(a.frequency, previous);
    const out: Draft[] = [];
    for (const r of history.revisions) {
      if (r.seriesId !== s.id || !r.large) continue;
      const index = parsePeriod(a.frequency, r.period);
      const period = index === undefined ? r.period : w.periodLong(a.frequency, index);
      const periodsAgo = index === undefined ? 0 : Math.max(0, a.end - index);
      const base = {key: `${r.measure}-${r.period}`, chart: chartAnchor(s.id, 'overview'), periodsAgo};
      const {measure, previous: from, current: to} = r;
      if ((measure === 'original' || measure === 'adjusted') && typeof from === 'number' && typeof to === 'number') {
        const pct = r.revisionPct ?? ((to - from) / Math.abs(from)) * 100;
        out.push({
          ...base,
          severity: Math.abs(pct) >= 3 * plan.thresholds.revisionPct ? 'alert' : 'watch',
          text: w.t('callout.revisionNumeric', {
            label: s.label,
            measure,
            period,
            since,
            up: to > from ? 'yes' : 'no',
            size: w.share(pct),
            from: w.number(from),
            to: w.value(to, s.unit),
          }),
          figures: {previous: from, current: to, revisionPct: pct},
          magnitude: Math.abs(pct) / plan.thresholds.revisionPct,
        });
      } else if (r.measure === 'trend-direction' || r.measure === 'cycle-phase') {
        out.push({
          ...base,
          severity: 'watch',
          text: w.t('callout.revisionWords', {
            label: s.label,
            measure: r.measure === 'trend-direction' ? 'trend' : 'cycle',
            period,
            since,
            from: measureValue(w, r.measure, String(r.previous)),
            to: measureValue(w, r.measure, String(r.current)),
          }),
          figures: {},
          magnitude: 1,
        });
      }
    }
    return out;
  },
};

/** A trend direction or cycle phase in words (a value this version does not know is shown as it is). */
export function measureValue(w: Words, measure: 'trend-direction' | 'cycle-phase', value: string): string {
  if (measure === 'cycle-phase' && ['rising-above', 'falling-above', 'falling-below', 'rising-below'].includes(value)) {
    return w.t(`phase.${value as 'rising-above'}`);
  }
  if (measure === 'trend-direction' && ['rising', 'falling', 'flat'].includes(value)) return w.t(`direction.${value as 'flat'}`);
  return value;
}
