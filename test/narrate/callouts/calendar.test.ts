import {describe, expect, it} from 'vitest';
import type {CalendarRegressor} from '../../../src/analyse/decompose/types.js';
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

// Easter dates 2024-03-31, 2025-04-20, 2026-04-05 agree with python-dateutil 2.9.0 `easter(year)`.
describe('calendar rule', () => {
  it('states the working-day effect in the review period', () => {
    const drafts = runRule(calendarRule, withCalendar(monthIndex(2026, 10), 1.014, [regressor('working-days', 0.01)]));
    expect(drafts.map((d) => d.text)).toEqual([
      'Calendar effects (trading days and holidays) raised Net sales in October 2026 by about 1.4% compared with an average period.',
    ]);
  });

  // The engine's Easter regressor (time/calendar.ts): March share of the 8 days before Easter minus its
  // 1800–2299 mean, 0.373 (computed by hand with the same computus). 2026: 4 of 8 days in March → x = +0.127.
  it('states how an Easter earlier than average moved March and April (2026)', () => {
    const drafts = runRule(calendarRule, withCalendar(monthIndex(2026, 10), 1, [regressor('easter', 0.04)]));
    expect(drafts.map((d) => d.text)).toEqual([
      'Easter 2026 fell on 5 April, earlier than on average: against an average year that moved Net sales by about +0.5% in March 2026 and -0.5% in April 2026.',
    ]);
    expect(drafts[0].figures.marchEffect).toBeCloseTo(Math.expm1(0.04 * 0.127) * 100, 10);
  });

  it('handles an early Easter (2024) and a late one (2025)', () => {
    const early = runRule(calendarRule, withCalendar(monthIndex(2024, 10), 1, [regressor('easter', 0.04)]));
    expect(early[0].text).toBe(
      'Easter 2024 fell on 31 March, earlier than on average: against an average year that moved Net sales by about +2.5% in March 2024 and -2.5% in April 2024.',
    );
    const late = runRule(calendarRule, withCalendar(monthIndex(2025, 10), 1, [regressor('easter', 0.04)]));
    expect(late[0].text).toBe(
      'Easter 2025 fell on 20 April, later than on average: against an average year that moved Net sales by about -1.5% in March 2025 and +1.5% in April 2025.',
    );
  });

  it('uses the previous Easter while this year’s April is still to come', () => {
    const drafts = runRule(calendarRule, withCalendar(monthIndex(2025, 3), 1, [regressor('easter', 0.04)]));
    expect(drafts[0].text).toContain('Easter 2024 fell on 31 March');
  });

  it('reads March as Q1 and April as Q2 for quarterly series', () => {
    const drafts = runRule(calendarRule, withCalendar(quarterIndex(2025, 3), 1, [regressor('easter', -0.02)], 'quarterly'));
    expect(drafts[0].text).toBe(
      'Easter 2025 fell on 20 April, later than on average: against an average year that moved Net sales by about +0.7% in Q1 2025 and -0.7% in Q2 2025.',
    );
  });

  it('says nothing about effects that are not significant', () => {
    const drafts = runRule(
      calendarRule,
      withCalendar(monthIndex(2026, 10), 1.014, [regressor('working-days', 0.01, false), regressor('easter', 0.04, false)]),
    );
    expect(drafts).toEqual([]);
  });
});
