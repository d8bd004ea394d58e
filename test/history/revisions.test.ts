import {describe, expect, it} from 'vitest';
import {revisions} from '../../src/history/revisions.js';
import {digestOfReport, report} from '../archive/fixtures/report.js';
import {hand, quarters} from './digests.js';

const periods = quarters(9); // 2024-Q1 … 2026-Q1
const original = [10, 12, 14, 11, 12, 14, 16, 13, 15];
const adjusted = [12, 12.5, 13, 13.2, 13.5, 14, 14.6, 15, 15.2];

describe('revisions', () => {
  it('finds a data revision when an old original changed, an estimate one when only the adjusted moved', () => {
    const previous = hand('2026-Q1', 4, [
      {periods, original, adjusted, trendDirection: 'rising', phase: 'rising-above'},
    ]);
    const now = [...original];
    now[7] = 13.5; // 2025-Q4: 13 → 13.5 in the CSV
    const nowAdjusted = [...adjusted, 15.6];
    nowAdjusted[6] = 14.7; // 2025-Q3: same original 16, adjusted 14.6 → 14.7
    nowAdjusted[7] = 15.4;
    const current = hand('2026-Q2', 4, [
      {
        periods: quarters(10),
        original: [...now, 17],
        adjusted: nowAdjusted,
        trendDirection: 'flat',
        phase: 'rising-above',
      },
    ]);
    const rows = revisions(previous, current, 1);
    expect(rows).toHaveLength(3);
    expect(rows[0]).toEqual({
      seriesId: 'orders',
      period: '2025-Q3',
      kind: 'estimate',
      measure: 'adjusted',
      previous: 14.6,
      current: 14.7,
      revisionPct: expect.closeTo(((14.7 - 14.6) / 14.6) * 100, 12), // 0.6849…% ≤ 1% → not large
      large: false,
    });
    // (13.5 − 13) / 13 × 100 = 3.8461…% > 1% → large
    expect(rows[1]).toEqual({
      seriesId: 'orders',
      period: '2025-Q4',
      kind: 'data',
      measure: 'original',
      previous: 13,
      current: 13.5,
      revisionPct: expect.closeTo(3.846153846153846, 12),
      large: true,
    });
    // The trend call changed (rising → flat); the cycle phase did not.
    expect(rows[2]).toEqual({
      seriesId: 'orders',
      period: '2026-Q2',
      kind: 'estimate',
      measure: 'trend-direction',
      previous: 'rising',
      current: 'flat',
      revisionPct: null,
      large: true,
    });
  });

  it('reports values that arrived late or were withdrawn as data revisions with no percentage', () => {
    const previous = hand('2026-Q1', 4, [{periods, original: [null, ...original.slice(1)]}]);
    const current = hand('2026-Q1', 4, [{periods, original: [10, ...original.slice(1, 8), null]}]);
    const rows = revisions(previous, current, 1);
    expect(rows.map((r) => [r.period, r.kind, r.previous, r.current, r.revisionPct, r.large])).toEqual([
      ['2024-Q1', 'data', 'missing', 10, null, true],
      ['2026-Q1', 'data', 15, 'missing', null, true],
    ]);
  });

  it('compares only the previous pack’s last 12 periods and series present in both', () => {
    const prev = digestOfReport(report(2026, 9, [{id: 'net-sales'}, {id: 'gone'}]));
    const cur = digestOfReport(report(2026, 9, [{id: 'net-sales'}, {id: 'new-line'}]));
    const s = cur.series[0];
    s.original[0] = 1; // 2022-10: outside the last 12 periods of the previous pack
    s.original[40] = 1; // 2026-02: inside
    const rows = revisions(prev, cur, 1);
    expect(rows.map((r) => [r.seriesId, r.period, r.kind])).toEqual([['net-sales', '2026-02', 'data']]);
  });

  it('ignores floating-point noise in the adjusted figures and reports nothing for identical packs', () => {
    const a = hand('2026-Q1', 4, [{periods, original, adjusted}]);
    const b = hand('2026-Q1', 4, [{periods, original, adjusted: adjusted.map((x) => x * (1 + 1e-13))}]);
    expect(revisions(a, b, 1)).toEqual([]);
    expect(revisions(a, a, 1)).toEqual([]);
  });
});
