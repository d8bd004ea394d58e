import {daysFromCivil, isoWeekIndex, isoWeeksInYear, monthIndex, periodStartDay, quarterIndex} from './period.js';
import type {Frequency} from './period.js';

/** What a date cell names before it is matched to the pack's frequency. */
export type DateCell =
  | {kind: 'month'; year: number; month: number}
  | {kind: 'quarter'; year: number; quarter: number}
  | {kind: 'week'; year: number; week: number}
  | {kind: 'day'; year: number; month: number; day: number};

const MONTH_NAMES = ['jan', 'feb', 'mar', 'apr', 'may', 'jun', 'jul', 'aug', 'sep', 'oct', 'nov', 'dec'];
const FULL_MONTH_NAMES = [
  'january',
  'february',
  'march',
  'april',
  'may',
  'june',
  'july',
  'august',
  'september',
  'october',
  'november',
  'december',
];

const YEAR_MONTH = /^(\d{4})-(\d{1,2})$/;
const MONTH_SLASH_YEAR = /^(\d{1,2})\/(\d{4})$/;
const NAME_YEAR = /^([a-z]+)\.?[ -](\d{4})$/i;
const YEAR_QUARTER = /^(\d{4})-?Q([1-4])$/i;
const QUARTER_YEAR = /^Q([1-4])[ -]?(\d{4})$/i;
const YEAR_WEEK = /^(\d{4})-?W(\d{1,2})(?:-?[1-7])?$/i;
const YEAR_MONTH_DAY = /^(\d{4})([-/])(\d{1,2})\2(\d{1,2})(?:[T ]\d{1,2}:\d{2}(?::\d{2}(?:\.\d+)?)?(?:Z|[+-]\d{2}:?\d{2})?)?$/;

/**
 * Read a date cell into what it names, without deciding the frequency.
 *
 * Accepted (case-insensitive, surrounding blanks ignored):
 * - months: `2026-10`, `10/2026`, `Oct 2026`, `October 2026`, `Sept 2026`, `Oct-2026`
 * - quarters: `2026-Q3`, `2026Q3`, `Q3 2026`, `Q3-2026`
 * - ISO weeks: `2026-W41`, `2026W41`, and ISO week dates `2026-W41-3`
 * - days: `2026-10-31`, `2026/10/31`, with an optional time of day (`2026-10-31T00:00:00Z`), which is ignored
 *
 * Day-first and month-first dates such as `31/10/2026` are not accepted: they are ambiguous between
 * locales. Values outside the calendar (month 13, 31 April, week 53 of a 52-week year) give undefined.
 *
 * Complexity: O(length of text).
 *
 * @example readDateCell('Q3 2026') // => {kind: 'quarter', year: 2026, quarter: 3}
 */
export function readDateCell(text: string): DateCell | undefined {
  const s = text.trim();
  let m: RegExpMatchArray | null;
  if ((m = s.match(YEAR_MONTH))) return month(Number(m[1]), Number(m[2]));
  if ((m = s.match(YEAR_MONTH_DAY))) return day(Number(m[1]), Number(m[3]), Number(m[4]));
  if ((m = s.match(MONTH_SLASH_YEAR))) return month(Number(m[2]), Number(m[1]));
  if ((m = s.match(YEAR_QUARTER))) return {kind: 'quarter', year: Number(m[1]), quarter: Number(m[2])};
  if ((m = s.match(QUARTER_YEAR))) return {kind: 'quarter', year: Number(m[2]), quarter: Number(m[1])};
  if ((m = s.match(YEAR_WEEK))) {
    const year = Number(m[1]);
    const week = Number(m[2]);
    return week >= 1 && week <= isoWeeksInYear(year) ? {kind: 'week', year, week} : undefined;
  }
  if ((m = s.match(NAME_YEAR))) {
    const index = monthNameIndex(m[1].toLowerCase());
    return index === undefined ? undefined : month(Number(m[2]), index + 1);
  }
  return undefined;
}

/**
 * The period index (see time/period.ts) a date cell names at the pack's frequency, or undefined when the
 * cell is not a date or names a period of another frequency (a quarter in a monthly pack, a month in a
 * weekly pack). A full date maps to the month, quarter or ISO week that contains it.
 *
 * @example parseDateCell('2026-08-15', 'quarterly') // => quarterIndex(2026, 3)
 */
export function parseDateCell(text: string, frequency: Frequency): number | undefined {
  const cell = readDateCell(text);
  if (cell === undefined) return undefined;
  if (cell.kind === 'day') {
    if (frequency === 'monthly') return monthIndex(cell.year, cell.month);
    if (frequency === 'quarterly') return quarterIndex(cell.year, Math.ceil(cell.month / 3));
    return Math.floor((daysFromCivil(cell.year, cell.month, cell.day) - periodStartDay('weekly', 0)) / 7);
  }
  if (cell.kind === 'month') return frequency === 'monthly' ? monthIndex(cell.year, cell.month) : undefined;
  if (cell.kind === 'quarter') return frequency === 'quarterly' ? quarterIndex(cell.year, cell.quarter) : undefined;
  return frequency === 'weekly' ? isoWeekIndex(cell.year, cell.week) : undefined;
}

/** The frequency a date cell's label implies (`undefined` for full dates, which fit any frequency, and non-dates). */
export function labelFrequency(text: string): Frequency | undefined {
  const cell = readDateCell(text);
  if (cell === undefined || cell.kind === 'day') return undefined;
  return cell.kind === 'month' ? 'monthly' : cell.kind === 'quarter' ? 'quarterly' : 'weekly';
}

function monthNameIndex(name: string): number | undefined {
  if (name === 'sept') return 8;
  const short = MONTH_NAMES.indexOf(name);
  if (short >= 0) return short;
  const full = FULL_MONTH_NAMES.indexOf(name);
  return full >= 0 ? full : undefined;
}

function month(year: number, m: number): DateCell | undefined {
  return m >= 1 && m <= 12 ? {kind: 'month', year, month: m} : undefined;
}

function day(year: number, m: number, d: number): DateCell | undefined {
  if (m < 1 || m > 12 || d < 1) return undefined;
  const next = m === 12 ? daysFromCivil(year + 1, 1, 1) : daysFromCivil(year, m + 1, 1);
  return d <= next - daysFromCivil(year, m, 1) ? {kind: 'day', year, month: m, day: d} : undefined;
}
