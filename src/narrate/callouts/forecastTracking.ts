import type {Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';

/** Records from this many checked forecasts on are judged (fewer say too little); our threshold. */
export const MIN_TRACKED = 6;
/** Coverage this far below the nominal level makes the record watch: 20 percentage points (our threshold). */
export const COVERAGE_SHORTFALL = 0.2;

/**
 * The record of forecasts published in earlier packs: how many have been checked against actuals, how many
 * fell inside their range, and the running MASE. Watch when, from {@link MIN_TRACKED} checks on, coverage
 * falls short of the nominal level by {@link COVERAGE_SHORTFALL} or more, or the running MASE exceeds 1.
 */
export const forecastTrackingRule: Rule = {
  name: 'forecast-tracking',
  run({history, series: s, words: w}) {
    const t = history?.trackingSummary.find((x) => x.seriesId === s.id);
    if (!t || t.count === 0) return [];
    const levels = Object.keys(t.coverage)
      .map(Number)
      .sort((x, y) => x - y);
    const level = levels.includes(80) ? 80 : levels[0];
    if (level === undefined) return [];
    const coverage = t.coverage[String(level)];
    const inside = Math.round(coverage * t.count);
    const judged = t.count >= MIN_TRACKED;
    const poor = judged && (coverage <= level / 100 - COVERAGE_SHORTFALL || (t.mase !== null && t.mase > 1));
    return [
      {
        key: null,
        severity: poor ? 'watch' : 'info',
        text: w.t('callout.trackingRecord', {
          label: s.label,
          count: t.count,
          inside: w.number(inside, 0),
          level: String(level),
          share: w.share(coverage * 100, 0),
          mase: t.mase === null ? 'none' : w.number(t.mase, 2),
        }),
        figures: {count: t.count, coverage, level, ...(t.mase === null ? {} : {mase: t.mase})},
        chart: chartAnchor(s.id, 'forecast'),
        magnitude: poor ? 2 : 0.5,
        periodsAgo: 0,
      },
    ];
  },
};

