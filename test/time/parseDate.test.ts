import {describe, expect, it} from 'vitest';
import {DATE_FORMAT, dayMonthOrder, labelFrequency, readDateCell, type DateReading} from '../../src/time/parseDate.js';
import {monthNames} from '../../src/time/monthNames.js';
import {stampOf} from '../../src/time/stamp.js';
import type {Frequency} from '../../src/time/period.js';

/** The pack period a date cell falls in (UTC), or undefined. */
const parseDateCell = (text: string, frequency: Frequency, reading?: DateReading): number | undefined => {
  const cell = readDateCell(text, reading);
  return cell === undefined ? undefined : stampOf(cell, frequency, 'UTC')?.period;
};
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
  it('a quarter label is not a month; an ISO week falls in the month of its Thursday (ISO 8601 year rule)', () => {
    expect(parseDateCell('2026-Q3', 'monthly')).toBeUndefined();
    // 2026-W41 runs Mon 5 Oct to Sun 11 Oct 2026; 2026-W01 runs Mon 29 Dec 2025 to Sun 4 Jan 2026 (Thursday 1 Jan).
    expect(parseDateCell('2026-W41', 'monthly')).toBe(monthIndex(2026, 10));
    expect(parseDateCell('2026-W01', 'monthly')).toBe(monthIndex(2026, 1));
    expect(parseDateCell('2026-W01', 'quarterly')).toBe(quarterIndex(2026, 1));
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
  it.each(['2026-Q5', '2026-Q0'])('%s is not a quarter', (text) =>
    expect(parseDateCell(text, 'quarterly')).toBeUndefined(),
  );
  it.each(['2026-10', 'Oct 2026', '2026-W41'])('%s is a finer period inside 2026 Q4', (text) =>
    expect(parseDateCell(text, 'quarterly')).toBe(quarterIndex(2026, 4)),
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
    expect(readDateCell('2026-10-31')).toEqual({kind: 'day', year: 2026, month: 10, day: 31, ms: 0, offset: null});
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

describe('dates as exports write them', () => {
  const months = (locale: string): DateReading => ({dateFormat: null, months: monthNames(locale)});
  it('day-first and month-first dates need dateFormat, and say which one', () => {
    expect(readDateCell('01/10/2026')).toBeUndefined();
    expect(dayMonthOrder('01/10/2026')).toEqual(['DD/MM/YYYY', 'MM/DD/YYYY']);
    expect(dayMonthOrder('01.10.2026')).toEqual(['DD.MM.YYYY', 'MM.DD.YYYY']);
    expect(dayMonthOrder('31/10/2026')).toEqual(['DD/MM/YYYY']);
    expect(dayMonthOrder('10/31/2026')).toEqual(['MM/DD/YYYY']);
    expect(dayMonthOrder('31.10.2026')).toEqual(['DD.MM.YYYY']);
    const dmy = {dateFormat: 'DD/MM/YYYY', months: new Map()};
    const mdy = {dateFormat: 'MM/DD/YYYY', months: new Map()};
    expect(parseDateCell('01/10/2026', 'monthly', dmy)).toBe(monthIndex(2026, 10));
    expect(parseDateCell('01/10/2026', 'monthly', mdy)).toBe(monthIndex(2026, 1));
    expect(parseDateCell('31.10.2026 23:59:59', 'monthly', {dateFormat: 'DD.MM.YYYY', months: new Map()})).toBe(
      monthIndex(2026, 10),
    );
    expect(parseDateCell('31/02/2026', 'monthly', dmy)).toBeUndefined();
    expect(DATE_FORMAT.test('DD/MM/YYYY HH:mm:ss')).toBe(true);
    expect(DATE_FORMAT.test('DD/MM.YYYY')).toBe(false);
  });
  it('month names of the pack locale, as Intl.DateTimeFormat writes them (Node 20 ICU)', () => {
    expect(parseDateCell('Okt 2026', 'monthly', months('de-DE'))).toBe(monthIndex(2026, 10));
    expect(parseDateCell('März 2026', 'monthly', months('de-DE'))).toBe(monthIndex(2026, 3));
    expect(parseDateCell('janv. 2026', 'monthly', months('fr-FR'))).toBe(monthIndex(2026, 1));
    expect(parseDateCell('février 2026', 'monthly', months('fr-FR'))).toBe(monthIndex(2026, 2));
    expect(parseDateCell('Okt 2026', 'monthly', months('en-GB'))).toBeUndefined();
    // English names are read whatever the locale.
    expect(parseDateCell('Oct 2026', 'monthly', months('de-DE'))).toBe(monthIndex(2026, 10));
  });
  it('the forms exports and spreadsheets write besides ISO dates', () => {
    const at = (text: string, locale = 'en-GB') => readDateCell(text, months(locale));
    const jan31 = {kind: 'day', year: 2024, month: 1, day: 31, ms: 0, offset: null};
    // ISO 8601 basic format (the standard's form without separators).
    expect(at('20240131')).toEqual(jan31);
    expect(at('20240230')).toBeUndefined();
    // Days written with their month's name: unambiguous in any order of day and month.
    for (const text of ['31 Jan 2024', '31-Jan-2024', '31-JAN-24', 'January 31, 2024', 'Jan 31 2024']) expect(at(text)).toEqual(jan31);
    expect(at('31. Januar 2024', 'de-DE')).toEqual(jan31);
    expect(at('31 janv. 2024', 'fr-FR')).toEqual(jan31);
    expect(at('31 Jan 2024 14:30')).toMatchObject({day: 31, ms: (14 * 60 + 30) * 60_000});
    // Months: year first with a slash or M (as statistical tables write them), and a spreadsheet's mmm-yy display.
    for (const text of ['2024/01', '2024M01', '2024m1', '01.2024', '1-2024', 'Jan-24']) expect(at(text)).toEqual({kind: 'month', year: 2024, month: 1});
    expect(at('Okt-26', 'de-DE')).toEqual({kind: 'month', year: 2026, month: 10});
    // Two-digit years 1969–2068: the POSIX strptime %y rule (recalled from memory).
    expect([at('Dec-68'), at('Jan-69')].map((c) => c && 'year' in c && c.year)).toEqual([2068, 1969]);
    // `Jan 24` could be 24 January as well as January 2024: not read.
    expect(at('Jan 24')).toBeUndefined();
    // Week labels as the report itself writes them in English and German (words.ts: period.week); not the French
    // S41 2026, since S1 and S2 are also the halves of a year.
    for (const text of ['W41 2026', 'KW 41/2026', 'kw41 2026']) expect(at(text)).toEqual({kind: 'week', year: 2026, week: 41});
    expect(at('S1 2026')).toBeUndefined();
    // 2025 has 52 ISO weeks, 2026 has 53 (Python's date(2025, 12, 28).isocalendar() is week 52, and
    // date(2026, 12, 28).isocalendar() week 53).
    expect(at('W53 2025')).toBeUndefined();
    expect(at('KW 53/2026')).toEqual({kind: 'week', year: 2026, week: 53});
  });
  it('timestamps with times and ISO 8601 offsets take the date in the source time zone', () => {
    const at = (text: string, zone: string) => stampOf(readDateCell(text)!, 'monthly', zone)!;
    expect(readDateCell('2015/01/01 01:00:00')).toEqual({kind: 'day', year: 2015, month: 1, day: 1, ms: 3_600_000, offset: null});
    // 23:30 at UTC-4 is 03:30 UTC the next day: November in UTC, still October in New York (EDT, UTC-4, until
    // 1 November 2026); at UTC-5 it is 00:30 EDT on 1 November.
    expect(at('2026-10-31T23:30:00-04:00', 'UTC').period).toBe(monthIndex(2026, 11));
    expect(at('2026-10-31T23:30:00-04:00', 'America/New_York').period).toBe(monthIndex(2026, 10));
    expect(at('2026-10-31T23:30:00-05:00', 'America/New_York').period).toBe(monthIndex(2026, 11));
    // 23:30 UTC on 31 October is 00:30 on 1 November in Berlin (CET, UTC+1, after the 25 October change).
    expect(at('2026-10-31T23:30:00Z', 'Europe/Berlin').period).toBe(monthIndex(2026, 11));
    expect(at('2026-06-30T22:30:00+00:00', 'Europe/Berlin').period).toBe(monthIndex(2026, 7));
    // A timestamp without offset is the local time as written, whatever the zone.
    expect(at('2026-10-31T23:30:00', 'Europe/Berlin').period).toBe(monthIndex(2026, 10));
    expect(readDateCell('2026-10-31T24:00:00')).toBeUndefined();
    expect(readDateCell('2026-10-31 10:00:00+0530')).toMatchObject({offset: 330});
  });
});
