import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import type {AnalysisOptions} from '../../../src/config/plan.js';
import {adjustSeries} from '../../../src/analyse/decompose/index.js';
import type {Adjustment} from '../../../src/analyse/decompose/types.js';
import {workingDayRegressor, easterRegressor, holidayRegressor} from '../../../src/time/calendar.js';
import {daysFromCivil, isoWeekIndex, monthIndex, quarterIndex, type Frequency} from '../../../src/time/period.js';

// Sources: R's stats::stl and stats::decompose on R datasets (test/reference/stl.R → stl.json, decompose.json).
const stlRef = JSON.parse(readFileSync(new URL('../../reference/stl.json', import.meta.url), 'utf8')) as {
  cases: {name: string; data: number[]; seasonal: number[]; trend: number[]; remainder: number[]}[];
};
const decRef = JSON.parse(readFileSync(new URL('../../reference/decompose.json', import.meta.url), 'utf8')) as {
  cases: {name: string; data: number[]; trend: (number | null)[]; seasonal: number[]; random: (number | null)[]}[];
};
const stlCase = (name: string) => stlRef.cases.find((c) => c.name === name)!;
const decCase = (name: string) => decRef.cases.find((c) => c.name === name)!;

type Decomposition = AnalysisOptions['decomposition'];
const defaults: Decomposition = {
  method: 'stl',
  model: 'additive',
  seasonalWindow: 13,
  trendWindow: null,
  lowpassWindow: null,
  robust: false,
  seasonalDegree: null,
  trendDegree: null,
  lowpassDegree: null,
  innerIterations: null,
  outerIterations: null,
};
const calendarOff: AnalysisOptions['calendar'] = {workingDays: 'off', easter: 'off', holidays: []};
const calendarOn: AnalysisOptions['calendar'] = {workingDays: 'auto', easter: 'auto', holidays: []};

function run(
  values: ArrayLike<number>,
  opts: Partial<Decomposition> = {},
  extra: {frequency?: Frequency; start?: number; calendar?: AnalysisOptions['calendar']; outliers?: boolean; kind?: 'flow' | 'stock'} = {},
) {
  return adjustSeries(Float64Array.from(values), {
    frequency: extra.frequency ?? 'monthly',
    start: extra.start ?? monthIndex(2010, 1),
    kind: extra.kind ?? 'flow',
    options: {...defaults, ...opts},
    calendar: extra.calendar ?? calendarOff,
    outliers: extra.outliers ?? false,
    residualSigma: 3,
  });
}

function ok(result: ReturnType<typeof adjustSeries>): Adjustment {
  if (!result.ok) throw new Error(result.reason);
  return result.adjustment;
}

function maxRel(a: ArrayLike<number>, e: ArrayLike<number | null>, scale: number): number {
  let worst = 0;
  for (let i = 0; i < e.length; i++) {
    const x = e[i];
    if (x === null) {
      if (!Number.isNaN(a[i])) return Infinity;
      continue;
    }
    worst = Math.max(worst, Math.abs(a[i] - x) / Math.max(Math.abs(x), scale));
  }
  return worst;
}

