import {readFileSync} from 'node:fs';
import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {forecastSeries} from '../../../src/analyse/forecast/index.js';
import {prepareSeries} from '../../../src/analyse/forecast/prepareSeries.js';

// Real data: R's AirPassengers and austres, taken from test/reference/ets.json (written by test/reference/ets.R).
const ref = JSON.parse(readFileSync(new URL('../../reference/ets.json', import.meta.url), 'utf8'));
const air = Float64Array.from(ref.auto.find((c: {name: string}) => c.name === 'AirPassengers').values);
const austres = Float64Array.from(ref.auto.find((c: {name: string}) => c.name === 'austres').values);
type Method = 'auto' | 'ets' | 'theta' | 'arima' | 'seasonal-naive' | 'combination';
const opts = (over: Partial<{method: Method; horizon: number; levels: number[]; backtestOrigins: number}> = {}) => ({
  method: 'auto' as const,
  horizon: 12,
  levels: [80, 95],
  backtestOrigins: 0,
  ...over,
});

function expectWellFormed(r: ReturnType<typeof forecastSeries>, h: number): void {
  expect(r.mean).toHaveLength(h);
  for (const v of r.mean) expect(Number.isFinite(v)).toBe(true);
  for (let i = 0; i < h; i++) {
    // Nested intervals: 95 contains 80 contains the mean.
    expect(r.lower['95'][i]).toBeLessThanOrEqual(r.lower['80'][i] + 1e-9);
    expect(r.lower['80'][i]).toBeLessThanOrEqual(r.mean[i] + 1e-9);
    expect(r.upper['80'][i]).toBeGreaterThanOrEqual(r.mean[i] - 1e-9);
    expect(r.upper['95'][i]).toBeGreaterThanOrEqual(r.upper['80'][i] - 1e-9);
  }
}

describe('forecastSeries', () => {
  it('forecasts AirPassengers with every method, finite and nested intervals', () => {
    for (const method of ['auto', 'ets', 'theta', 'seasonal-naive', 'combination'] as const) {
      const r = forecastSeries(air, {frequency: 'monthly', options: opts({method})});
      expectWellFormed(r, 12);
      expect(r.startOffset).toBe(air.length);
    }
    expect(forecastSeries(air, {frequency: 'monthly', options: opts({method: 'ets'})}).method).toBe('ETS(M,Ad,M)');
  });

  it('widens the ETS intervals with the horizon (non-seasonal series, austres ETS(M,Ad,A) aside: use Theta)', () => {
    const r = forecastSeries(austres, {frequency: 'quarterly', options: opts({method: 'theta', horizon: 8})});
    const width = (i: number) => r.upper['95'][i] - r.lower['95'][i];
    for (let i = 1; i < 8; i++) expect(width(i)).toBeGreaterThan(width(i - 1));
  });

  it('back-tests from rolling origins with benchmarks and one-step points', () => {
    const r = forecastSeries(air, {frequency: 'monthly', options: opts({method: 'theta', backtestOrigins: 6})});
    const b = r.backtest!;
    expect(b.origins).toBe(6);
    expect(b.horizon).toBe(6);
    expect(b.points.map((p) => p.offset)).toEqual([138, 139, 140, 141, 142, 143]);
    expect(b.mase).toBeGreaterThan(0);
    expect(b.smape).toBeGreaterThan(0);
    expect(b.benchmarks.map((x) => x.method)).toEqual(['Seasonal naive', 'Naive2']);
  });

  it('forecasts auto as Akaike-weighted ETS, Theta and ARIMA on STL-adjusted data and back-tests it', () => {
    const r = forecastSeries(air, {frequency: 'monthly', options: opts({backtestOrigins: 6})});
    // R's ets picks ETS(M,Ad,M) for AirPassengers (test/reference/ets.json); it carries most of the weight.
    expect(r.method).toMatch(
      /^Combination \(ETS \(\d+ models, Akaike-weighted\), Theta on STL-adjusted data, ARIMA\(\d,[01],\d\) with drift on STL-adjusted data\)$/,
    );
    expect(r.options.weights).toEqual([0.45, 0.45, 0.1]);
    // AirPassengers trends: the KPSS test asks for a difference.
    expect((r.options.arima as {order: number[]}).order[1]).toBe(1);
    const models = (r.options.ets as {models: {model: string; weight: number}[]}).models;
    expect(models[0].model).toBe('ETS(M,Ad,M)');
    expect(models.reduce((a, m) => a + m.weight, 0)).toBeCloseTo(1, 12);
    for (const m of models) expect(m.weight).toBeGreaterThanOrEqual(0.01);
    expect(r.backtest!.points).toHaveLength(6);
    expect(Number.isFinite(r.backtest!.mase)).toBe(true);
  });

  it('forecasts with ARIMA on STL-adjusted data, intervals nested, running totals given', () => {
    const r = forecastSeries(air, {frequency: 'monthly', options: opts({method: 'arima', backtestOrigins: 3})});
    expect(r.method).toMatch(/^ARIMA\(\d,1,\d\) with drift on STL-adjusted data$/);
    expectWellFormed(r, 12);
    expect(r.runningTotals!.upper['95'][11]).toBeGreaterThan(r.mean.reduce((a, b) => a + b, 0));
    expect(r.backtest!.points).toHaveLength(3);
  });

  it('forecasts a constant series as the constant, without error', () => {
    const flat = new Float64Array(40).fill(3.5);
    const r = forecastSeries(flat, {frequency: 'monthly', options: opts({backtestOrigins: 6})});
    expect(r.method).toBe('Constant');
    expect(r.mean).toEqual(new Array(12).fill(3.5));
    expect(r.upper['95']).toEqual(new Array(12).fill(3.5));
    expect(r.backtest).toBeNull();
  });

  it('trims NaN at both ends, fills interior gaps with a note, and still starts after the array', () => {
    const v = Float64Array.from([NaN, ...air.slice(0, 60), NaN, NaN]);
    v[20] = NaN;
    const r = forecastSeries(v, {frequency: 'monthly', options: opts({method: 'theta'})});
    expect(r.startOffset).toBe(v.length);
    expect(r.mean).toHaveLength(12);
    expect(r.notes).toContainEqual({code: 'forecastFilled', values: {count: 1}});
    expectWellFormed(r, 12);
  });

  it('falls back for short series: naive under four values, no seasonal models under two years', () => {
    const tiny = forecastSeries(Float64Array.of(3, 4, 5), {frequency: 'monthly', options: opts()});
    expect(tiny.method).toBe('Naive');
    expect(tiny.notes.map((n) => n.code)).toContain('forecastFewValues');
    const short = forecastSeries(air.slice(0, 20), {frequency: 'monthly', options: opts({method: 'ets'})});
    expect(short.method).toMatch(/^ETS\([AM],(N|A|Ad),N\)$/);
    expect(short.notes.map((n) => n.code)).toContain('noSeasonalModels');
  });

  it('handles weekly data through seasonal adjustment and says so', () => {
    // Invented weekly series: trend, a yearly wave and a deterministic wobble.
    const weeks = Float64Array.from(
      {length: 160},
      (_, t) => 100 + 0.1 * t + 10 * Math.sin((2 * Math.PI * t) / 52) + ((t * 7919) % 13) / 3,
    );
    const r = forecastSeries(weeks, {frequency: 'weekly', options: opts({method: 'auto', horizon: 13})});
    expectWellFormed(r, 13);
    expect(r.notes.map((n) => n.code)).toContain('weeklyEts');
  });

  it('property: any finite series gives finite, nested forecasts (no NaN out)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({min: -1e4, max: 1e4, noNaN: true}), {minLength: 1, maxLength: 40}),
        fc.constantFrom<Method>('auto', 'ets', 'theta', 'arima', 'seasonal-naive'),
        (values, method) => {
          const options = opts({method, horizon: 5});
          const r = forecastSeries(Float64Array.from(values), {frequency: 'quarterly', options});
          expectWellFormed(r, 5);
        },
      ),
      {numRuns: 40},
    );
  });

  it('rejects an all-NaN series', () => {
    const empty = Float64Array.of(NaN, NaN);
    expect(() => forecastSeries(empty, {frequency: 'monthly', options: opts()})).toThrow(/at least one value/);
  });
});

