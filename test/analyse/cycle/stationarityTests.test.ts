import {describe, expect, it} from 'vitest';
import {augmentedDickeyFuller} from '../../../src/analyse/cycle/augmentedDickeyFuller.js';
import {kpss} from '../../../src/analyse/cycle/kpss.js';
import {mackinnonCritical, mackinnonPValue} from '../../../src/analyse/cycle/mackinnon.js';
import {stationarity} from '../../../src/analyse/cycle/stationarity.js';
import {varianceRatio} from '../../../src/analyse/cycle/varianceRatio.js';
import {reference, type ReferenceSeries} from './reference.js';

interface AdfCase {
  series: ReferenceSeries;
  differenced: boolean;
  call: string;
  adf: {statistic: number; pValue: number; lags: number; nobs: number; critical: Record<'1%' | '5%' | '10%', number>};
  kpss: {statistic: number; pValue: number; lags: number};
}
const adf = reference<{cases: AdfCase[]}>('adf.json');

function input(c: AdfCase): Float64Array {
  const x = Float64Array.from(c.series.values);
  return c.differenced ? x.slice(1).map((v, t) => v - x[t]) : x;
}

describe('augmentedDickeyFuller', () => {
  // Confirmed with statsmodels 0.13.5: adfuller(x, regression='c', autolag='AIC') (calls in adf.json). Data:
  // macrodata log real GDP and inflation (FRED via statsmodels), elnino (NOAA via statsmodels), levels and differences.
  for (const c of adf.cases) {
    it(`matches ${c.call.split(';')[0]}`, () => {
      const r = augmentedDickeyFuller(input(c));
      expect(r.lags).toBe(c.adf.lags);
      expect(r.nobs).toBe(c.adf.nobs);
      expect(Math.abs(r.statistic - c.adf.statistic)).toBeLessThan(1e-6);
      expect(r.pValue < 0.05).toBe(c.adf.pValue < 0.05);
      expect(Math.abs(r.pValue - c.adf.pValue)).toBeLessThan(1e-9 + 1e-6 * c.adf.pValue);
      for (const level of ['1%', '5%', '10%'] as const) {
        expect(r.critical[level]).toBeCloseTo(c.adf.critical[level], 10);
      }
    });
  }

  it('rejects short, NaN and constant input by message', () => {
    expect(() => augmentedDickeyFuller(Float64Array.of(1, 2, 3))).toThrow(/too short/);
    expect(() => augmentedDickeyFuller(Float64Array.of(1, 2, 3, NaN, 5, 6, 7, 8, 9))).toThrow(/rejects NaN/);
    expect(() => augmentedDickeyFuller(new Float64Array(30).fill(4))).toThrow(/singular/);
  });
});

describe('mackinnon tables', () => {
  // MacKinnon (2010), Table 2, constant, N = 1: asymptotic critical values −3.43035, −2.86154, −2.56677.
  it('gives the asymptotic critical values and p ≈ 0.05 at the 5 % value', () => {
    expect(mackinnonCritical(Infinity)).toEqual({'1%': -3.43035, '5%': -2.86154, '10%': -2.56677});
    expect(mackinnonPValue(-2.86154)).toBeCloseTo(0.05, 2);
    expect(mackinnonPValue(-30)).toBe(0);
    expect(mackinnonPValue(3)).toBe(1);
  });
});

describe('kpss', () => {
  // Confirmed with statsmodels 0.13.5: kpss(x, regression='c', nlags='auto') (adf.json). The p-value is the
  // interpolated table value of Kwiatkowski et al. (1992), clipped to 0.01–0.10 as statsmodels does.
  for (const c of adf.cases) {
    it(`matches kpss on ${c.differenced ? 'diff ' : ''}${c.series.name}`, () => {
      const r = kpss(input(c));
      expect(r.lags).toBe(c.kpss.lags);
      expect(Math.abs(r.statistic - c.kpss.statistic)).toBeLessThan(1e-6 * Math.max(1, c.kpss.statistic));
      expect(r.pValue).toBeCloseTo(c.kpss.pValue, 12);
    });
  }

  it('rejects short and constant input by message', () => {
    expect(() => kpss(Float64Array.of(1, 2))).toThrow(/too short/);
    expect(() => kpss(new Float64Array(20).fill(1))).toThrow(/varying series/);
  });
});

describe('varianceRatio', () => {
  it('is near 1 with a large p for equal spreads, and small p when the spread triples', () => {
    const n = 90;
    const wave = (t: number): number => Math.sin(t * 1.7) + Math.cos(t * 0.9);
    const steady = varianceRatio(Float64Array.from({length: n}, (_, t) => wave(t)));
    expect(steady.pValue).toBeGreaterThan(0.05);
    const growing = varianceRatio(Float64Array.from({length: n}, (_, t) => wave(t) * (t < 45 ? 1 : 3)));
    expect(growing.statistic).toBeGreaterThan(5);
    expect(growing.pValue).toBeLessThan(0.001);
    expect(growing.df1).toBe(29);
  });

  it('skips NaN and rejects short or constant input by message', () => {
    expect(() => varianceRatio(Float64Array.of(1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11))).toThrow(/too short/);
    expect(() => varianceRatio(new Float64Array(30).fill(2))).toThrow(/varying series/);
    const withGaps = Float64Array.from({length: 40}, (_, t) => (t % 7 === 0 ? NaN : Math.sin(t)));
    expect(Number.isFinite(varianceRatio(withGaps).pValue)).toBe(true);
  });
});

describe('stationarity', () => {
  // Log real GDP (FRED via statsmodels macrodata): statsmodels finds a unit root in the level (ADF p = 0.38)
  // and none in the differences (p < 1e-9); the summary must say so.
  const gdp = adf.cases.find((c) => c.series.name === 'loggdp' && !c.differenced)!;
  it('says log real GDP is stationary in mean only after differencing', () => {
    const r = stationarity(Float64Array.from(gdp.series.values));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.result.level.stationary).toBe(false);
    expect(r.result.differences.stationary).toBe(true);
    expect(r.result.kpss?.level.stationary).toBe(false);
    expect(r.result.summary).toMatch(/^stationary in mean after differencing/);
  });

  it('gives a reason instead of throwing for short or constant series', () => {
    expect(stationarity(Float64Array.of(1, 2, 3))).toEqual({ok: false, reason: 'series too short for the ADF test'});
    expect(stationarity(new Float64Array(40).fill(1)).ok).toBe(false);
  });
});
