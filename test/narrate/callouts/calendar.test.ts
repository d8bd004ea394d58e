import {describe, expect, it} from 'vitest';
import type {CalendarRegressor} from '../../../src/analyse/types.js';
import {calendarRule} from '../../../src/narrate/callouts/calendar.js';
import {monthIndex, quarterIndex} from '../../../src/time/period.js';
import {makeAdjustment, makeAnalysis, runRule} from '../fixtures.js';

function regressor(name: string, coefficient: number, significant = true): CalendarRegressor {
  return {name, coefficient, standardError: 0.005, tStatistic: coefficient / 0.005, pValue: 0.001, significant, description: ''};
}

function withCalendar(end: number, effectAtEnd: number, regressors: CalendarRegressor[], frequency: 'monthly' | 'quarterly' = 'monthly') {
  const n = 36;
  const effect = new Array<number>(n).fill(1);
  effect[n - 1] = effectAtEnd;
  const adjustment = makeAdjustment(n, {calendar: {effect, regressors}});
  return makeAnalysis(new Array<number>(n).fill(100), {adjustment, frequency}, end);
}

// Easter dates: 2024-03-31, 2025-04-20, 2026-04-05 (python-dateutil, see easterSunday.test.ts).
describe('calendar rule', () => {
  it('states the working-day effect in the review period', () => {
    const drafts = runRule(calendarRule, withCalendar(monthIndex(2026, 10), 1.014, [regressor('working-days', 0.01)]));
    expect(drafts.map((d) => d.text)).toEqual([
      'Calendar effects (trading days and holidays) raised Net sales in October 2026 by about 1.4% compared with an average period.',
    ]);
  });

  it('splits the Easter effect when the pre-Easter window straddles March and April (2026)', () => {
    // Window 28 March – 4 April 2026: 4 of 8 days in March → exp(0.04 × 0.5) − 1 = 2.02% each.
    const drafts = runRule(calendarRule, withCalendar(monthIndex(2026, 10), 1, [regressor('easter', 0.04)]));
    expect(drafts.map((d) => d.text)).toEqual([
      'Easter 2026 fell on 5 April, so its effect was split: about +2.0% on Net sales in March 2026 and +2.0% in April 2026.',
    ]);
    expect(drafts[0].figures.marchShare).toBe(0.5);
  });

  it('puts an early Easter in March (2024) and a late one in April (2025)', () => {
    const march = runRule(calendarRule, withCalendar(monthIndex(2024, 10), 1, [regressor('easter', 0.04)]));
    expect(march[0].text).toBe('Easter 2024 fell on 31 March, which raised Net sales in March 2024 by about 4.1%.');
    const april = runRule(calendarRule, withCalendar(monthIndex(2025, 10), 1, [regressor('easter', 0.04)]));
    expect(april[0].text).toBe('Easter 2025 fell on 20 April, which raised Net sales in April 2025 by about 4.1%.');
  });

  it('uses the previous Easter while this year’s April is still to come', () => {
    // Review period March 2025: Easter 2025 (20 April) lies ahead, so Easter 2024 is described.
    const drafts = runRule(calendarRule, withCalendar(monthIndex(2025, 3), 1, [regressor('easter', 0.04)]));
    expect(drafts[0].text).toBe('Easter 2024 fell on 31 March, which raised Net sales in March 2024 by about 4.1%.');
  });

  it('reads March as Q1 and April as Q2 for quarterly series', () => {
    const drafts = runRule(calendarRule, withCalendar(quarterIndex(2025, 3), 1, [regressor('easter', -0.02)], 'quarterly'));
    expect(drafts[0].text).toBe('Easter 2025 fell on 20 April, which lowered Net sales in Q2 2025 by about 2.0%.');
  });

  it('says nothing about effects that are not significant', () => {
    const drafts = runRule(
      calendarRule,
      withCalendar(monthIndex(2026, 10), 1.014, [regressor('working-days', 0.01, false), regressor('easter', 0.04, false)]),
    );
    expect(drafts).toEqual([]);
  });
});