describe('adjustSeries reproduces R when everything automatic is off', () => {
  it('additive STL = stl(co2, s.window = 35)', () => {
    const c = stlCase('co2-s35');
    const a = ok(run(c.data, {seasonalWindow: 35}, {start: monthIndex(1959, 1)}));
    expect(maxRel(a.trend, c.trend, 0.3)).toBeLessThan(1e-8);
    expect(maxRel(a.seasonal, c.seasonal, 0.3)).toBeLessThan(1e-8);
    expect(maxRel(a.irregular, c.remainder, 0.3)).toBeLessThan(1e-8);
    expect(a.calendar).toBeNull();
    expect(a.outliers).toEqual([]);
  });
  it('multiplicative STL = exp of stl(log(AirPassengers), s.window = 13, robust = TRUE)', () => {
    const c = stlCase('logAirPassengers-s13-robust');
    const a = ok(run(c.data.map(Math.exp), {seasonalWindow: 13, robust: true, model: 'multiplicative'}, {start: monthIndex(1949, 1)}));
    expect(a.model).toBe('multiplicative');
    expect(maxRel(a.trend, c.trend.map(Math.exp), 1e-3)).toBeLessThan(1e-8);
    expect(maxRel(a.seasonal, c.seasonal.map(Math.exp), 1e-3)).toBeLessThan(1e-8);
    expect(maxRel(a.irregular, c.remainder.map(Math.exp), 1e-3)).toBeLessThan(1e-8);
    // trend × seasonal × irregular = original, and adjusted = original ÷ seasonal.
    a.trend.forEach((t, i) => expect(t * a.seasonal[i] * a.irregular[i]).toBeCloseTo(Math.exp(c.data[i]), 9));
  });
  it('quarterly periodic STL = stl(nottem, "periodic") and robust UKgas', () => {
    const c = stlCase('UKgas-s11-robust');
    const a = ok(run(c.data, {seasonalWindow: 11, robust: true}, {frequency: 'quarterly', start: quarterIndex(1960, 1)}));
    expect(maxRel(a.seasonal, c.seasonal, 1)).toBeLessThan(1e-8);
    const p = stlCase('nottem-periodic');
    const b = ok(run(p.data, {seasonalWindow: 'periodic'}, {start: monthIndex(1920, 1)}));
    expect(maxRel(b.seasonal, p.seasonal, 0.06)).toBeLessThan(1e-8);
  });
  it('classical = decompose(AirPassengers, "multiplicative") and decompose(co2), adjusted defined at the ends', () => {
    const c = decCase('AirPassengers');
    const a = ok(run(c.data, {method: 'classical', model: 'multiplicative'}));
    expect(maxRel(a.trend, c.trend, 1e-3)).toBeLessThan(1e-10);
    expect(maxRel(a.seasonal, c.seasonal, 1e-3)).toBeLessThan(1e-10);
    expect(maxRel(a.irregular, c.random, 1e-3)).toBeLessThan(1e-10);
    a.adjusted.forEach((v, i) => expect(v).toBeCloseTo(c.data[i] / c.seasonal[i], 9));
    const d = decCase('co2');
    const b = ok(run(d.data, {method: 'classical'}));
    expect(maxRel(b.seasonal, d.seasonal, 0.3)).toBeLessThan(1e-10);
  });
});

describe('model choice', () => {
  it('auto picks multiplicative for AirPassengers and UKgas, additive for nottem and a constant swing', () => {
    // R datasets: AirPassengers and UKgas are the textbook multiplicative cases; nottem has a stable level.
    expect(ok(run(decCase('AirPassengers').data, {model: 'auto'})).model).toBe('multiplicative');
    expect(ok(run(decCase('UKgas').data, {model: 'auto'}, {frequency: 'quarterly'})).model).toBe('multiplicative');
    const nottem = ok(run(stlCase('nottem-periodic').data, {model: 'auto'}));
    expect(nottem.model).toBe('additive');
    expect(nottem.modelReason).toMatch(/level changes too little/);
    const swing = ok(run(Array.from({length: 120}, (_, i) => 100 + 2 * i + 10 * Math.sin((i * Math.PI) / 6) + Math.cos(i * 2.2)), {model: 'auto'}));
    expect(swing.model).toBe('additive');
    expect(swing.modelReason).toMatch(/does not grow/);
  });
  it('falls back to additive with a reason when multiplicative meets zeros or negatives', () => {
    const values = decCase('USAccDeaths').data.map((v, i) => (i === 5 ? 0 : v));
    const a = ok(run(values, {model: 'multiplicative'}));
    expect(a.model).toBe('additive');
    expect(a.modelReason).toMatch(/zero or negative/);
  });
});

