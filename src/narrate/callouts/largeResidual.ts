import {formatPeriod, periodsPerYear} from '../../time/period.js';
import type {Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';

/** Outliers in the last quarter of a year (3 months, 1 quarter, 13 weeks) count as current: alert. */
const CURRENT_FRACTION = 0.25;

/**
 * Every large residual (outlier) flagged by the seasonal adjustment in the last two years, with its size in
 * robust sigmas, its kind and, for one-offs and temporary changes, its size in the series' terms (percent for
 * multiplicative models, the unit or percentage points for additive ones).
 *
 * Severity: alert when it is current (see {@link CURRENT_FRACTION}) or at least twice the pack's residual
 * threshold; watch otherwise.
 */
export const largeResidualRule: Rule = {
  name: 'large-residual',
  run({analysis: a, series: s, plan, words: w, isRate}) {
    const adj = a.adjustment;
    if (!adj) return [];
    const last = a.end - a.start;
    const ppy = periodsPerYear[a.frequency];
    const current = Math.max(1, Math.round(ppy * CURRENT_FRACTION));
    return adj.outliers
      .filter((o) => o.index <= last && last - o.index < 2 * ppy)
      .sort((x, y) => x.index - y.index)
      .map((o) => {
        const ago = last - o.index;
        const irregular = adj.irregular[o.index];
        const size = adj.model === 'multiplicative' ? (irregular - 1) * 100 : irregular;
        const sizeText =
          o.kind === 'level-shift' || !Number.isFinite(size)
            ? null
            : adj.model === 'multiplicative'
              ? w.percent(size)
              : w.signed(size, isRate ? '%' : s.unit);
        const severe = ago < current || Math.abs(o.score) >= 2 * plan.thresholds.residualSigma;
        return {
          key: formatPeriod(a.frequency, a.start + o.index),
          severity: severe ? ('alert' as const) : ('watch' as const),
          text: w.t(o.kind === 'level-shift' ? 'callout.levelShift' : 'callout.residual', {
            label: s.label,
            period: w.periodLong(a.frequency, a.start + o.index),
            kind: o.kind,
            up: o.score > 0 ? 'yes' : 'no',
            sigmas: w.number(Math.abs(o.score), 1),
            size: sizeText ?? 'none',
          }),
          figures: {index: o.index, score: o.score, ...(Number.isFinite(size) ? {size} : {})},
          chart: chartAnchor(s.id, 'irregular'),
          magnitude: Math.abs(o.score),
          periodsAgo: ago,
        };
      });
  },
};
