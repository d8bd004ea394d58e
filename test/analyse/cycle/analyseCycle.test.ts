import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {analyseCycle} from '../../../src/analyse/cycle/index.js';
import {hodrickPrescott} from '../../../src/analyse/cycle/hodrickPrescott.js';
import {reference, type ReferenceSeries} from './reference.js';

const hp = reference<{cases: {series: ReferenceSeries; trend: number[]; lambda: number}[]}>('hp.json');
const quarterlyHp = {frequency: 'quarterly' as const, options: {method: 'hp' as const, lambda: null}};
const monthlyBandpass = {frequency: 'monthly' as const, options: {method: 'bandpass' as const, lambda: null}};

describe('analyseCycle', () => {
  // US real GDP, FRED via statsmodels.datasets.macrodata; HP trend confirmed with statsmodels hpfilter (hp.json).
  const gdp = Float64Array.from(hp.cases[0].series.values);

  it('uses λ = 1600 for quarterly data and reproduces the reference trend and gap', () => {
    const r = analyseCycle(gdp, quarterlyHp);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const {cycle} = r;
    expect(cycle.options.lambda).toBe(1600);
    cycle.trend.forEach((v, t) => expect(Math.abs(v - hp.cases[0].trend[t])).toBeLessThan(1e-8 * hp.cases[0].trend[t]));
    const last = gdp.length - 1;
    expect(cycle.gap[last]).toBeCloseTo((100 * (gdp[last] - cycle.trend[last])) / cycle.trend[last], 12);
    // 2009Q3: GDP far below trend after the 2008–09 recession, and rising from 2009Q2.
    expect(cycle.phase).toBe('rising-below');
    expect(cycle.phaseLabel).toBe('below trend and recovering');
    expect(cycle.turningPointBasis).toBe('gap');
    expect(cycle.turningPoints.at(-1)).toEqual({index: last - 1, type: 'trough', provisional: true});
    expect(cycle.periodsSinceTurn).toBe(1);
    expect(cycle.stationarity?.level.stationary).toBe(false);
    expect(cycle.realTime?.start).toBe(gdp.length - 8);
    expect(cycle.realTime?.trend.at(-1)).toBeCloseTo(cycle.trend[last], 6);
    expect(cycle.caution).toEqual({code: 'endPoint', values: {count: expect.any(Number)}});
  });

  it('fills missing values for filtering, notes it and keeps the gap missing there', () => {
    const holed = Float64Array.from(gdp);
    holed[50] = NaN;
    holed[51] = NaN;
    const r = analyseCycle(holed, quarterlyHp);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.cycle.gap[50]).toBeNaN();
    expect(Number.isFinite(r.cycle.trend[50])).toBe(true);
    expect(r.cycle.notes).toEqual([{code: 'cycleFilled', values: {count: 2}}]);
  });

  it('uses the Christiano-Fitzgerald band 18–96 months for monthly band-pass and trend = series − cycle', () => {
    // elnino: monthly sea surface temperature, NOAA via statsmodels.datasets.elnino.
    const elnino = Float64Array.from(hp.cases[2].series.values);
    const r = analyseCycle(elnino, monthlyBandpass);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.cycle.options.band).toEqual({low: 18, high: 96, drift: true});
    expect(r.cycle.realTime).toBeUndefined();
    expect(r.cycle.turningPoints.every((t) => t.index >= 6 && t.index <= elnino.length - 7)).toBe(true);
  });

  it('gives a stated reason for empty, all-missing and too-short series', () => {
    const tooShort = {ok: false, reason: {code: 'cycleTooShort', values: {}}};
    expect(analyseCycle(new Float64Array(0), quarterlyHp)).toEqual(tooShort);
    expect(analyseCycle(Float64Array.of(1, 2), quarterlyHp)).toEqual(tooShort);
    expect(analyseCycle(Float64Array.of(NaN, NaN, NaN, NaN), quarterlyHp)).toEqual({
      ok: false,
      reason: {code: 'cycleNotFinite', values: {}},
    });
  });

  it('treats a constant or straight-line series as on trend, without throwing', () => {
    for (const x of [new Float64Array(40).fill(5), Float64Array.from({length: 40}, (_, t) => 10 + t)]) {
      const r = analyseCycle(x, quarterlyHp);
      expect(r.ok).toBe(true);
      if (!r.ok) continue;
      expect(r.cycle.direction).toBe('flat');
      expect(r.cycle.phaseLabel).toBe('on trend, no cycle to speak of');
      expect(r.cycle.turningPoints).toEqual([]);
      expect(r.cycle.stationarity).toBeNull();
    }
  });

  it('never throws on arbitrary input with NaN runs, at every frequency and method', () => {
    const value = fc.oneof(fc.double({min: -1e6, max: 1e6, noNaN: true}), fc.constant(NaN));
    fc.assert(
      fc.property(
        fc.array(value, {maxLength: 120}),
        fc.constantFrom('monthly', 'quarterly', 'weekly'),
        fc.constantFrom('hp', 'bandpass'),
        (xs, frequency, method) => {
          const r = analyseCycle(Float64Array.from(xs), {
            frequency: frequency as 'monthly',
            options: {method: method as 'hp', lambda: null},
          });
          if (r.ok) expect(r.cycle.trend.length).toBe(xs.length);
          else expect(r.reason.code).toMatch(/^cycle(TooShort|NotFinite)$/);
        },
      ),
      {numRuns: 200},
    );
  });

  it('dates weekly growth cycles with the scaled rule and tests stationarity of a wave', () => {
    // Invented series: a 120-week wave around a gentle rise, plus a fast wiggle.
    const wave = Float64Array.from({length: 260}, (_, t) => 100 + 5 * Math.sin((2 * Math.PI * t) / 120) + 0.05 * t);
    const x = wave.map((v, t) => v + Math.sin(t * 1.3));
    const r = analyseCycle(x, {frequency: 'weekly', options: {method: 'hp', lambda: null}});
    if (!r.ok) throw new Error(r.reason.code);
    expect(r.cycle.options.lambda).toBe(1600 * 13 ** 4);
    // Crests of the wave at weeks 30 and 150, troughs at 90 and 210; the HP gap moves them by a few weeks.
    const dated = r.cycle.turningPoints.map((t) => t.index);
    [30, 90, 150, 210].forEach((expected, i) => expect(Math.abs(dated[i] - expected)).toBeLessThanOrEqual(5));
    expect(r.cycle.stationarity).not.toBeNull();
    expect(r.cycle.realTime?.gap.length).toBe(52);
  });

  it('honours an explicit λ', () => {
    const r = analyseCycle(gdp, {...quarterlyHp, options: {method: 'hp', lambda: 100}});
    if (!r.ok) throw new Error(r.reason.code);
    expect(r.cycle.trend[100]).toBeCloseTo(hodrickPrescott(gdp, {lambda: 100})[100], 9);
  });
});