describe('calendar effects', () => {
  it('recovers a known working-day and Easter effect from synthetic data', () => {
    const start = monthIndex(2005, 1);
    const n = 180;
    const wd = workingDayRegressor('monthly', start, n);
    const easter = easterRegressor('monthly', start, n);
    const pattern = [5, -3, 8, 2, -6, 4, -1, 7, -4, 3, -9, -6];
    // Small deterministic noise (a fixed sine mixture), so the regression has a residual.
    const values = Array.from({length: n}, (_, i) => 1000 + 0.5 * i + 10 * pattern[i % 12] + 12 * wd[i] + 40 * easter[i] + 2 * Math.sin(i * 1.7) + 1.5 * Math.cos(i * 2.9));
    const a = ok(run(values, {seasonalWindow: 'periodic'}, {start, calendar: calendarOn}));
    const byName = Object.fromEntries(a.calendar!.regressors.map((r) => [r.name, r]));
    expect(byName['working-days'].coefficient).toBeCloseTo(12, 0);
    expect(byName['working-days'].significant).toBe(true);
    expect(byName['working-days'].description).toMatch(/Each extra working day raises the series by about 12/);
    expect(byName['easter'].coefficient).toBeGreaterThan(35);
    expect(byName['easter'].coefficient).toBeLessThan(45);
    // The adjusted series is close to the underlying trend (the irregular here has sd ≈ 1.8).
    a.adjusted.forEach((v, i) => expect(Math.abs(v - (1000 + 0.5 * i))).toBeLessThan(8));
  });
  it('reports but does not remove an effect that is not significant', () => {
    // No working-day effect in the data: the estimate is reported, and removed only if (by chance) significant.
    const pattern = [3, -1, 4, 1, -5, 9, -2, 6, -5, 3, -5, -8];
    const values = Array.from({length: 120}, (_, i) => 500 + pattern[i % 12] + 3 * Math.sin(i * 1.3));
    const a = ok(run(values, {seasonalWindow: 'periodic'}, {calendar: {workingDays: 'auto', easter: 'off', holidays: []}}));
    const est = (a.options.calendar as {estimated: {significant: boolean; description: string; pValue: number}[]}).estimated;
    expect(est).toHaveLength(1);
    expect(a.calendar === null).toBe(!est[0].significant);
    if (!est[0].significant) expect(est[0].description).toMatch(/not significant at the 5% level/);
    expect(est[0].pValue).toBeGreaterThanOrEqual(0);
  });
  it('describes a multiplicative working-day effect in percent', () => {
    const start = monthIndex(2008, 1);
    const wd = workingDayRegressor('monthly', start, 144);
    const values = Array.from({length: 144}, (_, i) =>
      Math.exp(Math.log(2000) + 0.004 * i + 0.1 * Math.sin((Math.PI * i) / 6) + 0.013 * wd[i] + 0.004 * Math.sin(i * 2.3)),
    );
    const a = ok(run(values, {model: 'multiplicative', seasonalWindow: 'periodic'}, {start, calendar: calendarOn}));
    const working = a.calendar!.regressors.find((r) => r.name === 'working-days')!;
    expect(working.coefficient).toBeCloseTo(0.013, 2);
    expect(working.description).toMatch(/Each extra working day raises the series by about 1\.[2-4]%/);
    // original = trend × seasonal × irregular × calendar factor
    values.forEach((v, i) => expect(a.trend[i] * a.seasonal[i] * a.irregular[i] * a.calendar!.effect[i]).toBeCloseTo(v, 6));
  });
  it('recovers a holiday effect (weekday holidays on fixed dates)', () => {
    const start = monthIndex(2010, 1);
    const years = Array.from({length: 12}, (_, k) => 2010 + k);
    const dates = years.flatMap((y) => [`${y}-12-25`, `${y}-12-26`, `${y}-01-01`, `${y}-05-01`]);
    const days = dates.map((d) => daysFromCivil(Number(d.slice(0, 4)), Number(d.slice(5, 7)), Number(d.slice(8))));
    const h = holidayRegressor('monthly', start, 144, days);
    const pattern = [5, -3, 8, 2, -6, 4, -1, 7, -4, 3, -9, -6];
    const values = Array.from({length: 144}, (_, i) => 800 + i + 10 * pattern[i % 12] - 30 * h[i] + 2 * Math.sin(i * 2.1));
    const a = ok(run(values, {seasonalWindow: 'periodic'}, {start, calendar: {workingDays: 'off', easter: 'off', holidays: dates}}));
    const holiday = a.calendar!.regressors.find((r) => r.name === 'holidays')!;
    expect(holiday.coefficient).toBeCloseTo(-30, 0);
    expect(holiday.significant).toBe(true);
    expect(holiday.description).toMatch(/^Each holiday on a weekday lowers the series by about (29|30)\.\d\.$/);
  });
  it('skips working days for stock series', () => {
    const values = decCase('USAccDeaths').data;
    const a = ok(run(values, {}, {kind: 'stock', calendar: calendarOn}));
    expect((a.options.calendar as {regressors: string[]}).regressors).toEqual([]);
  });
});

