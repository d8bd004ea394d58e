import {daysFromCivil, isoWeeksInYear} from './period.js';
import type {Frequency} from './period.js';

/** What a date cell names before it is matched to the pack's frequency. */
export type DateCell =
  | {kind: 'month'; year: number; month: number}
  | {kind: 'quarter'; year: number; quarter: number}
  | {kind: 'week'; year: number; week: number}
  | {
      kind: 'day';
      year: number;
      month: number;
      day: number;
      /** Time of day in ms (0 when the cell has none). */
      ms: number;
      /** UTC offset in minutes written in the cell (`Z` = 0), or null when it has none (local time of the source). */
      offset: number | null;
    };

/**
 * How a source writes its day-first or month-first dates: `DD/MM/YYYY`, `MM/DD/YYYY`, `DD.MM.YYYY`, `DD-MM-YYYY`
 * (any of `/ . -` as separator), optionally followed by ` HH:mm` or ` HH:mm:ss`; a time of day is accepted after
 * any date either way. `YYYY-MM-DD` and `YYYY/MM/DD` are always read and need no setting.
 */
export const DATE_FORMAT = /^(DD([./-])MM\2YYYY|MM([./-])DD\3YYYY|YYYY([./-])MM\4DD)( HH:mm(:ss)?)?$/;

/** What reading a date cell depends on besides its text. */
export interface DateReading {
  /** The source's `dateFormat` (see {@link DATE_FORMAT}), or null: day-first and month-first dates are not read. */
  dateFormat: string | null;
  /** Month names of the pack's locale (see monthNames.ts); English names are always read. */
  months: ReadonlyMap<string, number>;
}

const ENGLISH_MONTHS = new Map<string, number>([
  ...['jan', 'feb', 'mar', 'apr', 'may', 'jun', 'jul', 'aug', 'sep', 'oct', 'nov', 'dec'].map(
    (n, i) => [n, i + 1] as [string, number],
  ),
  ...['january', 'february', 'march', 'april', 'may', 'june', 'july', 'august', 'september'].map(
    (n, i) => [n, i + 1] as [string, number],
  ),
  ['october', 10],
  ['november', 11],
  ['december', 12],
  ['sept', 9],
]);
const NONE: DateReading = {dateFormat: null, months: new Map()};

const TIME = String.raw`(?:[T ](\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?\s?(Z|[+-]\d{2}(?::?\d{2})?)?)?`;
const YEAR_MONTH = /^(\d{4})(?:[-/]|M)(\d{1,2})$/i;
const MONTH_SLASH_YEAR = /^(\d{1,2})[/.-](\d{4})$/;
const NAME_YEAR = /^(\p{L}+\.?)[ -](\d{4})$/u;
/** A spreadsheet's month-year display (`mmm-yy`): `Jan-24`. Only with a hyphen: `Jan 24` reads as a day as well. */
const NAME_SHORT_YEAR = /^(\p{L}+\.?)-(\d{2})$/u;
const YEAR_QUARTER = /^(\d{4})-?Q([1-4])$/i;
const QUARTER_YEAR = /^Q([1-4])[ -]?(\d{4})$/i;
const YEAR_WEEK = /^(\d{4})-?W(\d{1,2})(?:-?[1-7])?$/i;
/**
 * Week labels as reports write them: `W41 2026`, `KW 41/2026` (German). Not the French `S41 2026`: `S1 2026` and
 * `S2 2026` are just as often the year's halves.
 */
const WEEK_YEAR = /^(?:KW|W) ?(\d{1,2})[ /](\d{4})$/i;
const YEAR_MONTH_DAY = new RegExp(String.raw`^(\d{4})([-/.])(\d{1,2})\2(\d{1,2})${TIME}$`);
const DAY_MONTH_YEAR = new RegExp(String.raw`^(\d{1,2})([-/.])(\d{1,2})\2(\d{4})${TIME}$`);
/** A day with its month's name: `31 Jan 2024`, `31-JAN-24`, `31. Januar 2024`, `31 janv. 2024`. */
const DAY_NAME_YEAR = new RegExp(String.raw`^(\d{1,2})\.?([ -])(\p{L}+\.?)\2(\d{4}|\d{2})${TIME}$`, 'u');
/** `January 31, 2024`, `Jan 31 2024`. */
const NAME_DAY_YEAR = new RegExp(String.raw`^(\p{L}+\.?) (\d{1,2}),? (\d{4})${TIME}$`, 'u');
/** ISO 8601's basic format: `20240131`. */
const BASIC_DAY = new RegExp(String.raw`^(\d{4})(\d{2})(\d{2})${TIME}$`);

