import {describe, expect, it} from 'vitest';
import {computeChanges} from '../../src/analyse/changes.js';
import {monthIndex, quarterIndex} from '../../src/time/period.js';

// Hand-checked arithmetic on small series; every expected figure is worked out in the comment beside it.
describe('computeChanges', () => {
  const start = monthIndex(2024, 1);
  // Jan 2024 .. Oct 2025: 22 months, value = 100 + month number (1..22); October 2025 is 122.
  const original = Float64Array.from({length: 22}, (_, i) => 100 + i + 1);
  const adjusted = Float64Array.from(original);
  const trend = Float64Array.from(original);

  it('computes year-on-year, period-on-period and trend changes for the latest period', () => {
    const c = computeChanges({frequency: 'monthly', start, original, adjusted, trend, kind: 'flow', fiscalYearStart: 1});
    // Oct 2025 = 122, Oct 2024 = 110: 122/110 − 1 = 10.909…%
    expect(c.yearOnYear).toBeCloseTo((122 / 110 - 1) * 100, 12);
    // Sep 2025 = 121: 122/121 − 1
    expect(c.periodOnPeriodAdjusted).toBeCloseTo((122 / 121 - 1) * 100, 12);
    expect(c.periodOnPeriodAnnualised).toBeCloseTo(((122 / 121) ** 12 - 1) * 100, 10);
    expect(c.trend).toBeCloseTo((122 / 121 - 1) * 100, 12);
    expect(c.trendDirection).toBe('rising');
    // Calendar-year YTD: Jan–Oct 2025 = 113..122 (sum 1175) vs Jan–Oct 2024 = 101..110 (sum 1055)
    expect(c.yearToDate).toBeCloseTo((1175 / 1055 - 1) * 100, 12);
    expect(c.yearOnYearSeries.slice(0, 12).every(Number.isNaN)).toBe(true);
  });

  it('uses the fiscal year for year-to-date', () => {
    // Fiscal year from April: Apr–Oct 2025 = 116..122 (sum 833) vs Apr–Oct 2024 = 104..110 (sum 749)
    const c = computeChanges({frequency: 'monthly', start, original, adjusted, trend, kind: 'flow', fiscalYearStart: 4});
    expect(c.yearToDate).toBeCloseTo((833 / 749 - 1) * 100, 12);
    // Stocks compare averages over the same spans: the ratio is the same here because both spans have 7 months
    const s = computeChanges({frequency: 'monthly', start, original, adjusted, trend, kind: 'stock', fiscalYearStart: 4});
    expect(s.yearToDate).toBeCloseTo((833 / 7 / (749 / 7) - 1) * 100, 12);
  });

  it('returns NaN for changes over a missing or non-positive base, and a flat trend for a constant', () => {
    const q = quarterIndex(2020, 1);
    const values = Float64Array.from([0, 5, 5, 5, 5, 5, NaN, 5]);
    const c = computeChanges({frequency: 'quarterly', start: q, original: values, adjusted: values, trend: Float64Array.from([5, 5, 5, 5, 5, 5, 5, 5]), kind: 'flow', fiscalYearStart: 1});
    expect(c.yearOnYear).toBeCloseTo(0, 12); // 2021Q4 = 5 vs 2020Q4 = 5
    expect(Number.isNaN(c.periodOnPeriodAdjusted)).toBe(true); // previous quarter missing
    expect(c.yearOnYearSeries[4]).toBeNaN(); // base 0
    expect(c.trendDirection).toBe('flat');
  });
});
