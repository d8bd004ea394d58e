import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {
  civilFromDays,
  daysFromCivil,
  formatPeriod,
  isoWeekIndex,
  isoWeekOf,
  isoWeeksInYear,
  monthIndex,
  parsePeriod,
  periodLabel,
  periodLength,
  periodStartDay,
  periodsPerYear,
  quarterIndex,
  seasonOf,
  seasonalPeriod,
  weekday,
  yearAgo,
  yearOf,
} from '../../src/time/period.js';
import type {Frequency} from '../../src/time/period.js';

const DAY_MS = 86_400_000;
const utcDays = (y: number, m: number, d: number): number => Date.UTC(y, m - 1, d) / DAY_MS;

describe('civil dates', () => {
  // Reference: ECMAScript Date.UTC (proleptic Gregorian calendar, ECMA-262 §21.4.1), outside this project.
  it('daysFromCivil agrees with Date.UTC, years 1696 to 2243', () => {
    fc.assert(
      fc.property(fc.integer({min: -100_000, max: 100_000}), (days) => {
        const date = new Date(days * DAY_MS);
        const [y, m, d] = [date.getUTCFullYear(), date.getUTCMonth() + 1, date.getUTCDate()];
        expect(daysFromCivil(y, m, d)).toBe(utcDays(y, m, d));
      }),
    );
  });

  it('civilFromDays inverts daysFromCivil, month ends and leap days included', () => {
    fc.assert(
      fc.property(fc.integer({min: -200_000, max: 200_000}), (days) => {
        const {year, month, day} = civilFromDays(days);
        const date = new Date(days * DAY_MS);
        expect([year, month, day]).toEqual([date.getUTCFullYear(), date.getUTCMonth() + 1, date.getUTCDate()]);
        expect(daysFromCivil(year, month, day)).toBe(days);
      }),
    );
  });

  it('known anchors', () => {
    expect(daysFromCivil(1970, 1, 1)).toBe(0);
    expect(daysFromCivil(2000, 3, 1) - daysFromCivil(2000, 2, 28)).toBe(2); // 2000 is a leap year (÷400)
    expect(daysFromCivil(1900, 3, 1) - daysFromCivil(1900, 2, 28)).toBe(1); // 1900 is not (÷100)
    expect(civilFromDays(-1)).toEqual({year: 1969, month: 12, day: 31});
  });

  // Reference: Date.prototype.getUTCDay (0 = Sunday), shifted to 0 = Monday.
  it('weekday agrees with getUTCDay', () => {
    fc.assert(
      fc.property(fc.integer({min: -100_000, max: 100_000}), (days) => {
        expect(weekday(days)).toBe((new Date(days * DAY_MS).getUTCDay() + 6) % 7);
      }),
    );
    expect(weekday(0)).toBe(3); // 1970-01-01 was a Thursday
  });
});

