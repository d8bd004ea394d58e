import type {Draft, Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';
import {wordNote} from '../../words/index.js';

/** Share of missing values from which gaps are watch rather than info: 5% (common practice). */
export const WATCH_GAP_SHARE = 0.05;

/**
 * Data problems: missing values (and whether the analysis filled them), a missing review-period value
 * (alert), a series left unadjusted (watch, with the reason), and every other note from the analysis (info).
 */
export const dataQualityRule: Rule = {
  name: 'data',
  run({analysis: a, series: s, words: w}) {
    const out: Draft[] = [];
    const chart = chartAnchor(s.id, 'overview');
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
        text: w.t('callout.gaps', {
          label: s.label,
          count: missing.length,
          periods: w.list(missing.map((i) => w.periodLong(a.frequency, a.start + i))),
          filled: filled === 0 ? 'none' : filled === missing.length ? 'all' : w.t('callout.gapsFilled', {n: filled}),
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
        text: w.t('callout.latestMissing', {label: s.label, period: w.periodLong(a.frequency, a.end)}),
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
        text: w.t('callout.notAdjusted', {label: s.label, reason: sentence(wordNote(w, a.notAdjustedReason))}),
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
          text: w.t('callout.seriesNote', {label: s.label, note: sentence(wordNote(w, note))}),
          figures: {},
          chart,
          magnitude: 0,
          periodsAgo: 0,
        }),
      );
    return out;
  },
};

/** A note as a sentence: ending with a full stop. */
function sentence(text: string): string {
  const t = text.trim();
  return /[.!?]$/.test(t) ? t : `${t}.`;
}
