import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {PeriodStore} from '../../src/ingest/periodStore.js';
import type {Stamp} from '../../src/time/stamp.js';

const DAY = 86_400_000;
/** A daily stamp in period `period` at day `day` (the period index is given directly: the store does not care). */
const dayIn = (period: number, day: number): Stamp => ({period, at: day * DAY, from: day, to: day, grain: 'day'});
const label = (period: number): Stamp => ({period, at: period * 30 * DAY, from: period * 30, to: period * 30 + 29, grain: 'month'});

describe('PeriodStore', () => {
  it('keeps one summary per period in any order, with the lines of the first two rows', () => {
    const s = new PeriodStore();
    s.add(label(100), 1, 2);
    s.add(label(90), 2, 3);
    expect(s.outOfOrderLine).toBe(3);
    s.add(label(130), 3, 4);
    s.add(label(100), 9, 5);
    expect(s.at(100)).toMatchObject({rows: 2, values: 2, sum: 10, first: 1, last: 9, line: 2, secondLine: 5});
    expect([s.at(90).sum, s.at(130).sum, s.at(95).sum, s.at(-5).rows]).toEqual([2, 3, NaN, 0]);
    expect(s.range()).toEqual({first: 90, last: 130});
    expect(s.repeated()).toEqual([100]);
    // Two labels of one period are a repeat, not finer rows.
    expect(s.finer).toBe(false);
  });

  it('a missing value counts as a row but not as a value', () => {
    const s = new PeriodStore();
    s.add(label(5), NaN, 2);
    s.add(label(6), 1, 3);
    s.add(label(7), NaN, 4);
    expect(s.range()).toEqual({first: 6, last: 6});
    expect(s.range('rows')).toEqual({first: 5, last: 7});
    expect(s.at(5)).toMatchObject({rows: 1, values: 0, sum: NaN});
    expect(new PeriodStore().range()).toBeUndefined();
  });

  it('rows on two days of one period are finer; first and last follow time, not file order', () => {
    const s = new PeriodStore();
    s.add(dayIn(1, 40), 5, 2);
    s.add(dayIn(1, 35), 7, 3);
    s.add(dayIn(1, 45), 1, 4);
    expect(s.finer).toBe(true);
    expect(s.at(1)).toMatchObject({first: 7, last: 1, min: 1, max: 7, sum: 13, rows: 3});
  });

  it('matches sums, extremes, first and last of a plain reference for random rows (property)', () => {
    const row = fc.tuple(fc.integer({min: -50, max: 50}), fc.integer({min: 0, max: 9}), fc.double({noNaN: true, min: -1e6, max: 1e6}));
    fc.assert(
      fc.property(fc.array(row, {maxLength: 200}), (rows) => {
        const s = new PeriodStore();
        const ref = new Map<number, {day: number; v: number}[]>();
        rows.forEach(([p, d, v], i) => {
          s.add(dayIn(p, p * 10 + d), v, i + 2);
          ref.set(p, [...(ref.get(p) ?? []), {day: d, v}]);
        });
        for (const [p, list] of ref) {
          const got = s.at(p);
          const values = list.map((r) => r.v);
          expect(got.rows).toBe(list.length);
          expect(got.sum).toBeCloseTo(values.reduce((a, b) => a + b, 0), 6);
          expect(got.min).toBe(Math.min(...values));
          expect(got.max).toBe(Math.max(...values));
          const earliest = Math.min(...list.map((r) => r.day));
          const latest = Math.max(...list.map((r) => r.day));
          expect(got.first).toBe(list.find((r) => r.day === earliest)!.v);
          expect(got.last).toBe(list.filter((r) => r.day === latest).at(-1)!.v);
        }
        const keys = [...ref.keys()];
        expect(s.range()).toEqual(keys.length ? {first: Math.min(...keys), last: Math.max(...keys)} : undefined);
      }),
    );
  });
});
