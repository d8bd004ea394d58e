import {chartId, type Draft, type Rule} from '../context.js';
import * as say from '../wording.js';

/** Share of missing values from which gaps are watch rather than info: 5% (common practice). */
export const WATCH_GAP_SHARE = 0.05;

/**
 * Data problems: missing values (and whether the analysis filled them), a missing review-period value
 * (alert), a series left unadjusted (watch, with the reason), and every other note from the analysis (info).
 */
export const dataQualityRule: Rule = {
  name: 'data',
  run({analysis: a, series: s, fmt}) {
    const out: Draft[] = [];
    const chart = chartId(s.id, 'overview');
    const last = a.end - a.start;
    const missing: number[] = [];
    a.original.forEach((v, i) => {
      if (!Number.isFinite(v)) missing.push(i);
    });
    if (missing.length > 0) {
      const filled = a.adjustment ? a.adjustment.filled.filter(Boolean).length : 0;
      out.push({
        key: 'gaps',
        severity: missing.length >= WATCH_GAP_SHARE * a.original.length ? 'watch' : 'info',
        text: say.gaps({
          label: s.label,
          count: missing.length,
          periods: say.list(missing.map((i) => fmt.period(a.frequency, a.start + i))),
          filled,
        }),
        figures: {missing: missing.length, filled},
        chart,
        magnitude: Math.min(missing.length, 5),
        periodsAgo: last - missing[missing.length - 1],
      });
    }
    if (!Number.isFinite(a.original[last])) {
      out.push({
        key: 'latest-missing',
        severity: 'alert',
        text: say.latestMissing({label: s.label, period: fmt.period(a.frequency, a.end)}),
        figures: {},
        chart,
        magnitude: 5,
        periodsAgo: 0,
      });
    }
    if (a.notAdjustedReason) {
      out.push({
        key: 'not-adjusted',
        severity: 'watch',
        text: say.notAdjusted({label: s.label, reason: a.notAdjustedReason}),
        figures: {},
        chart,
        magnitude: 1,
        periodsAgo: 0,
      });
    }
    a.notes
      .filter((note) => note !== a.notAdjustedReason)
      .forEach((note, i) =>
        out.push({
          key: `note-${i + 1}`,
          severity: 'info',
          text: say.seriesNote({label: s.label, note}),
          figures: {},
          chart,
          magnitude: 0,
          periodsAgo: 0,
        }),
      );
    return out;
  },
};
