import {describe, expect, it} from 'vitest';
import {narrate, PACK_CALLOUTS_PER_SERIES} from '../../src/narrate/narrate.js';
import type {SeriesAnalysis} from '../../src/analyse/types.js';
import type {SeriesPlan} from '../../src/config/plan.js';
import {cycleOf, makeAdjustment, makeAnalysis, makeChanges, makePlan, makeSeriesPlan, OCT_2026} from './fixtures.js';

function seriesWith(id: string, label: string, outliers: number): {plan: SeriesPlan; analysis: SeriesAnalysis} {
  const n = 36;
  const original = cycleOf([1900, 1950, 2000], n);
  const adjusted = original.map((_, i) => 1000 * Math.pow(1.003, i));
  const irregular = new Array<number>(n).fill(1);
  const adjustment = makeAdjustment(n, {
    adjusted,
    trend: adjusted,
    irregular,
    outliers: Array.from({length: outliers}, (_, k) => ({index: 30 + k, kind: 'additive' as const, score: 3.5 + k})),
  });
  return {
    plan: makeSeriesPlan({id, label}),
    analysis: makeAnalysis(original, {
      id,
      adjustment,
      changes: makeChanges({yearOnYear: (2000 / 2000 - 1) * 100, yearOnYearSeries: new Array<number>(n).fill(0)}),
    }),
  };
}

describe('narrate', () => {
  const input = () => ({
    plan: makePlan(),
    period: OCT_2026,
    series: [
      seriesWith('net-sales', 'Net sales', 5),
      seriesWith('footfall', 'Shop footfall', 1),
      {...seriesWith('sales-budget', 'Sales budget', 2), plan: makeSeriesPlan({id: 'sales-budget', hidden: true})},
    ],
    history: null,
  });

  it('ranks each series’ callouts and skips hidden series', () => {
    const {bySeries} = narrate(input());
    expect([...bySeries.keys()]).toEqual(['net-sales', 'footfall']);
    const ranks = bySeries.get('net-sales')!.map((c) => c.rank);
    expect(ranks).toEqual([...ranks].sort((a, b) => b - a));
    expect(bySeries.get('net-sales')![0]).toMatchObject({
      id: 'net-sales/large-residual/2026-09',
      rule: 'large-residual',
      severity: 'alert',
      seriesId: 'net-sales',
      chart: 'chart-net-sales-irregular',
    });
  });

  it('caps any one series in the pack-level list', () => {
    const {pack} = narrate(input());
    const fromSales = pack.filter((c) => c.seriesId === 'net-sales');
    expect(fromSales).toHaveLength(PACK_CALLOUTS_PER_SERIES);
    expect(pack.some((c) => c.seriesId === 'footfall')).toBe(true);
    const ranks = pack.map((c) => c.rank);
    expect(ranks).toEqual([...ranks].sort((a, b) => b - a));
  });

  it('is deterministic: the same input gives the same callouts, in the same order', () => {
    const a = narrate(input());
    const b = narrate(input());
    expect(b.pack).toEqual(a.pack);
    expect([...b.bySeries.entries()]).toEqual([...a.bySeries.entries()]);
    expect(new Set(a.pack.map((c) => c.id)).size).toBe(a.pack.length);
  });

  it('breaks rank ties by series order in the pack', () => {
    // Two series with identical analyses: every callout ties, so net-sales (first in the pack) leads.
    const same = input();
    same.series[1] = {...seriesWith('footfall', 'Shop footfall', 5)};
    const {pack} = narrate(same);
    expect(pack.map((c) => c.seriesId)).toEqual(['net-sales', 'footfall', 'net-sales', 'footfall', 'net-sales', 'footfall']);
    for (let i = 0; i < pack.length; i += 2) {
      expect(pack[i + 1].id.replace('footfall/', '')).toBe(pack[i].id.replace('net-sales/', ''));
    }
  });
});
