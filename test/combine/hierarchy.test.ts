import {readFileSync} from 'node:fs';
import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {contributions} from '../../src/combine/contributions.js';
import {indirectTotal, largestDifference} from '../../src/combine/indirectAdjustment.js';
import {partsGap} from '../../src/combine/partsGap.js';
import {evaluateFormula, parseFormula, ratioOfSums, ratioParts} from '../../src/derive/formulas/index.js';

// R's datasets ldeaths = mdeaths + fdeaths (Diggle 1990, table A.3), figures by base R in test/reference/hierarchy.R.
const ref = JSON.parse(readFileSync(new URL('../reference/hierarchy.json', import.meta.url), 'utf8'));
const arr = (x: (number | null)[]) => Float64Array.from(x, (v) => (v === null ? NaN : v));
const [m, f, l] = [arr(ref.mdeaths), arr(ref.fdeaths), arr(ref.ldeaths)];
const series: Record<string, Float64Array> = {mdeaths: m, fdeaths: f, ldeaths: l};
const within = (ours: ArrayLike<number>, theirs: (number | null)[], tol = 1e-10) => {
  expect(ours.length).toBe(theirs.length);
  for (let i = 0; i < theirs.length; i++) {
    const t = theirs[i];
    if (t === null) expect(ours[i]).toBeNaN();
    else expect(Math.abs(ours[i] - t)).toBeLessThanOrEqual(tol * Math.max(1, Math.abs(t)));
  }
};

describe('a public hierarchy: ldeaths = mdeaths + fdeaths (R datasets)', () => {
  it('formulas: sum() and a difference reproduce the total and a part exactly', () => {
    within(evaluateFormula(parseFormula('sum(mdeaths, fdeaths)'), (id) => series[id], 72).values, ref.ldeaths, 0);
    within(evaluateFormula(parseFormula('ldeaths - fdeaths'), (id) => series[id], 72).values, ref.mdeaths, 0);
    expect(partsGap(l, [m, f])).toBeNull();
  });
  it('a ratio formula matches R, and its year-to-date and quarterly figures are ratios of sums (1e-10)', () => {
    const share = parseFormula('100 * mdeaths / ldeaths');
    within(evaluateFormula(share, (id) => series[id], 72).values, ref.share);
    const {numerator, denominator} = ratioParts(share)!;
    const num = evaluateFormula(numerator, (id) => series[id], 72).values;
    const den = evaluateFormula(denominator, (id) => series[id], 72).values;
    within(
      Array.from({length: 72}, (_, t) => ratioOfSums(num, den, t - (t % 12), t)),
      ref.ytdShare,
    );
    within(
      Array.from({length: 24}, (_, q) => ratioOfSums(num, den, 3 * q, 3 * q + 2)),
      ref.quarterShare,
    );
    // The mean of the monthly ratios is a different figure (R's aggregate(share, 4, mean)).
    expect(Math.abs(ref.quarterMeanOfMonthly[0] - ref.quarterShare[0])).toBeGreaterThan(1e-3);
  });
  it('contributions to the year-on-year change match R and add up to the total change (1e-10)', () => {
    const c = contributions(l, [m, f], 12);
    within(c.total, ref.yoy.total);
    within(c.parts[0], ref.yoy.male);
    within(c.parts[1], ref.yoy.female);
  });
  it('contributions to the adjusted month-on-month change on stl-adjusted parts match R (1e-10)', () => {
    const parts = [Float64Array.from(ref.adjusted.male), Float64Array.from(ref.adjusted.female)];
    const c = contributions(indirectTotal(parts, 72), parts, 1);
    within(c.total, ref.pop.total);
    within(c.parts[0], ref.pop.male);
    within(c.parts[1], ref.pop.female);
  });
});

describe('contributions', () => {
  it('add up to the total change whenever the parts add up to the total (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.array(fc.double({min: 1, max: 1e6, noNaN: true}), {minLength: 6, maxLength: 6}), {
          minLength: 1,
          maxLength: 6,
        }),
        fc.integer({min: 1, max: 4}),
        (rows, lag) => {
          const parts = rows.map((r) => Float64Array.from(r));
          const total = indirectTotal(parts, 6);
          const c = contributions(total, parts, lag);
          for (let t = lag; t < 6; t++) {
            const sum = c.parts.reduce((a, p) => a + p[t], 0);
            expect(Math.abs(sum - c.total[t])).toBeLessThan(1e-9 * Math.max(1, Math.abs(c.total[t])));
          }
        },
      ),
      {seed: 5, numRuns: 200},
    );
  });
  it('is NaN where the base is missing or not positive', () => {
    const c = contributions(Float64Array.of(0, 5, NaN, 4), [Float64Array.of(0, 5, NaN, 4)], 1);
    expect(Array.from(c.total)).toEqual([NaN, NaN, NaN, NaN]);
  });
});

describe('partsGap and largestDifference', () => {
  it('finds the largest gap between a total and its parts', () => {
    const g = partsGap(Float64Array.of(10, 20, 31, NaN), [Float64Array.of(4, 10, 15, 1), Float64Array.of(6, 9, 14, 2)]);
    expect(g).toEqual({index: 2, gap: 2, percent: 200 / 31, periods: 2});
  });
  it('finds the largest relative difference between direct and indirect totals', () => {
    expect(largestDifference(Float64Array.of(100, 200, NaN), Float64Array.of(101, 190, 5))).toEqual({
      index: 1,
      percent: 5,
      difference: -10,
    });
  });
});
