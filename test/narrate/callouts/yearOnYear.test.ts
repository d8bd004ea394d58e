import {describe, expect, it} from 'vitest';
import {yearOnYearRule} from '../../../src/narrate/callouts/yearOnYear.js';
import {cycleOf, makeAnalysis, makeChanges, runRule} from '../fixtures.js';

// 36 months to October 2026; October 2025 = 1925, October 2026 = 2025 (+5.19%).
function sales(yoyHistory: number[]) {
  const original = cycleOf([1900, 1950, 2000], 36);
  original[23] = 1925;
  original[35] = 2025;
  const yoySeries = [...new Array<number>(12).fill(NaN), ...cycleOf(yoyHistory, 23), (2025 / 1925 - 1) * 100];
  return makeAnalysis(original, {changes: makeChanges({yearOnYear: (2025 / 1925 - 1) * 100, yearOnYearSeries: yoySeries})});
}

describe('year-on-year rule', () => {
  it('states the latest value and its change on a year earlier', () => {
    const [d] = runRule(yearOnYearRule, sales([3, 4, 5, 6, 7]));
    expect(d.text).toBe('Net sales came to 2,025 EUR k in October 2026, +5.2% on October 2025.');
    expect(d.severity).toBe('info');
    expect(d.figures.change).toBeCloseTo(5.194805, 5);
    expect(d.chart).toBe('chart-net-sales-yoy');
  });

  it('flags a move far outside the usual year-on-year range', () => {
    // History 0.5, 1, 1.5 → median 1, MAD 0.5, z = (5.19 − 1) / (1.4826 × 0.5) ≈ 5.66 ≥ 3 → alert.
    const [d] = runRule(yearOnYearRule, sales([0.5, 1, 1.5]));
    expect(d.severity).toBe('alert');
    expect(d.figures.z).toBeCloseTo((5.194805 - 1) / (1.4826 * 0.5), 4);
    expect(d.text).toBe(
      'Net sales came to 2,025 EUR k in October 2026, +5.2% on October 2025. That is an unusually large move for this series.',
    );
  });

  it('states changes of a rate in percentage points, not percent', () => {
    const original = cycleOf([5.5, 5.7, 5.6], 24);
    original[11] = 5.6;
    original[23] = 5.2;
    const [d] = runRule(yearOnYearRule, makeAnalysis(original, {changes: makeChanges({yearOnYear: -7.142857})}), {
      series: {id: 'returns-rate', label: 'Returns rate', unit: '%', kind: 'stock'},
    });
    expect(d.text).toBe('Returns rate stood at 5.2% in October 2026, -0.4 pp on October 2025.');
    expect(d.figures.change).toBeCloseTo(-0.4, 10);
  });

  it('follows the pack locale (de-DE)', () => {
    const [d] = runRule(yearOnYearRule, sales([3, 4, 5, 6, 7]), {plan: {locale: 'de-DE'}});
    expect(d.text).toBe('Net sales für Oktober 2026: 2.025 EUR k, +5,2\u00a0% gegenüber Oktober 2025.');
  });

  it('says nothing when either value is missing', () => {
    const a = sales([3, 4, 5]);
    a.original[23] = NaN;
    expect(runRule(yearOnYearRule, a)).toEqual([]);
  });
});