describe('ISO weeks', () => {
  // Reference: Python 3 datetime.date(y, m, d).isocalendar(), e.g.
  // python3 -c "import datetime as d; print(d.date(2005,1,1).isocalendar())"  # (2004, 53, 6)
  // The first rows are also the worked examples of ISO 8601 week dates commonly quoted (recalled from memory).
  const table: [number, number, number, number, number][] = [
    [2005, 1, 1, 2004, 53],
    [2005, 1, 2, 2004, 53],
    [2005, 12, 31, 2005, 52],
    [2007, 1, 1, 2007, 1],
    [2007, 12, 30, 2007, 52],
    [2007, 12, 31, 2008, 1],
    [2008, 1, 1, 2008, 1],
    [2008, 12, 28, 2008, 52],
    [2008, 12, 29, 2009, 1],
    [2008, 12, 31, 2009, 1],
    [2009, 1, 1, 2009, 1],
    [2009, 12, 31, 2009, 53],
    [2010, 1, 1, 2009, 53],
    [2010, 1, 3, 2009, 53],
    [2010, 1, 4, 2010, 1],
    [2020, 12, 31, 2020, 53],
    [2021, 1, 3, 2020, 53],
    [2021, 1, 4, 2021, 1],
    [2026, 1, 1, 2026, 1],
    [2026, 12, 31, 2026, 53],
    [2027, 1, 3, 2026, 53],
    [2027, 1, 4, 2027, 1],
    [1969, 12, 29, 1970, 1],
    [1970, 1, 1, 1970, 1],
    [1970, 1, 5, 1970, 2],
    [2000, 2, 29, 2000, 9],
    [2026, 10, 5, 2026, 41],
  ];
  it.each(table)('%i-%i-%i is in ISO week %i-W%i', (y, m, d, isoYear, isoWeek) => {
    const index = Math.floor((daysFromCivil(y, m, d) - periodStartDay('weekly', 0)) / 7);
    expect(isoWeekOf(index)).toEqual({year: isoYear, week: isoWeek});
    expect(isoWeekIndex(isoYear, isoWeek)).toBe(index);
  });

  // Reference: Python 3 datetime,
  // [y for y in range(1990, 2041) if d.date(y, 12, 28).isocalendar()[1] == 53]
  it('53-week years from 1990 to 2040', () => {
    const long = [1992, 1998, 2004, 2009, 2015, 2020, 2026, 2032, 2037];
    for (let y = 1990; y <= 2040; y++) expect(isoWeeksInYear(y)).toBe(long.includes(y) ? 53 : 52);
  });

  // Reference: Python 3 datetime, d.date.fromisocalendar(2026, 41, 1) → 2026-10-05,
  // d.date.fromisocalendar(2015, 53, 1) → 2015-12-28, d.date.fromisocalendar(1970, 1, 1) → 1969-12-29
  it('Mondays of ISO weeks', () => {
    expect(periodStartDay('weekly', isoWeekIndex(2026, 41))).toBe(daysFromCivil(2026, 10, 5));
    expect(periodStartDay('weekly', isoWeekIndex(2015, 53))).toBe(daysFromCivil(2015, 12, 28));
    expect(periodStartDay('weekly', isoWeekIndex(1970, 1))).toBe(daysFromCivil(1969, 12, 29));
    expect(isoWeekIndex(1970, 2)).toBe(0);
  });

  it('every week index maps to a week that maps back (property)', () => {
    fc.assert(
      fc.property(fc.integer({min: -20_000, max: 20_000}), (i) => {
        const {year, week} = isoWeekOf(i);
        expect(week).toBeGreaterThanOrEqual(1);
        expect(week).toBeLessThanOrEqual(isoWeeksInYear(year));
        expect(isoWeekIndex(year, week)).toBe(i);
        expect(weekday(periodStartDay('weekly', i))).toBe(0);
      }),
    );
  });
});

describe('labels', () => {
  it('formats canonical labels', () => {
    expect(formatPeriod('monthly', monthIndex(2026, 10))).toBe('2026-10');
    expect(formatPeriod('monthly', monthIndex(2026, 1))).toBe('2026-01');
    expect(formatPeriod('quarterly', quarterIndex(2026, 3))).toBe('2026-Q3');
    expect(formatPeriod('weekly', isoWeekIndex(2026, 41))).toBe('2026-W41');
    expect(formatPeriod('weekly', isoWeekIndex(2026, 1))).toBe('2026-W01');
    expect(formatPeriod('weekly', isoWeekIndex(2026, 53))).toBe('2026-W53');
  });

  it('short English labels', () => {
    expect(periodLabel('monthly', monthIndex(2026, 10))).toBe('Oct 2026');
    expect(periodLabel('quarterly', quarterIndex(2026, 3))).toBe('Q3 2026');
    expect(periodLabel('weekly', isoWeekIndex(2026, 41))).toBe('W41 2026');
    expect(periodLabel('weekly', isoWeekIndex(2009, 53))).toBe('W53 2009');
  });

  it('parsePeriod reads canonical labels and rejects the rest', () => {
    expect(parsePeriod('monthly', '2026-10')).toBe(monthIndex(2026, 10));
    expect(parsePeriod('monthly', ' 2026-10 ')).toBe(monthIndex(2026, 10));
    expect(parsePeriod('quarterly', '2026-Q3')).toBe(quarterIndex(2026, 3));
    expect(parsePeriod('quarterly', '2026q3')).toBe(quarterIndex(2026, 3));
    expect(parsePeriod('weekly', '2026-W53')).toBe(isoWeekIndex(2026, 53));
    expect(parsePeriod('weekly', '2025-W53')).toBeUndefined(); // 2025 has 52 ISO weeks
    expect(parsePeriod('weekly', '2026-W00')).toBeUndefined();
    expect(parsePeriod('monthly', '2026-13')).toBeUndefined();
    expect(parsePeriod('monthly', '2026-00')).toBeUndefined();
    expect(parsePeriod('monthly', '2026-Q3')).toBeUndefined();
    expect(parsePeriod('quarterly', '2026-Q5')).toBeUndefined();
    expect(parsePeriod('quarterly', '2026-10')).toBeUndefined();
  });

  it('format and parse round-trip for every frequency (property)', () => {
    const freq = fc.constantFrom<Frequency>('monthly', 'quarterly', 'weekly');
    fc.assert(
      fc.property(freq, fc.integer({min: 1000 * 12, max: 9999 * 4}), (f, i) => {
        expect(parsePeriod(f, formatPeriod(f, i))).toBe(i);
      }),
    );
  });
});

