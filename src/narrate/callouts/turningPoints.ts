import {formatPeriod, periodsPerYear} from '../../time/period.js';
import {chartId, type Rule} from '../context.js';
import * as say from '../wording.js';

/**
 * Cyclical turning points dated within the last two years, one callout each. Provisional points (near the
 * end of the data, where a later turn may still move them) are watch and say so; confirmed ones are info.
 */
export const turningPointsRule: Rule = {
  name: 'turning-point',
  run({analysis: a, series: s, fmt}) {
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
          text: say.turningPoint({
            label: s.label,
            type: tp.type,
            period: fmt.period(a.frequency, period),
            ago: say.periods(a.frequency, ago),
            provisional: tp.provisional,
          }),
          figures: {index: tp.index, periodsAgo: ago, gap: a.cycle!.gap[tp.index]},
          chart: chartId(s.id, 'cycle'),
          magnitude: tp.provisional ? 2 : 1,
          periodsAgo: ago,
        };
      });
  },
};
