import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {stlSeasonalAdjustment} from '../../../src/analyse/forecast/stlSeasonalAdjustment.js';

// Fixture: test/reference/stl.json from test/reference/stl.R — R's stats::stl(log(AirPassengers), s.window = 13,
// robust = TRUE) (Box & Jenkins airline passengers 1949–1960, in R's datasets; R version inside the JSON).
const ref = JSON.parse(readFileSync(new URL('../../reference/stl.json', import.meta.url), 'utf8'));
const air = ref.cases.find((c: {name: string}) => c.name === 'logAirPassengers-s13-robust');
const relErr = (a: number, b: number): number => Math.abs(a - b) / Math.max(1, Math.abs(b));

describe('stlSeasonalAdjustment', () => {
  it('divides a positive series by exp of R’s robust STL seasonal of its logs, and repeats the last year ahead', () => {
    const y = Float64Array.from(air.data as number[], Math.exp);
    const sa = stlSeasonalAdjustment(y, 12);
    expect(sa.kind).toBe('multiplicative');
    y.forEach((v, t) => expect(relErr(sa.adjusted[t], v / Math.exp(air.seasonal[t]))).toBeLessThan(1e-8));
    const ahead = sa.ahead(15);
    for (let i = 0; i < 15; i++) expect(relErr(ahead[i], Math.exp(air.seasonal[144 - 12 + (i % 12)]))).toBeLessThan(1e-8);
    // Restoring the last year's adjusted values gives the last year's data back.
    const back = sa.restore(sa.adjusted.subarray(132));
    for (let i = 0; i < 12; i++) expect(relErr(back[i], y[132 + i])).toBeLessThan(1e-12);
  });

  it('is additive for a series with zero or negative values, and restores the data exactly', () => {
    const y = Float64Array.from({length: 60}, (_, t) => 10 * Math.sin((2 * Math.PI * t) / 12) + 0.1 * t - 2);
    const sa = stlSeasonalAdjustment(y, 12);
    expect(sa.kind).toBe('additive');
    const seasonal = sa.ahead(12);
    const back = sa.restore(sa.adjusted.subarray(48));
    for (let i = 0; i < 12; i++) expect(back[i]).toBeCloseTo(y[48 + i], 12);
    expect(Math.max(...seasonal) - Math.min(...seasonal)).toBeGreaterThan(15);
  });

  it('leaves a series alone when the seasonality test finds no pattern or there are two years or less', () => {
    const trend = Float64Array.from({length: 48}, (_, t) => 100 + t + ((t * 7919) % 5) / 10);
    expect(stlSeasonalAdjustment(trend, 12).kind).toBe('none');
    const short = Float64Array.from({length: 24}, (_, t) => 100 + 10 * Math.sin((2 * Math.PI * t) / 12));
    expect(stlSeasonalAdjustment(short, 12).kind).toBe('none');
  });
});