describe('missing values, outliers, edge cases', () => {
  it('fills gaps for estimation, flags them, and leaves adjusted NaN there', () => {
    const values = decCase('USAccDeaths').data.slice();
    values[10] = NaN;
    values[30] = NaN;
    values[31] = NaN;
    const a = ok(run(values, {robust: true}));
    expect(a.filled.filter(Boolean).length).toBe(3);
    expect([a.adjusted[10], a.adjusted[30], a.adjusted[31]].every(Number.isNaN)).toBe(true);
    expect(Number.isFinite(a.trend[30])).toBe(true);
    expect(a.adjusted.filter((v) => Number.isNaN(v)).length).toBe(3);
  });
  it('finds an additive outlier and a level shift (robust STL)', () => {
    const pattern = [3, -1, 4, 1, -5, 9, -2, 6, -5, 3, -5, -8];
    const values = Array.from({length: 96}, (_, i) => 100 + pattern[i % 12] + 0.3 * Math.sin(i * 2.1) + (i >= 60 ? 15 : 0));
    values[30] += 12;
    const a = ok(run(values, {robust: true, seasonalWindow: 'periodic'}, {outliers: true}));
    expect(a.outliers.find((o) => o.index === 30)?.kind).toBe('additive');
    expect(a.outliers.find((o) => o.index === 60)?.kind).toBe('level-shift');
    // The spike does not leak into the seasonal: seasonal at the spike's month stays near the true pattern.
    expect(Math.abs(a.seasonal[30] - pattern[30 % 12])).toBeLessThan(1);
    expect(ok(run(values, {robust: true}, {outliers: false})).outliers).toEqual([]);
  });
  it('takes a level shift out before decomposing again and gives it to the trend-cycle, so its neighbours are no one-offs', () => {
    // A takeover: the level steps up 40% in month 40 of 60; multiplicative season, robust STL with the pack defaults.
    const values = Array.from({length: 60}, (_, i) => (i < 40 ? 1000 : 1400) * (1 + 0.1 * Math.sin((i / 12) * 2 * Math.PI)) + 3 * Math.sin(i * 5));
    const a = ok(run(values, {robust: true, model: 'multiplicative'}, {outliers: true}));
    expect(a.outliers.map((o) => [o.index, o.kind])).toEqual([[40, 'level-shift']]);
    const removed = (a.options.outliers as {levelShiftsRemoved: {index: number; size: number}[]}).levelShiftsRemoved;
    expect(removed).toHaveLength(1);
    expect(removed[0].index).toBe(40);
    expect(removed[0].size).toBeCloseTo(Math.log(1.4), 2);
    // The trend-cycle carries the jump, and the seasonal factors stay those of the pattern on both sides of it.
    expect(a.trend[40] / a.trend[39]).toBeGreaterThan(1.35);
    for (const i of [34, 39, 40, 46]) expect(a.seasonal[i]).toBeCloseTo(1 + 0.1 * Math.sin((i / 12) * 2 * Math.PI), 2);
    // Without the outlier rules nothing is taken out.
    expect(ok(run(values, {robust: true, model: 'multiplicative'}, {outliers: false})).options.outliers).toMatchObject({levelShiftsRemoved: []});
  });
  it('gives a plain reason for too-short series and never throws on odd input', () => {
    for (const values of [[], [1], [1, 2], [1, 2, 3], new Array(24).fill(1).map((_, i) => i)]) {
      const r = run(values);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(['tooShortToAdjust', 'noValues']).toContain(r.reason.code);
    }
    expect(run(new Array(40).fill(NaN)).ok).toBe(false);
    const constant = ok(run(new Array(48).fill(7)));
    expect(constant.adjusted.every((v) => v === 7)).toBe(true);
    expect(constant.modelReason).toMatch(/constant/);
    for (const scale of [1e-200, 1e200]) {
      const r = ok(run(decCase('USAccDeaths').data.map((v) => v * scale), {model: 'auto'}));
      r.adjusted.forEach((v) => expect(Number.isFinite(v)).toBe(true));
    }
    const holes = decCase('USAccDeaths').data.map((v, i) => (i % 3 === 0 ? NaN : v));
    expect(() => run(holes)).not.toThrow();
  });
  it('components add up (additive) or multiply (multiplicative) to the data, property', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({min: 1, max: 1000, noNaN: true}), {minLength: 40, maxLength: 80}),
        fc.constantFrom('additive' as const, 'multiplicative' as const),
        fc.boolean(),
        (raw, model, robust) => {
          const a = ok(run(raw, {model, robust, seasonalWindow: 7}, {outliers: true}));
          raw.forEach((v, i) => {
            const back = model === 'additive' ? a.trend[i] + a.seasonal[i] + a.irregular[i] : a.trend[i] * a.seasonal[i] * a.irregular[i];
            expect(back).toBeCloseTo(v, 6);
          });
        },
      ),
      {numRuns: 30, seed: 7},
    );
  });
  it('a pure seasonal pattern plus a constant is adjusted to that constant (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({min: -50, max: 50, noNaN: true}), {minLength: 4, maxLength: 4}), fc.double({min: 100, max: 1e4, noNaN: true}), (raw, level) => {
        const mean = raw.reduce((x, y) => x + y, 0) / 4;
        const values = Array.from({length: 40}, (_, i) => level + raw[i % 4] - mean);
        const a = ok(run(values, {seasonalWindow: 'periodic'}, {frequency: 'quarterly', start: quarterIndex(2000, 1)}));
        a.adjusted.forEach((v) => expect(v).toBeCloseTo(level, 6));
      }),
      {numRuns: 30, seed: 3},
    );
  });
});