describe('prepareSeries', () => {
  it('trims leading and trailing NaN and fills interior gaps linearly', () => {
    const r = prepareSeries(Float64Array.of(NaN, 1, NaN, 3, NaN));
    expect([...r.values]).toEqual([1, 2, 3]);
    expect(r.first).toBe(1);
    expect(r.filled).toBe(1);
    expect(prepareSeries(Float64Array.of(NaN)).values).toHaveLength(0);
  });
});

describe('forecastSeries running totals', () => {
  it('gives running-total intervals for auto, ETS and Theta, nested around the cumulative mean', () => {
    for (const method of ['auto', 'ets', 'theta'] as const) {
      const r = forecastSeries(air, {frequency: 'monthly', options: opts({method})});
      const t = r.runningTotals!;
      let cum = 0;
      r.mean.forEach((m, k) => {
        cum += m;
        expect(t.lower['95'][k]).toBeLessThan(t.lower['80'][k]);
        expect(t.lower['80'][k]).toBeLessThan(cum);
        expect(t.upper['80'][k]).toBeGreaterThan(cum);
        expect(t.upper['95'][k]).toBeGreaterThan(t.upper['80'][k]);
      });
    }
    const naive = forecastSeries(air, {frequency: 'monthly', options: opts({method: 'seasonal-naive'})});
    expect(naive.runningTotals).toBeUndefined();
  });

  it('leaves them out when not asked for, with the same forecast and back-test', () => {
    for (const method of ['auto', 'theta'] as const) {
      const full = forecastSeries(air, {frequency: 'monthly', options: opts({method})});
      const bare = forecastSeries(air, {frequency: 'monthly', options: opts({method}), runningTotals: false});
      expect(bare.runningTotals).toBeUndefined();
      const {runningTotals: _, ...rest} = full;
      expect(bare).toEqual(rest);
    }
  });
});
