import {describe, expect, it} from 'vitest';
import {summariseTracking, trackForecasts} from '../../src/history/tracking.js';
import {buildHistory} from '../../src/history/history.js';
import {hand, quarters} from './digests.js';

// Current pack 2026-Q2: ten quarters 2024-Q1 … 2026-Q2.
const current = hand('2026-Q2', 4, [{periods: quarters(10), original: [10, 12, 14, 11, 12, 14, 16, 13, 15, 17]}]);
// Published in 2025-Q4: 2026-Q1 … Q3.
const packA = hand('2025-Q4', 4, [
  {
    periods: quarters(8),
    original: [10, 12, 14, 11, 12, 14, 16, 13],
    forecast: {
      periods: ['2026-Q1', '2026-Q2', '2026-Q3'],
      mean: [14, 18, 20],
      lower: {'80': [13, 17, 19], '95': [12, 16.5, 18]},
      upper: {'80': [15, 19, 21], '95': [16, 19.5, 22]},
    },
  },
]);
// Published in 2026-Q1: 2026-Q2 … Q3.
const packB = hand('2026-Q1', 4, [
  {
    periods: quarters(9),
    original: [10, 12, 14, 11, 12, 14, 16, 13, 15],
    forecast: {
      periods: ['2026-Q2', '2026-Q3'],
      mean: [19.5, 21],
      lower: {'80': [18.5, 20], '95': [16.5, 19]},
      upper: {'80': [20.5, 22], '95': [21.5, 23]},
    },
  },
]);

const row = (
  publishedIn: string,
  period: string,
  horizon: number,
  forecast: number,
  actual: number,
  error: number,
  inside: Record<string, boolean>,
) => ({seriesId: 'orders', publishedIn, period, horizon, forecast, actual, error, inside});

describe('forecast tracking (hand-checked)', () => {
  it('sets every published forecast whose actual is known against it', () => {
    // Actuals: 2026-Q1 = 15, 2026-Q2 = 17; 2026-Q3 not yet known, so skipped.
    // A, 2026-Q1: h = 1, error = 15 − 14 = 1;   80%: 13 ≤ 15 ≤ 15 inside (bounds inclusive); 95%: inside.
    // A, 2026-Q2: h = 2, error = 17 − 18 = −1;  80%: 17 ≤ 17 ≤ 19 inside; 95%: inside.
    // B, 2026-Q2: h = 1, error = 17 − 19.5 = −2.5; 80%: 18.5 > 17 outside; 95%: 16.5 ≤ 17 ≤ 21.5 inside.
    const rows = trackForecasts([packB, packA], current);
    expect(rows).toEqual([
      row('2025-Q4', '2026-Q1', 1, 14, 15, 1, {'80': true, '95': true}),
      row('2025-Q4', '2026-Q2', 2, 18, 17, -1, {'80': true, '95': true}),
      row('2026-Q1', '2026-Q2', 1, 19.5, 17, -2.5, {'80': false, '95': true}),
    ]);
  });

  it('computes the running MASE and coverage', () => {
    // Scale: seasonal naive (lag 4) MAE of the current original:
    //   |12−10| + |14−12| + |16−14| + |13−11| + |15−12| + |17−14| = 2+2+2+2+3+3 = 14 over 6 pairs = 7/3.
    // mean |error| = (1 + 1 + 2.5) / 3 = 1.5; MASE = 1.5 / (7/3) = 9/14 = 0.642857…
    // coverage 80% = 2/3, 95% = 3/3.
    const summary = summariseTracking(trackForecasts([packA, packB], current), current);
    expect(summary).toEqual([
      {seriesId: 'orders', count: 3, mase: expect.closeTo(9 / 14, 14), coverage: {'80': 2 / 3, '95': 1}},
    ]);
  });

  it('skips missing forecasts and actuals, other frequencies, and series with nothing to track', () => {
    const gap = hand('2026-Q2', 4, [
      {periods: quarters(10), original: [10, 12, 14, 11, 12, 14, 16, 13, null, 17]},
      {id: 'headcount', periods: quarters(10), original: new Array(10).fill(5)},
    ]);
    const monthly = {...packA, pack: {...packA.pack, frequency: 12 as const}};
    const rows = trackForecasts([packA, monthly], gap);
    expect(rows.map((r) => r.period)).toEqual(['2026-Q2']);
    expect(summariseTracking(rows, gap).map((s) => s.seriesId)).toEqual(['orders']);
  });

  it('gives a null MASE when the seasonal naive scale is zero', () => {
    const flat = hand('2026-Q2', 4, [{periods: quarters(10), original: new Array(10).fill(15)}]);
    const [s] = summariseTracking(trackForecasts([packA], flat), flat);
    expect(s.mase).toBeNull();
    expect(s.count).toBe(2);
  });

  it('buildHistory names the previous pack and joins revisions and tracking', () => {
    const h = buildHistory(packB, [packA, packB], current, 1);
    expect(h.previousPeriod).toBe('2026-Q1');
    expect(h.tracking).toHaveLength(3);
    expect(h.trackingSummary).toHaveLength(1);
    expect(h.revisions).toEqual([]);
  });
});
