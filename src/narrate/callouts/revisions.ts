import {parsePeriod} from '../../time/period.js';
import {chartId, type Draft, type Rule} from '../context.js';
import * as say from '../wording.js';

/**
 * Large revisions since the previous archived pack (those above the pack's `revisionPct` threshold, as
 * marked by the archive): changed input values, moved adjusted figures, and changed trend directions or
 * cycle phases. Watch; alert when a numeric revision is at least three times the threshold.
 */
export const revisionsRule: Rule = {
  name: 'revision',
  run({analysis: a, series: s, history, plan, fmt}) {
    if (!history) return [];
    const previous = parsePeriod(a.frequency, history.previousPeriod);
    const since = previous === undefined ? history.previousPeriod : fmt.period(a.frequency, previous);
    const out: Draft[] = [];
    for (const r of history.revisions) {
      if (r.seriesId !== s.id || !r.large) continue;
      const index = parsePeriod(a.frequency, r.period);
      const period = index === undefined ? r.period : fmt.period(a.frequency, index);
      const periodsAgo = index === undefined ? 0 : Math.max(0, a.end - index);
      const base = {key: `${r.measure}-${r.period}`, chart: chartId(s.id, 'overview'), periodsAgo};
      const {measure, previous: from, current: to} = r;
      if ((measure === 'original' || measure === 'adjusted') && typeof from === 'number' && typeof to === 'number') {
        const pct = r.revisionPct ?? ((to - from) / Math.abs(from)) * 100;
        out.push({
          ...base,
          severity: Math.abs(pct) >= 3 * plan.thresholds.revisionPct ? 'alert' : 'watch',
          text: say.revisionNumeric({
            label: s.label,
            measure,
            period,
            since,
            up: to > from,
            size: fmt.size(pct),
            from: fmt.number(from),
            to: fmt.value(to, s.unit),
          }),
          figures: {previous: from, current: to, revisionPct: pct},
          magnitude: Math.abs(pct) / plan.thresholds.revisionPct,
        });
      } else if (r.measure === 'trend-direction' || r.measure === 'cycle-phase') {
        out.push({
          ...base,
          severity: 'watch',
          text: say.revisionWords({
            label: s.label,
            measure: r.measure,
            period,
            since,
            from: words(r.measure, String(r.previous)),
            to: words(r.measure, String(r.current)),
          }),
          figures: {},
          magnitude: 1,
        });
      }
    }
    return out;
  },
};

function words(measure: 'trend-direction' | 'cycle-phase', value: string): string {
  if (measure === 'cycle-phase' && ['rising-above', 'falling-above', 'falling-below', 'rising-below'].includes(value)) {
    return say.phaseWords(value as 'rising-above');
  }
  return value;
}
