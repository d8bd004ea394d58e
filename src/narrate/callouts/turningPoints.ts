import {formatPeriod, periodsPerYear} from '../../time/period.js';
import type {Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';

/**
 * Cyclical turning points dated within the last two years, one callout each. Provisional points (near the
 * end of the data, where a later turn may still move them) are watch and say so; confirmed ones are info.
 */
export const turningPointsRule: Rule = {
  name: 'turning-point',
  run({analysis: a, series: s, words: w}) {
    if (!a.cycle) return [];
    const last = a.end - a.start;
    const window = 2 * periodsPerYear[a.frequency];
    return a.cycle.turningPoints
      .filter((tp) => tp.index <= last && last - tp.index < window)
      .map((tp) => {
        const ago = last - tp.index;
        const period = a.start + tp.index;
        return {
          key: `${tp.type}-${formatPeriod(a.frequency, period)}`,
          severity: tp.provisional ? ('watch' as const) : ('info' as const),
          text: w.t('callout.turningPoint', {
            label: s.label,
            type: w.t(`turn.${tp.type}`),
            period: w.periodLong(a.frequency, period),
            ago: w.periods(a.frequency, ago),
            provisional: tp.provisional ? 'yes' : 'no',
          }),
          figures: {index: tp.index, periodsAgo: ago, gap: a.cycle!.gap[tp.index]},
          chart: chartAnchor(s.id, 'cycle'),
          magnitude: tp.provisional ? 2 : 1,
          periodsAgo: ago,
        };
      });
  },
};
