import {frequencyOf, type DigestSeries, type PeriodDigest, type TrackingRow, type TrackingSummary} from '../results/index.js';
import {parsePeriod} from '../time/period.js';
import {seasonalNaiveMae} from './seasonalNaiveMae.js';

/** What tracking reads of an earlier period: its forecasts. */
export interface PublishedForecasts {
  pack: PeriodDigest['pack'];
  series: Pick<DigestSeries, 'id' | 'forecast'>[];
}

/**
 * Every forecast published in an earlier pack whose actual is now known, set against that actual
 * (the current pack's original value for the period). `error` = actual − forecast; `horizon` =
 * periods between the publishing pack's review period and the forecast period; `inside[level]` is
 * lower ≤ actual ≤ upper for each band the earlier pack published.
 *
 * Earlier packs of another frequency are ignored. Forecasts or actuals that are missing (null) are
 * skipped. Rows come in the current pack's series order, then by publishing period, then by period.
 * Pure; O(earlier packs × series × horizon).
 */
export function trackForecasts(earlier: PublishedForecasts[], current: PeriodDigest): TrackingRow[] {
  const freq = frequencyOf(current.pack.frequency);
  const packs = earlier
    .filter((e) => e.pack.frequency === current.pack.frequency)
    .map((e) => ({pack: e, byId: new Map(e.series.map((x) => [x.id, x])), index: parsePeriod(freq, e.pack.period)}))
    .filter((e): e is {pack: PublishedForecasts; byId: Map<string, PublishedForecasts['series'][number]>; index: number} => e.index !== undefined)
    .sort((a, b) => a.index - b.index);
  const rows: TrackingRow[] = [];
  const shared = new Map<string, Readonly<Record<string, boolean>>>();
  for (const s of current.series) {
    const position = new Map(s.periods.map((label, j) => [label, j]));
    for (const {pack, byId, index: published} of packs) {
      const fc = byId.get(s.id)?.forecast;
      if (fc == null) continue;
      const levels = Object.keys(fc.lower).sort((a, b) => Number(a) - Number(b));
      fc.periods.forEach((label, k) => {
        const j = position.get(label);
        const actual = j === undefined ? null : s.original[j];
        const forecast = fc.mean[k];
        const at = parsePeriod(freq, label);
        if (actual === null || forecast === null || at === undefined) return;
        const inside: [string, boolean][] = [];
        for (const level of levels) {
          const lo = fc.lower[level]?.[k] ?? null;
          const hi = fc.upper[level]?.[k] ?? null;
          if (lo !== null && hi !== null) inside.push([level, lo <= actual && actual <= hi]);
        }
        rows.push({
          seriesId: s.id,
          publishedIn: pack.pack.period,
          period: label,
          horizon: at - published,
          forecast,
          actual,
          error: actual - forecast,
          inside: sharedRecord(shared, inside),
        });
      });
    }
  }
  return rows;
}

/**
 * Accuracy of the published forecasts so far, per series with at least one tracked forecast:
 * running MASE = mean |error| ÷ in-sample seasonal-naive MAE of the current original series
 * (lag = periods per year; Hyndman & Koehler 2006), null when that scale is zero or cannot be
 * computed; coverage[level] = share of tracked actuals inside the published band.
 * Pure; O(rows + series length).
 */
export function summariseTracking(rows: TrackingRow[], current: PeriodDigest): TrackingSummary[] {
  const bySeries = new Map<string, TrackingRow[]>();
  for (const r of rows) {
    const mine = bySeries.get(r.seriesId);
    if (mine === undefined) bySeries.set(r.seriesId, [r]);
    else mine.push(r);
  }
  const out: TrackingSummary[] = [];
  for (const s of current.series) {
    const mine = bySeries.get(s.id);
    if (mine === undefined) continue;
    const scale = seasonalNaiveMae(Float64Array.from(s.original, (v) => v ?? NaN), current.pack.frequency);
    const mae = mine.reduce((sum, r) => sum + Math.abs(r.error), 0) / mine.length;
    const levels = [...new Set(mine.flatMap((r) => Object.keys(r.inside)))].sort((a, b) => Number(a) - Number(b));
    const coverage: Record<string, number> = {};
    for (const level of levels) {
      const judged = mine.filter((r) => level in r.inside);
      coverage[level] = judged.filter((r) => r.inside[level]).length / judged.length;
    }
    out.push({
      seriesId: s.id,
      count: mine.length,
      mase: Number.isFinite(scale) && scale > 0 ? mae / scale : null,
      coverage,
    });
  }
  return out;
}

/**
 * One frozen record per distinct set of (level, inside) pairs, shared by every row that has it. Why: a record keyed
 * by `"80"` and `"95"` is an array-like object whose element store V8 sizes past the largest key (about 1 KB each,
 * measured); a back-filled year of 10,000 series has 660,000 tracked forecasts but only a handful of distinct sets.
 */
function sharedRecord(
  shared: Map<string, Readonly<Record<string, boolean>>>,
  pairs: [string, boolean][],
): Readonly<Record<string, boolean>> {
  const key = pairs.map(([level, inside]) => `${level}:${inside ? 1 : 0}`).join(',');
  let record = shared.get(key);
  if (record === undefined) {
    record = Object.freeze(Object.fromEntries(pairs));
    shared.set(key, record);
  }
  return record;
}