describe('period arithmetic', () => {
  it('period lengths in days', () => {
    expect(periodLength('monthly', monthIndex(2024, 2))).toBe(29);
    expect(periodLength('monthly', monthIndex(2023, 2))).toBe(28);
    expect(periodLength('monthly', monthIndex(2026, 12))).toBe(31);
    expect(periodLength('quarterly', quarterIndex(2026, 1))).toBe(90);
    expect(periodLength('quarterly', quarterIndex(2024, 1))).toBe(91);
    expect(periodLength('quarterly', quarterIndex(2026, 3))).toBe(92);
    expect(periodLength('weekly', 1234)).toBe(7);
  });

  it('period starts', () => {
    expect(periodStartDay('monthly', monthIndex(2026, 10))).toBe(utcDays(2026, 10, 1));
    expect(periodStartDay('quarterly', quarterIndex(2026, 4))).toBe(utcDays(2026, 10, 1));
    expect(periodStartDay('weekly', 0)).toBe(utcDays(1970, 1, 5));
  });

  it('season and year', () => {
    expect(seasonOf('monthly', monthIndex(2026, 10))).toBe(9);
    expect(seasonOf('quarterly', quarterIndex(2026, 3))).toBe(2);
    expect(seasonOf('weekly', isoWeekIndex(2026, 53))).toBe(52);
    expect(yearOf('monthly', monthIndex(2026, 12))).toBe(2026);
    expect(yearOf('quarterly', quarterIndex(2026, 1))).toBe(2026);
    expect(yearOf('weekly', isoWeekIndex(2009, 53))).toBe(2009); // week of 2010-01-01
    expect(periodsPerYear).toEqual({monthly: 12, quarterly: 4, weekly: 52});
    expect(seasonalPeriod.weekly).toBeCloseTo(52.1775, 4); // 365.2425 / 7, Gregorian mean year
  });

  it('one year ago', () => {
    expect(yearAgo('monthly', monthIndex(2026, 10))).toBe(monthIndex(2025, 10));
    expect(yearAgo('quarterly', quarterIndex(2026, 1))).toBe(quarterIndex(2025, 1));
    expect(yearAgo('weekly', isoWeekIndex(2026, 41))).toBe(isoWeekIndex(2025, 41));
    expect(yearAgo('weekly', isoWeekIndex(2027, 10))).toBe(isoWeekIndex(2026, 10));
    // Week 53 has no twin in a 52-week year: the last week of that year is used.
    expect(yearAgo('weekly', isoWeekIndex(2026, 53))).toBe(isoWeekIndex(2025, 52));
  });

  it('negative indices (years before 0) stay consistent', () => {
    expect(seasonOf('monthly', -1)).toBe(11);
    expect(yearOf('quarterly', -1)).toBe(-1);
  });
});
