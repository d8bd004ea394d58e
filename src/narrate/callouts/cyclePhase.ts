import type {CycleResult} from '../../analyse/types.js';
import {phaseWords} from '../../words/index.js';
import type {Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';
import {robustZ} from '../robustZ.js';

type Phase = CycleResult['phase'];

/**
 * Where the series stands in its cycle (gap to the long-run trend, sign and direction), and whether that
 * phase changed in the review period. A change is found by reading the previous period's phase from the gap
 * with the same rule (above/below trend by the gap's sign, rising/falling by its last change) and is only
 * reported when that rule agrees with the engine's current phase. A change that crosses the long-run trend
 * (above ↔ below) is watch; a change of direction only is info, since the gap's direction flips often.
 */
export const cyclePhaseRule: Rule = {
  name: 'cycle-phase',
  run({analysis: a, series: s, words: w}) {
    const c = a.cycle;
    if (!c) return [];
    const last = a.end - a.start;
    const gap = c.gap[last];
    if (!Number.isFinite(gap)) return [];
    const z = robustZ(c.gap.slice(0, last), gap);
    const magnitude = Number.isFinite(z) ? Math.abs(z) : 0;
    const chart = chartAnchor(s.id, 'cycle');
    const current = phaseAt(c.gap, last);
    const previous = phaseAt(c.gap, last - 1);
    if (current === c.phase && previous !== null && previous !== current) {
      return [
        {
          key: null,
          severity: crossed(previous, current) ? 'watch' : 'info',
          text: w.t('callout.cyclePhaseChange', {
            label: s.label,
            from: w.t(`phase.${previous}`),
            to: w.t(`phase.${current}`),
            period: w.periodLong(a.frequency, a.end),
            gap: w.percent(gap),
          }),
          figures: {gap},
          chart,
          magnitude: Math.max(1, magnitude),
          periodsAgo: 0,
        },
      ];
    }
    return [
      {
        key: null,
        severity: 'info',
        text: w.t('callout.cyclePhase', {label: s.label, phase: phaseWords(w, c), gap: w.percent(gap)}),
        figures: {gap},
        chart,
        magnitude: Math.min(magnitude, 2),
        periodsAgo: 0,
      },
    ];
  },
};

function phaseAt(gap: number[], i: number): Phase | null {
  if (i < 1 || !Number.isFinite(gap[i]) || !Number.isFinite(gap[i - 1])) return null;
  const rising = gap[i] >= gap[i - 1];
  return gap[i] >= 0 ? (rising ? 'rising-above' : 'falling-above') : rising ? 'rising-below' : 'falling-below';
}

function crossed(from: Phase, to: Phase): boolean {
  return from.endsWith('above') !== to.endsWith('above');
}
