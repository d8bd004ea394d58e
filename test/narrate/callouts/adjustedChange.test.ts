import {describe, expect, it} from 'vitest';
import {adjustedChangeRule} from '../../../src/narrate/callouts/adjustedChange.js';
import {makeAdjustment, makeAnalysis, makeChanges, runRule} from '../fixtures.js';

function withAdjusted(adjusted: number[], annualised: number) {
  return makeAnalysis(adjusted, {
    adjustment: makeAdjustment(adjusted.length, {adjusted}),
    changes: makeChanges({periodOnPeriodAnnualised: annualised}),
  });
}

describe('adjusted-change rule', () => {
  it('states the seasonally adjusted change with its annualised rate', () => {
    // Alternating ±1% history: the latest +1.2% is ordinary.
    const adjusted = Array.from({length: 24}, (_, i) => 2000 * (i % 2 ? 1.01 : 1));
    adjusted[22] = 2001;
    adjusted[23] = 2025;
    const annualised = (Math.pow(2025 / 2001, 12) - 1) * 100;
    const [d] = runRule(adjustedChangeRule, withAdjusted(adjusted, annualised));
    expect(d.text).toBe('Seasonally adjusted, Net sales rose 1.2% in October 2026 from September 2026 (+15.4% annualised).');
    expect(d.figures.change).toBeCloseTo((2025 / 2001 - 1) * 100, 10);
    expect(d.chart).toBe('chart-net-sales-overview');
  });

  it('says "fell" with an unsigned size, and percentage points for rates', () => {
    const adjusted = Array.from({length: 24}, (_, i) => 6 + (i % 2) * 0.1);
    adjusted[22] = 6.0;
    adjusted[23] = 5.7;
    const [d] = runRule(adjustedChangeRule, withAdjusted(adjusted, NaN), {
      series: {label: 'Returns rate', unit: '%'},
    });
    // History of ±0.1 pp steps → MAD 0.1; −0.3 pp is z ≈ −2.0 → watch.
    expect(d.text).toBe(
      'Seasonally adjusted, Returns rate fell 0.3 pp in October 2026 from September 2026. That is an unusually large move for this series.',
    );
    expect(d.severity).toBe('watch');
  });

  it('needs an adjustment', () => {
    expect(runRule(adjustedChangeRule, makeAnalysis([1, 2, 3]))).toEqual([]);
  });
});
