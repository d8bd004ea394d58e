import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {nextOdd, resolveStlOptions, stl} from '../../../src/analyse/decompose/stl.js';

interface StlCase {
  name: string;
  call: string;
  frequency: number;
  data: number[];
  win: {s: number; t: number; l: number};
  deg: {s: number; t: number; l: number};
  jump: {s: number; t: number; l: number};
  inner: number;
  outer: number;
  periodic: boolean;
  seasonal: number[];
  trend: number[];
  remainder: number[];
  weights: number[];
}

// Source: R's stats::stl on R's built-in datasets; the calls are in test/reference/stl.R and in each case's `call`.
const reference = JSON.parse(readFileSync(new URL('../../reference/stl.json', import.meta.url), 'utf8')) as {
  r: string;
  cases: StlCase[];
};

export function maxRelativeError(actual: ArrayLike<number>, expected: ArrayLike<number>, scale: number): number {
  let worst = 0;
  for (let i = 0; i < expected.length; i++) {
    worst = Math.max(worst, Math.abs(actual[i] - expected[i]) / Math.max(Math.abs(expected[i]), scale));
  }
  return worst;
}

function optionsOf(c: StlCase) {
  return {
    period: c.frequency,
    seasonalWindow: c.periodic ? ('periodic' as const) : c.win.s,
    seasonalDegree: c.deg.s as 0 | 1,
    trendWindow: c.win.t,
    trendDegree: c.deg.t as 0 | 1,
    lowpassWindow: c.win.l,
    lowpassDegree: c.deg.l as 0 | 1,
    seasonalJump: c.jump.s,
    trendJump: c.jump.t,
    lowpassJump: c.jump.l,
    inner: c.inner,
    outer: c.outer,
  };
}

describe('stl against R stats::stl', () => {
  it('records the R version', () => expect(reference.r).toMatch(/^R version 4/));
  for (const c of reference.cases) {
    it(`${c.name}: ${c.call}`, () => {
      const fit = stl(Float64Array.from(c.data), optionsOf(c));
      // Relative to max(|value|, 1e-3 × data scale) so components near zero are compared on the data's scale.
      const scale = 1e-3 * Math.max(...c.data.map(Math.abs));
      expect(maxRelativeError(fit.seasonal, c.seasonal, scale)).toBeLessThan(1e-8);
      expect(maxRelativeError(fit.trend, c.trend, scale)).toBeLessThan(1e-8);
      expect(maxRelativeError(fit.remainder, c.remainder, scale)).toBeLessThan(1e-8);
      expect(maxRelativeError(fit.weights, c.weights, 1e-3)).toBeLessThan(1e-8);
    });
  }
  it('resolves the default rules as R does (windows, jumps, passes)', () => {
    for (const c of reference.cases.filter((c) => !c.call.includes('t.window') && !c.call.includes('s.degree'))) {
      const robust = c.call.includes('robust = TRUE');
      const o = resolveStlOptions(c.data.length, {
        period: c.frequency,
        seasonalWindow: c.periodic ? 'periodic' : c.win.s,
        robust,
      });
      expect([o.seasonalWindow, o.trendWindow, o.lowpassWindow]).toEqual([c.win.s, c.win.t, c.win.l]);
      expect([o.seasonalJump, o.trendJump, o.lowpassJump]).toEqual([c.jump.s, c.jump.t, c.jump.l]);
      expect([o.inner, o.outer]).toEqual([c.inner, c.outer]);
    }
  });
});

describe('stl', () => {
  it('gives the same result whatever series it decomposed before (its work arrays are shared)', () => {
    const series = [600, 241, 49].map((n) =>
      Float64Array.from({length: n}, (_, t) => 100 + 0.1 * t + 10 * Math.sin((2 * Math.PI * t) / 12) + ((t * 7) % 5)),
    );
    const run = (x: Float64Array) => stl(x, {period: 12, seasonalWindow: 7, robust: true});
    const longFirst = series.map(run);
    const shortFirst = [...series].reverse().map(run).reverse();
    longFirst.forEach((f, i) => {
      expect(Array.from(f.trend)).toEqual(Array.from(shortFirst[i].trend));
      expect(Array.from(f.seasonal)).toEqual(Array.from(shortFirst[i].seasonal));
    });
  });

  it('nextOdd rounds then makes odd, like R', () => {
    expect([nextOdd(12), nextOdd(13), nextOdd(4.4), nextOdd(4.6)]).toEqual([13, 13, 5, 5]);
  });
  it('rejects short series, bad periods and NaN', () => {
    expect(() => stl(new Float64Array(24), {period: 12, seasonalWindow: 7})).toThrow(/more than two full periods/);
    expect(() => stl(new Float64Array(30), {period: 1, seasonalWindow: 7})).toThrow(/invalid period/);
    expect(() => stl(Float64Array.of(...new Array(30).fill(1), NaN), {period: 4, seasonalWindow: 7})).toThrow(/finite/);
  });
  it('components add up to the data and a periodic seasonal repeats exactly (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({min: 2, max: 12}),
        fc.integer({min: 3, max: 8}),
        fc.array(fc.double({min: -1e3, max: 1e3, noNaN: true}), {minLength: 120, maxLength: 120}),
        fc.boolean(),
        (period, years, raw, robust) => {
          const values = Float64Array.from(raw.slice(0, period * years + 1));
          const fit = stl(values, {period, seasonalWindow: 'periodic', robust});
          for (let i = 0; i < values.length; i++) {
            expect(fit.seasonal[i] + fit.trend[i] + fit.remainder[i]).toBeCloseTo(values[i], 8);
            if (i >= period) expect(fit.seasonal[i]).toBe(fit.seasonal[i - period]);
          }
        },
      ),
      {numRuns: 40, seed: 1},
    );
  });
  it('a pure seasonal pattern plus a constant has that constant as trend and no remainder', () => {
    const pattern = [3, -1, 4, 1, -5, 9, -2, 6, -5, 3, -5, -8];
    const values = Float64Array.from({length: 96}, (_, i) => 100 + pattern[i % 12]);
    const fit = stl(values, {period: 12, seasonalWindow: 'periodic'});
    for (let i = 0; i < 96; i++) {
      expect(fit.trend[i]).toBeCloseTo(100, 9);
      expect(fit.seasonal[i]).toBeCloseTo(pattern[i % 12], 9);
    }
  });
});
