import {describe, expect, it} from 'vitest';
import {easterRegressor, holidayRegressor, weekdayCount, workingDayRegressor} from '../../src/time/calendar.js';
import {daysFromCivil, monthIndex, periodLength, periodStartDay, quarterIndex, weekday} from '../../src/time/period.js';

function bruteForceWeekdays(frequency: 'monthly' | 'quarterly', index: number, holidays: number[] = []): number {
  let count = 0;
  const start = periodStartDay(frequency, index);
  for (let d = start; d < start + periodLength(frequency, index); d++) {
    if (weekday(d) < 5 && !holidays.includes(d)) count++;
  }
  return count;
}

describe('weekdayCount', () => {
  it('matches day-by-day counting for every month and quarter 1990–2040', () => {
    for (let i = monthIndex(1990, 1); i < monthIndex(2041, 1); i++) {
      expect(weekdayCount('monthly', i)).toBe(bruteForceWeekdays('monthly', i));
    }
    for (let i = quarterIndex(1990, 1); i < quarterIndex(2041, 1); i++) {
      expect(weekdayCount('quarterly', i)).toBe(bruteForceWeekdays('quarterly', i));
    }
  });
  it('counts known months (checked on a printed calendar): Feb 2026 has 20, Mar 2026 has 22, Dec 2025 has 23', () => {
    expect(weekdayCount('monthly', monthIndex(2026, 2))).toBe(20);
    expect(weekdayCount('monthly', monthIndex(2026, 3))).toBe(22);
    expect(weekdayCount('monthly', monthIndex(2025, 12))).toBe(23);
  });
  it('removes holidays only when they fall on a weekday', () => {
    // 2025-12-25 is a Thursday, 2027-12-25 a Saturday.
    const holidays = [daysFromCivil(2025, 12, 25), daysFromCivil(2027, 12, 25)];
    expect(weekdayCount('monthly', monthIndex(2025, 12), holidays)).toBe(22);
    expect(weekdayCount('monthly', monthIndex(2027, 12), holidays)).toBe(bruteForceWeekdays('monthly', monthIndex(2027, 12)));
  });
});

describe('calendar regressors', () => {
  it('working-day regressor averages zero per month over the 400-year cycle', () => {
    const x = workingDayRegressor('monthly', monthIndex(2000, 1), 4800);
    for (let m = 0; m < 12; m++) {
      let sum = 0;
      for (let i = m; i < 4800; i += 12) sum += x[i];
      expect(Math.abs(sum / 400)).toBeLessThan(1e-9);
    }
  });
  it('Easter regressor: March and April shares move in opposite directions, other months zero', () => {
    const x = easterRegressor('monthly', monthIndex(2024, 1), 36);
    // Easter 2024 is 31 March: all 8 days before it are in March; Easter 2025 is 20 April: none in March.
    expect(x[2] - x[14]).toBeCloseTo(1, 12);
    expect(x[3] - x[15]).toBeCloseTo(-1, 12);
    expect(x[2] + x[3]).toBeCloseTo(0, 12);
    for (const i of [0, 1, 4, 5, 6, 7, 8, 9, 10, 11]) expect(x[i]).toBe(0);
    const q = easterRegressor('quarterly', quarterIndex(2024, 1), 8);
    expect(q[0] - q[4]).toBeCloseTo(1, 12);
  });
  it('holiday regressor is centred per month over the sample', () => {
    const holidays = [2024, 2025, 2026, 2027].map((y) => daysFromCivil(y, 12, 25));
    const x = holidayRegressor('monthly', monthIndex(2024, 1), 48, holidays);
    // Christmas falls on Wed, Thu, Fri, Sat in 2024–2027: counts 1, 1, 1, 0 → centred 0.25, 0.25, 0.25, −0.75.
    expect([x[11], x[23], x[35], x[47]]).toEqual([0.25, 0.25, 0.25, -0.75]);
  });
  it('rejects weekly periods', () => {
    expect(() => workingDayRegressor('weekly', 0, 10)).toThrow(/monthly or quarterly/);
  });
});