describe('weekly and diagnostics', () => {
  it('adjusts a weekly series with 53-week years and removes a yearly pattern', () => {
    const start = isoWeekIndex(2015, 1);
    const n = 5 * 52 + 10;
    const values = Array.from({length: n}, (_, i) => 200 + 0.1 * i + 20 * Math.sin((2 * Math.PI * (i * 7)) / 365.2425) + Math.sin(i * 2.3));
    const a = ok(run(values, {}, {frequency: 'weekly', start}));
    expect(a.modelReason).toMatch(/Weekly series/);
    a.adjusted.slice(30, n - 30).forEach((v, i) => expect(Math.abs(v - (200 + 0.1 * (i + 30)))).toBeLessThan(3));
    expect(run(values.slice(0, 100), {}, {frequency: 'weekly', start}).ok).toBe(false);
  });
  it('reports variance shares, residual seasonality, stability and revisions', () => {
    const a = ok(run(decCase('USAccDeaths').data, {robust: true}));
    const s = a.diagnostics.varianceShares;
    expect(s.trend + s.seasonal + s.irregular).toBeCloseTo(1, 12);
    expect(a.diagnostics.residualSeasonality.test).toMatch(/F-test/);
    expect(a.diagnostics.residualSeasonality.detected).toBe(false);
    expect(a.diagnostics.revision?.periodsTested).toBeGreaterThan(0);
    expect(a.diagnostics.revision!.meanAbsPp).toBeGreaterThanOrEqual(0);
    // The original series is strongly seasonal: the same test flags it.
    const raw = ok(run(decCase('USAccDeaths').data, {seasonalWindow: 'periodic'}));
    expect(raw.diagnostics.seasonalStability).toBe(0);
  });
});
