import {describe, expect, it} from 'vitest';
import {trendRule} from '../../../src/narrate/callouts/trend.js';
import {makeAdjustment, makeAnalysis, makeChanges, runRule} from '../fixtures.js';

/** Trend growing by the given percent per month (one rate per month after the first). */
function trendFrom(rates: number[]): number[] {
  const t = [1000];
  for (const r of rates) t.push(t[t.length - 1] * (1 + r / 100));
  return t;
}

function analysisOf(trend: number[], adjusted = trend, annualised = NaN) {
  return makeAnalysis(trend, {
    adjustment: makeAdjustment(trend.length, {trend, adjusted}),
    changes: makeChanges({trendAnnualised: annualised}),
  });
}

describe('trend rule', () => {
  it('reports a turn when the trend has just changed direction', () => {
    const trend = trendFrom([...new Array<number>(33).fill(1), -0.5, -0.5]);
    const [d] = runRule(trendRule, analysisOf(trend));
    // 36 months to October 2026: falls in September and October after 33 months of rises.
    expect(d.text).toBe('The trend of Net sales turned down in September 2026 after rising for 33 months.');
    expect(d.severity).toBe('watch');
    expect(d.figures.periodsSinceTurn).toBe(2);
  });

  it('calls an adjusted move against a steady trend a blip', () => {
    const trend = trendFrom(new Array<number>(35).fill(0.3));
    const adjusted = trend.slice();
    adjusted[35] = adjusted[34] * 0.988;
    const [d] = runRule(trendRule, analysisOf(trend, adjusted));
    expect(d.text).toBe(
      'The fall in Net sales in October 2026 (-1.2%, seasonally adjusted) goes against a rising trend (+0.3% a month): more likely a blip than a turn.',
    );
    expect(d.severity).toBe('info');
  });

  it('states the direction and pace of a steady trend', () => {
    const trend = trendFrom(new Array<number>(35).fill(0.3));
    const [d] = runRule(trendRule, analysisOf(trend, trend, (Math.pow(1.003, 12) - 1) * 100));
    expect(d.text).toBe('The trend of Net sales is rising, +0.3% a month (+3.7% annualised).');
  });

  it('needs at least the recent window before calling a turn (one month of fall after one rise is no turn)', () => {
    const trend = trendFrom([1, -0.5]);
    const [d] = runRule(trendRule, analysisOf(trend));
    expect(d.text).toBe('The trend of Net sales is falling, -0.5% a month.');
  });
});