/**
 * Read a date cell into what it names, without deciding the frequency.
 *
 * Accepted (case-insensitive, surrounding blanks ignored):
 * - months: `2026-10`, `2026/10`, `2026M10`, `10/2026`, `10.2026`, `10-2026`, `Oct 2026`, `October 2026`,
 *   `Sept 2026`, `Oct-2026`, a spreadsheet's `Oct-26`, and the month names of the pack's locale given in
 *   `reading.months` (`Okt 2026`, `janv. 2026`)
 * - quarters: `2026-Q3`, `2026Q3`, `Q3 2026`, `Q3-2026`
 * - ISO weeks: `2026-W41`, `2026W41`, ISO week dates `2026-W41-3`, and the labels reports write, `W41 2026` and
 *   `KW 41/2026`
 * - days: `2026-10-31`, `2026/10/31`, and with `reading.dateFormat` day-first or month-first dates (`31/10/2026`,
 *   `10/31/2026`, `31.10.2026`); each with an optional time of day (`2015/01/01 01:00:00`,
 *   `2026-10-31T22:15:00.5+01:00`), kept with the UTC offset when one is written (ISO 8601); `20261031` (ISO 8601's
 *   basic format); days with their month's name, `31 Oct 2026`, `31-OCT-26`, `31. Oktober 2026`, `October 31, 2026`
 * - a two-digit year (`Oct-26`, `31-OCT-26`) is 1969–2068
 *
 * Day-first and month-first dates without a `dateFormat` give undefined: they are ambiguous between locales
 * (see {@link dayMonthOrder}). Values outside the calendar (month 13, 31 April, week 53 of a 52-week year,
 * 24:00) give undefined.
 *
 * Complexity: O(length of text).
 *
 * @example readDateCell('Q3 2026') // => {kind: 'quarter', year: 2026, quarter: 3}
 */
export function readDateCell(text: string, reading: DateReading = NONE): DateCell | undefined {
  const s = text.trim();
  let m: RegExpMatchArray | null;
  if ((m = s.match(YEAR_MONTH))) return month(Number(m[1]), Number(m[2]));
  if ((m = s.match(YEAR_MONTH_DAY))) return day(Number(m[1]), Number(m[3]), Number(m[4]), m.slice(5));
  if ((m = s.match(DAY_MONTH_YEAR))) {
    const order = reading.dateFormat?.slice(0, 2);
    if (order === 'DD') return day(Number(m[4]), Number(m[3]), Number(m[1]), m.slice(5));
    if (order === 'MM') return day(Number(m[4]), Number(m[1]), Number(m[3]), m.slice(5));
    return undefined;
  }
  if ((m = s.match(BASIC_DAY))) return day(Number(m[1]), Number(m[2]), Number(m[3]), m.slice(4));
  if ((m = s.match(DAY_NAME_YEAR))) {
    const index = monthOfName(m[3], reading);
    return index === undefined ? undefined : day(fullYear(m[4]), index, Number(m[1]), m.slice(5));
  }
  if ((m = s.match(NAME_DAY_YEAR))) {
    const index = monthOfName(m[1], reading);
    return index === undefined ? undefined : day(Number(m[3]), index, Number(m[2]), m.slice(4));
  }
  if ((m = s.match(MONTH_SLASH_YEAR))) return month(Number(m[2]), Number(m[1]));
  if ((m = s.match(YEAR_QUARTER))) return {kind: 'quarter', year: Number(m[1]), quarter: Number(m[2])};
  if ((m = s.match(QUARTER_YEAR))) return {kind: 'quarter', year: Number(m[2]), quarter: Number(m[1])};
  const yearWeek = s.match(YEAR_WEEK);
  const weekYear = yearWeek ? null : s.match(WEEK_YEAR);
  if (yearWeek || weekYear) {
    const year = Number(yearWeek ? yearWeek[1] : weekYear![2]);
    const week = Number(yearWeek ? yearWeek[2] : weekYear![1]);
    return week >= 1 && week <= isoWeeksInYear(year) ? {kind: 'week', year, week} : undefined;
  }
  if ((m = s.match(NAME_YEAR) ?? s.match(NAME_SHORT_YEAR))) {
    const index = monthOfName(m[1], reading);
    return index === undefined ? undefined : month(fullYear(m[2]), index);
  }
  return undefined;
}

