import {describe, expect, it} from 'vitest';
import {fiscalYearOf, fiscalYears} from '../../src/time/fiscal.js';
import {isoWeekIndex, isoWeeksInYear, monthIndex, quarterIndex} from '../../src/time/period.js';

describe('fiscalYearOf, monthly', () => {
  it('calendar fiscal year', () => {
    expect(fiscalYearOf('monthly', monthIndex(2026, 10), 1)).toEqual({
      label: 'FY2026',
      first: monthIndex(2026, 1),
      last: monthIndex(2026, 12),
    });
  });
  // The UK government's financial year runs 1 April to 31 March (HM Treasury; "2026-27" for April 2026 to March 2027).
  it('April start, as the UK government financial year', () => {
    const april = {label: 'FY2026/27', first: monthIndex(2026, 4), last: monthIndex(2027, 3)};
    expect(fiscalYearOf('monthly', monthIndex(2026, 4), 4)).toEqual(april);
    expect(fiscalYearOf('monthly', monthIndex(2027, 3), 4)).toEqual(april);
    expect(fiscalYearOf('monthly', monthIndex(2026, 3), 4).label).toBe('FY2025/26');
  });
  // Australia's financial year runs 1 July to 30 June (Australian Taxation Office).
  it('July start, as Australia; century rollover in the label', () => {
    expect(fiscalYearOf('monthly', monthIndex(2000, 1), 7)).toEqual({
      label: 'FY1999/00',
      first: monthIndex(1999, 7),
      last: monthIndex(2000, 6),
    });
  });
  it('December start', () => {
    expect(fiscalYearOf('monthly', monthIndex(2026, 12), 12).first).toBe(monthIndex(2026, 12));
    expect(fiscalYearOf('monthly', monthIndex(2026, 11), 12).first).toBe(monthIndex(2025, 12));
  });
  it('every month lies in its fiscal year of twelve months', () => {
    for (let s = 1; s <= 12; s++) {
      for (let i = monthIndex(2020, 1); i < monthIndex(2023, 1); i++) {
        const fy = fiscalYearOf('monthly', i, s);
        expect(fy.first).toBeLessThanOrEqual(i);
        expect(fy.last).toBeGreaterThanOrEqual(i);
        expect(fy.last - fy.first).toBe(11);
        expect(fy.first % 12).toBe(s - 1);
      }
    }
  });
});

describe('fiscalYearOf, quarterly', () => {
  it('October start, as the US federal fiscal year (which the US names by its end year: FY2027)', () => {
    const fy = {label: 'FY2026/27', first: quarterIndex(2026, 4), last: quarterIndex(2027, 3)};
    expect(fiscalYearOf('quarterly', quarterIndex(2026, 4), 10)).toEqual(fy);
    expect(fiscalYearOf('quarterly', quarterIndex(2027, 3), 10)).toEqual(fy);
    expect(fiscalYearOf('quarterly', quarterIndex(2026, 3), 1)).toEqual({
      label: 'FY2026',
      first: quarterIndex(2026, 1),
      last: quarterIndex(2026, 4),
    });
  });
  it('a start month inside a quarter is an error', () => {
    expect(() => fiscalYearOf('quarterly', quarterIndex(2026, 1), 2)).toThrow(
      /fiscal year start month 2 is not a quarter start/,
    );
  });
  it('start month out of range', () => {
    expect(() => fiscalYearOf('monthly', 0, 13)).toThrow(/invalid fiscal year start month: 13/);
    expect(() => fiscalYearOf('monthly', 0, 0)).toThrow(/invalid fiscal year start month/);
    expect(() => fiscalYearOf('monthly', 0, 1.5)).toThrow(/invalid fiscal year start month/);
  });
});

describe('fiscalYearOf, weekly', () => {
  // With a January start, fiscal years of weeks are ISO years: 2026 has 53 ISO weeks, 2025 has 52
  // (python3 -c "import datetime as d; print(d.date(2026,12,28).isocalendar(), d.date(2025,12,28).isocalendar())").
  it('January start equals ISO years', () => {
    expect(fiscalYearOf('weekly', isoWeekIndex(2026, 41), 1)).toEqual({
      label: 'FY2026',
      first: isoWeekIndex(2026, 1),
      last: isoWeekIndex(2026, 53),
    });
    for (let y = 2000; y <= 2040; y++) {
      const fy = fiscalYearOf('weekly', isoWeekIndex(y, 10), 1);
      expect(fy.last - fy.first + 1).toBe(isoWeeksInYear(y));
    }
  });
  // 1 April 2026 is a Wednesday, so the week of Monday 30 March 2026 (2026-W14, Thursday 2 April) is the
  // first week of FY2026/27 (python3: date(2026,4,2).isocalendar() → (2026, 14, 4)).
  it('April start: the week whose Thursday falls on or after 1 April', () => {
    const fy = fiscalYearOf('weekly', isoWeekIndex(2026, 14), 4);
    expect(fy.label).toBe('FY2026/27');
    expect(fy.first).toBe(isoWeekIndex(2026, 14));
    expect(fiscalYearOf('weekly', isoWeekIndex(2026, 13), 4).label).toBe('FY2025/26');
    // 1 April 2027 is a Thursday: python3 date(2027,4,1).isocalendar() → (2027, 13, 4)
    expect(fy.last).toBe(isoWeekIndex(2027, 12));
  });
  it('weeks partition time into consecutive fiscal years', () => {
    for (const s of [1, 4, 7, 10]) {
      let fy = fiscalYearOf('weekly', isoWeekIndex(2010, 1), s);
      for (let n = 0; n < 20; n++) {
        const next = fiscalYearOf('weekly', fy.last + 1, s);
        expect(next.first).toBe(fy.last + 1);
        expect([52, 53]).toContain(next.last - next.first + 1);
        fy = next;
      }
    }
  });
});

describe('fiscalYears', () => {
  it('gives the years of a label for the words of each language, and any other text as it is', () => {
    const label = (month: number) => fiscalYearOf('monthly', monthIndex(2099, month), 7).label;
    expect([label(7), label(1)].map(fiscalYears)).toEqual(['2099/00', '2098/99']);
    expect(fiscalYears(fiscalYearOf('monthly', monthIndex(2026, 5), 1).label)).toBe('2026');
    expect(fiscalYears('2026')).toBe('2026');
  });
});
