import type {DigestSeries, PeriodDigest, RevisionRow} from '../results/index.js';

/** How many of the previous pack's latest periods are compared. */
export const REVISION_WINDOW = 12;

/** Relative difference below which two adjusted figures count as equal (floating-point noise). */
const NOISE = 1e-9;

/** Written in `previous`/`current` when the value was missing on that side. */
export const MISSING = 'missing';

/**
 * What this pack says differently from the previous archived pack, series by series (series present
 * in both), for the previous pack's last {@link REVISION_WINDOW} periods that this pack also has:
 *
 * - `data` / `original`: the input value itself changed (a corrected CSV, or a value that arrived
 *   late or was withdrawn: the missing side is written as `"missing"`);
 * - `estimate` / `adjusted`: the input is unchanged but the seasonally adjusted figure moved, because
 *   new data re-estimated the seasonal pattern;
 * - `estimate` / `trend-direction` and `cycle-phase`: the latest call differs from the one published
 *   last time (period = this pack's review period; `previous` is the call published then).
 *
 * `revisionPct` = (current − previous) / |previous| × 100 for numeric rows, else null. `large` is
 * |revisionPct| > thresholdPct; a numeric change with no percentage (missing side, or a zero base)
 * and every changed call count as large.
 *
 * Rows come in the current pack's series order, then by period, calls last. Pure; O(series × window).
 */
export function revisions(previous: PeriodDigest, current: PeriodDigest, thresholdPct: number): RevisionRow[] {
  const rows: RevisionRow[] = [];
  const before = new Map(previous.series.map((s) => [s.id, s]));
  for (const s of current.series) {
    const p = before.get(s.id);
    if (p !== undefined) rows.push(...seriesRevisions(p, s, current.pack.period, thresholdPct));
  }
  return rows;
}

function seriesRevisions(p: DigestSeries, s: DigestSeries, period: string, thresholdPct: number): RevisionRow[] {
  const rows: RevisionRow[] = [];
  const position = new Map(s.periods.map((label, j) => [label, j]));
  for (let i = Math.max(0, p.periods.length - REVISION_WINDOW); i < p.periods.length; i++) {
    const j = position.get(p.periods[i]);
    if (j === undefined) continue;
    const a = p.original[i];
    const b = s.original[j];
    if (a !== b) {
      rows.push(numericRow(s.id, p.periods[i], 'data', 'original', a, b, thresholdPct));
      continue;
    }
    const pa = p.adjusted?.[i] ?? null;
    const ca = s.adjusted?.[j] ?? null;
    if (a !== null && pa !== null && ca !== null && Math.abs(ca - pa) > NOISE * Math.max(Math.abs(pa), Math.abs(ca))) {
      rows.push(numericRow(s.id, p.periods[i], 'estimate', 'adjusted', pa, ca, thresholdPct));
    }
  }
  const calls: [RevisionRow['measure'], string | null, string | null][] = [
    ['trend-direction', p.trendDirection, s.trendDirection],
    ['cycle-phase', p.phase, s.phase],
  ];
  for (const [measure, was, now] of calls) {
    if (was !== null && now !== null && was !== now) {
      rows.push({
        seriesId: s.id,
        period,
        kind: 'estimate',
        measure,
        previous: was,
        current: now,
        revisionPct: null,
        large: true,
      });
    }
  }
  return rows;
}

function numericRow(
  seriesId: string,
  period: string,
  kind: RevisionRow['kind'],
  measure: RevisionRow['measure'],
  previous: number | null,
  current: number | null,
  thresholdPct: number,
): RevisionRow {
  const pct =
    previous !== null && current !== null && previous !== 0 ? ((current - previous) / Math.abs(previous)) * 100 : null;
  return {
    seriesId,
    period,
    kind,
    measure,
    previous: previous ?? MISSING,
    current: current ?? MISSING,
    revisionPct: pct,
    large: pct === null || Math.abs(pct) > thresholdPct,
  };
}
