import {describe, expect, it} from 'vitest';
import {dataQualityRule} from '../../../src/narrate/callouts/dataQuality.js';
import {makeAdjustment, makeAnalysis, runRule} from '../fixtures.js';

describe('data rule', () => {
  it('lists one missing value in the singular', () => {
    const original = new Array<number>(40).fill(100);
    const tooShort = {code: 'tooShortToAdjust', values: {minimum: 25, observed: 20, frequency: 'monthly'}} as const;
    original[10] = NaN;
    const filled = original.map((v) => !Number.isFinite(v));
    const drafts = runRule(dataQualityRule, makeAnalysis(original, {adjustment: makeAdjustment(40, {filled})}));
    expect(drafts.map((d) => d.text)).toEqual([
      '1 value of Net sales is missing (May 2024); the analysis filled it in for estimation only.',
    ]);
    expect(drafts[0].severity).toBe('info');
  });

  it('lists several in the plural, flags a missing review period and passes notes on', () => {
    const original = new Array<number>(40).fill(100);
    const tooShort = {code: 'tooShortToAdjust', values: {minimum: 25, observed: 20, frequency: 'monthly'}} as const;
    original[10] = NaN;
    original[11] = NaN;
    original[39] = NaN;
    const drafts = runRule(
      dataQualityRule,
      makeAnalysis(original, {notAdjustedReason: tooShort, notes: [tooShort, {code: 'tooFewToForecast', values: {}}]}),
    );
    expect(drafts.map((d) => [d.key, d.severity, d.text])).toEqual([
      ['gaps', 'watch', '3 values of Net sales are missing (May 2024, June 2024 and October 2026).'],
      ['latest-missing', 'alert', 'There is no value of Net sales for October 2026, the review period.'],
      [
        'not-adjusted',
        'watch',
        'No seasonal adjustment for Net sales: Not seasonally adjusted: this needs at least two full years of data (25 months), and the series has 20 observed months.',
      ],
      ['note-1', 'info', 'Note on Net sales: Too few values to forecast.'],
    ]);
  });

  it('is silent for complete data without notes', () => {
    expect(runRule(dataQualityRule, makeAnalysis([1, 2, 3]))).toEqual([]);
  });
});
