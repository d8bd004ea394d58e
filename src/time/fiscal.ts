import {civilFromDays, daysFromCivil, monthIndex, periodStartDay, quarterIndex, weekday} from './period.js';
import type {Frequency} from './period.js';

/** A fiscal year: its label and the period indices of its first and last periods (inclusive). */
export interface FiscalYear {
  /** `FY2026` when the fiscal year starts in January, else `FY2026/27`, named by the calendar year it starts in. */
  label: string;
  first: number;
  last: number;
}

/**
 * The fiscal year containing a period.
 *
 * A fiscal year starting in month `s` runs from the 1st of month `s` for twelve months. Months and
 * quarters belong to the fiscal year they fall in; quarterly packs need `s` on a quarter start (1, 4, 7
 * or 10), otherwise quarters would straddle two fiscal years. An ISO week belongs to the fiscal year
 * that contains its Thursday, the same rule ISO 8601 uses to give a week to a calendar year, so with
 * `s = 1` fiscal years of weeks are ISO years (52 or 53 weeks).
 *
 * Why: year-to-date changes and fiscal-year totals in the report follow the organisation's year.
 *
 * Complexity: O(1).
 *
 * @example fiscalYearOf('monthly', monthIndex(2026, 5), 4)
 * // => {label: 'FY2026/27', first: monthIndex(2026, 4), last: monthIndex(2027, 3)}
 */
export function fiscalYearOf(frequency: Frequency, index: number, fiscalYearStart: number): FiscalYear {
  const s = fiscalYearStart;
  if (!Number.isInteger(s) || s < 1 || s > 12) throw new RangeError(`invalid fiscal year start month: ${s}`);
  if (frequency === 'monthly') {
    const startYear = Math.floor((index - (s - 1)) / 12);
    const first = monthIndex(startYear, s);
    return {label: fiscalLabel(startYear, s), first, last: first + 11};
  }
  if (frequency === 'quarterly') {
    if ((s - 1) % 3 !== 0) throw new RangeError(`fiscal year start month ${s} is not a quarter start (1, 4, 7 or 10)`);
    const q = (s - 1) / 3;
    const startYear = Math.floor((index - q) / 4);
    const first = quarterIndex(startYear, q + 1);
    return {label: fiscalLabel(startYear, s), first, last: first + 3};
  }
  const thursday = civilFromDays(periodStartDay('weekly', index) + 3);
  const startYear = thursday.month >= s ? thursday.year : thursday.year - 1;
  const first = firstWeek(startYear, s);
  return {label: fiscalLabel(startYear, s), first, last: firstWeek(startYear + 1, s) - 1};
}

/** Index of the first week whose Thursday falls on or after the 1st of month `s` of `year`. */
function firstWeek(year: number, s: number): number {
  const start = daysFromCivil(year, s, 1);
  const thursday = start + ((3 - weekday(start) + 7) % 7);
  return (thursday - 3 - periodStartDay('weekly', 0)) / 7;
}

/**
 * The years of a fiscal year's label without its prefix, for the words of each language: `FY2026/27` → `2026/27`,
 * `FY2026` → `2026`. A label of another form comes back as it is.
 */
export function fiscalYears(label: string): string {
  return /^FY(\d{4}(?:\/\d{2})?)$/.exec(label)?.[1] ?? label;
}

function fiscalLabel(startYear: number, s: number): string {
  return s === 1 ? `FY${startYear}` : `FY${startYear}/${String((startYear + 1) % 100).padStart(2, '0')}`;
}
