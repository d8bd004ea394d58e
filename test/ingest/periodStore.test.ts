import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {PeriodStore} from '../../src/ingest/periodStore.js';

describe('PeriodStore', () => {
  it('keeps values by period in any order and reports the first line of a duplicate', () => {
    const s = new PeriodStore();
    expect(s.set(100, 1, 2)).toBe(0);
    expect(s.set(90, 2, 3)).toBe(0);
    expect(s.outOfOrderLine).toBe(3);
    expect(s.set(130, 3, 4)).toBe(0);
    expect(s.set(100, 9, 5)).toBe(2);
    expect([s.get(90), s.get(100), s.get(130), s.get(95), s.get(-5)]).toEqual([2, 1, 3, NaN, NaN]);
    expect(s.dataRange()).toEqual({first: 90, last: 130});
  });

  it('a missing value holds its period (duplicates still caught) but not the data range', () => {
    const s = new PeriodStore();
    s.set(5, NaN, 2);
    s.set(6, 1, 3);
    s.set(7, NaN, 4);
    expect(s.set(5, 1, 9)).toBe(2);
    expect(s.dataRange()).toEqual({first: 6, last: 6});
    expect(new PeriodStore().dataRange()).toBeUndefined();
  });

  it('matches a plain map for random insertions (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({min: -500, max: 500}), fc.double({noNaN: true}))), (rows) => {
        const s = new PeriodStore();
        const ref = new Map<number, number>();
        rows.forEach(([p, v], i) => {
          const before = s.set(p, v, i + 2);
          expect(before !== 0).toBe(ref.has(p));
          if (!ref.has(p)) ref.set(p, v);
        });
        for (const [p, v] of ref) expect(s.get(p)).toBe(v);
        const keys = [...ref.keys()];
        expect(s.dataRange()).toEqual(keys.length ? {first: Math.min(...keys), last: Math.max(...keys)} : undefined);
      }),
    );
  });
});
