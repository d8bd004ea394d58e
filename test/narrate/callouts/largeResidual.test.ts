import {describe, expect, it} from 'vitest';
import {largeResidualRule} from '../../../src/narrate/callouts/largeResidual.js';
import {makeAdjustment, makeAnalysis, runRule} from '../fixtures.js';

describe('large-residual rule', () => {
  it('reports each outlier of the last two years with its size in robust sigmas', () => {
    const n = 36;
    const irregular = new Array<number>(n).fill(1);
    irregular[23] = 1.123;
    irregular[35] = 0.95;
    const adjustment = makeAdjustment(n, {
      irregular,
      outliers: [
        {index: 5, kind: 'additive', score: 5}, // 30 months ago: too old
        {index: 23, kind: 'additive', score: 4.1},
        {index: 30, kind: 'level-shift', score: 3.6},
        {index: 35, kind: 'temporary', score: -3.2},
      ],
    });
    const drafts = runRule(largeResidualRule, makeAnalysis(new Array<number>(n).fill(100), {adjustment}));
    expect(drafts.map((d) => d.text)).toEqual([
      'October 2025 stands out for Net sales: 4.1 robust sigmas above what trend and season explain, a one-off of about +12.3%.',
      'Net sales shifted up to a new level in May 2026 (3.6 robust sigmas).',
      'October 2026 stands out for Net sales: 3.2 robust sigmas below what trend and season explain, a temporary change of about -5.0%.',
    ]);
    // Current (last 3 months) → alert; older and below 2 × threshold → watch.
    expect(drafts.map((d) => d.severity)).toEqual(['watch', 'watch', 'alert']);
    expect(drafts.map((d) => d.chart)).toEqual(new Array(3).fill('chart-net-sales-irregular'));
  });

  it('gives additive sizes in the unit, and in percentage points for rates', () => {
    const irregular = new Array<number>(24).fill(0);
    irregular[20] = 3.5;
    const adjustment = makeAdjustment(24, {model: 'additive', irregular, outliers: [{index: 20, kind: 'additive', score: 7}]});
    const [d] = runRule(largeResidualRule, makeAnalysis(new Array<number>(24).fill(6), {adjustment}), {
      series: {label: 'Returns rate', unit: '%'},
    });
    expect(d.text).toBe(
      'July 2026 stands out for Returns rate: 7.0 robust sigmas above what trend and season explain, a one-off of about +3.5 pp.',
    );
    expect(d.severity).toBe('alert'); // 7 ≥ 2 × 3
  });
});
