import {describe, expect, it} from 'vitest';
import {labelFrequency, parseDateCell, readDateCell} from '../../src/time/parseDate.js';
import {isoWeekIndex, monthIndex, quarterIndex} from '../../src/time/period.js';

describe('parseDateCell, monthly', () => {
  const oct = monthIndex(2026, 10);
  const october = ['2026-10', '2026-10-01', '2026-10-31', '2026/10/15', '2026-10-01T00:00:00Z', '2026-10-05 13:45'];
  const named = ['Oct 2026', 'oct 2026', 'Oct-2026', 'Oct. 2026', 'October 2026', 'OCTOBER 2026', '10/2026'];
  it.each([...october, ...named, ' 2026-10 '])('%s is October 2026', (text) =>
    expect(parseDateCell(text, 'monthly')).toBe(oct),
  );
  it('single-digit months and Sept', () => {
    expect(parseDateCell('2026-3', 'monthly')).toBe(monthIndex(2026, 3));
    expect(parseDateCell('3/2026', 'monthly')).toBe(monthIndex(2026, 3));
    expect(parseDateCell('Sept 2026', 'monthly')).toBe(monthIndex(2026, 9));
  });
  const bad = ['2026-13', '2026-00', '13/2026', 'Okt 2026', '2026-02-29', '2026-04-31', '31/10/2026', '10/31/2026'];
  it.each([...bad, '2026', 'x', ''])('%s is not a month', (text) =>
    expect(parseDateCell(text, 'monthly')).toBeUndefined(),
  );
  it('29 February only in leap years', () => {
    expect(parseDateCell('2024-02-29', 'monthly')).toBe(monthIndex(2024, 2));
    expect(parseDateCell('2100-02-29', 'monthly')).toBeUndefined(); // 2100 is not a leap year (Gregorian rule)
  });
  it('quarter and week labels are not months', () => {
    expect(parseDateCell('2026-Q3', 'monthly')).toBeUndefined();
    expect(parseDateCell('2026-W41', 'monthly')).toBeUndefined();
  });
});

describe('parseDateCell, quarterly', () => {
  const q3 = quarterIndex(2026, 3);
  it.each(['2026-Q3', '2026Q3', '2026q3', 'Q3 2026', 'q3 2026', 'Q3-2026', '2026-07-01', '2026-08-15', '2026-09-30'])(
    '%s is 2026 Q3',
    (text) => expect(parseDateCell(text, 'quarterly')).toBe(q3),
  );
  it('quarter boundaries', () => {
    expect(parseDateCell('2026-06-30', 'quarterly')).toBe(quarterIndex(2026, 2));
    expect(parseDateCell('2026-10-01', 'quarterly')).toBe(quarterIndex(2026, 4));
    expect(parseDateCell('2026-01-01', 'quarterly')).toBe(quarterIndex(2026, 1));
  });
  it.each(['2026-Q5', '2026-Q0', '2026-10', 'Oct 2026', '2026-W41'])('%s is not a quarter', (text) =>
    expect(parseDateCell(text, 'quarterly')).toBeUndefined(),
  );
});

describe('parseDateCell, weekly', () => {
  const w41 = ['2026-W41', '2026W41', '2026-w41', '2026-W41-1', '2026W417', '2026-10-05', '2026-10-11'];
  it.each([...w41, '2026-10-08T12:00'])('%s is 2026-W41', (text) =>
    expect(parseDateCell(text, 'weekly')).toBe(isoWeekIndex(2026, 41)),
  );
  // Reference: Python 3 datetime, d.date(2027,1,1).isocalendar() → (2026, 53, 5) and
  // d.date(2026,3,31).isocalendar() → (2026, 14, 2); also d.date(2026,10,5) → (2026, 41, 1).
  it('dates map to their ISO week, across the year end', () => {
    expect(parseDateCell('2027-01-01', 'weekly')).toBe(isoWeekIndex(2026, 53));
    expect(parseDateCell('2026-03-31', 'weekly')).toBe(isoWeekIndex(2026, 14));
    expect(parseDateCell('2026-W53', 'weekly')).toBe(isoWeekIndex(2026, 53));
  });
  it.each(['2025-W53', '2026-W00', '2026-W54', '2026-10', '2026-Q3'])('%s is not a week', (text) =>
    expect(parseDateCell(text, 'weekly')).toBeUndefined(),
  );
});

describe('readDateCell and labelFrequency', () => {
  it('says what a cell names', () => {
    expect(readDateCell('Q3 2026')).toEqual({kind: 'quarter', year: 2026, quarter: 3});
    expect(readDateCell('2026-10-31')).toEqual({kind: 'day', year: 2026, month: 10, day: 31});
    expect(readDateCell('2026W41')).toEqual({kind: 'week', year: 2026, week: 41});
    expect(readDateCell('October 2026')).toEqual({kind: 'month', year: 2026, month: 10});
  });
  it('names the frequency of period labels, not of full dates', () => {
    expect(labelFrequency('2026-Q3')).toBe('quarterly');
    expect(labelFrequency('Oct 2026')).toBe('monthly');
    expect(labelFrequency('2026-W41')).toBe('weekly');
    expect(labelFrequency('2026-10-31')).toBeUndefined();
    expect(labelFrequency('nonsense')).toBeUndefined();
  });
});