/** The month (1–12) a month name names, in English or in the pack's locale (`Okt`, `janv.`), case-insensitive. */
function monthOfName(text: string, reading: DateReading): number | undefined {
  const name = text.toLowerCase();
  const bare = name.replace(/\.$/, '');
  return ENGLISH_MONTHS.get(bare) ?? reading.months.get(name) ?? reading.months.get(bare);
}

/**
 * A year of four digits as written; of two, 1969–2068, the rule of the POSIX `strptime` `%y` conversion (recalled
 * from memory), which spreadsheets and databases also follow for the years business data hold.
 */
function fullYear(text: string): number {
  const y = Number(text);
  return text.length === 4 ? y : y < 69 ? 2000 + y : 1900 + y;
}

/**
 * For a day-first or month-first date read without a `dateFormat`: the settings that could read it, with the
 * text's own separator. A first field above 12 can only be a day, and so can a second one; when both are ≤ 12
 * either order could be meant. Undefined when the text is not such a date.
 *
 * @example dayMonthOrder('31/10/2026') // => ['DD/MM/YYYY']
 * @example dayMonthOrder('01.10.2026') // => ['DD.MM.YYYY', 'MM.DD.YYYY']
 */
export function dayMonthOrder(text: string): string[] | undefined {
  const m = text.trim().match(DAY_MONTH_YEAR);
  if (!m) return undefined;
  const [a, b, sep] = [Number(m[1]), Number(m[3]), m[2]];
  const dayFirst = `DD${sep}MM${sep}YYYY`;
  const monthFirst = `MM${sep}DD${sep}YYYY`;
  if (a > 12 && b <= 12) return [dayFirst];
  if (b > 12 && a <= 12) return [monthFirst];
  return [dayFirst, monthFirst];
}

/** The frequency a date cell's label implies (`undefined` for full dates, which fit any frequency, and non-dates). */
export function labelFrequency(text: string, reading: DateReading = NONE): Frequency | undefined {
  const cell = readDateCell(text, reading);
  if (cell === undefined || cell.kind === 'day') return undefined;
  return cell.kind === 'month' ? 'monthly' : cell.kind === 'quarter' ? 'quarterly' : 'weekly';
}

function month(year: number, m: number): DateCell | undefined {
  return m >= 1 && m <= 12 ? {kind: 'month', year, month: m} : undefined;
}

/** A day cell, with the time of day and offset from the time match's groups (hour, minute, second, fraction, zone). */
function day(year: number, m: number, d: number, time: (string | undefined)[]): DateCell | undefined {
  if (m < 1 || m > 12 || d < 1) return undefined;
  const next = m === 12 ? daysFromCivil(year + 1, 1, 1) : daysFromCivil(year, m + 1, 1);
  if (d > next - daysFromCivil(year, m, 1)) return undefined;
  const [hour, minute, second, fraction, zone] = time;
  let ms = 0;
  if (hour !== undefined) {
    const [h, mi, sec] = [Number(hour), Number(minute), Number(second ?? 0)];
    if (h > 23 || mi > 59 || sec > 59) return undefined;
    ms = ((h * 60 + mi) * 60 + sec) * 1000 + (fraction ? Math.round(Number(`0.${fraction}`) * 1000) : 0);
  }
  return {kind: 'day', year, month: m, day: d, ms, offset: zone === undefined ? null : offsetMinutes(zone)};
}

/** `Z` → 0, `+01:00` / `+0100` / `+01` → 60, `-05:30` → -330. */
function offsetMinutes(zone: string): number {
  if (zone === 'Z') return 0;
  const sign = zone[0] === '-' ? -1 : 1;
  const digits = zone.slice(1).replace(':', '');
  return sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2) || 0));
}
