import {daysFromCivil} from './period.js';

/**
 * Date of Western (Gregorian) Easter Sunday in `year`, as days since 1970-01-01.
 *
 * Method: the anonymous Gregorian computus published in Nature (1876) and given by J. Meeus, Astronomical
 * Algorithms (1991), ch. 8 — integer arithmetic only, valid for every Gregorian year (≥ 1583).
 * Why: the Easter regressor of the calendar adjustment needs the date for each year of a series.
 * Complexity: O(1). NaN policy: not applicable (a non-integer year throws).
 *
 * @example civilFromDays(easterSunday(2026)) // => {year: 2026, month: 4, day: 5}
 */
export function easterSunday(year: number): number {
  if (!Number.isInteger(year) || year < 1583) throw new RangeError(`invalid year: ${year}`);
  const a = year % 19;
  const b = Math.floor(year / 100);
  const c = year % 100;
  const d = Math.floor(b / 4);
  const e = b % 4;
  const f = Math.floor((b + 8) / 25);
  const g = Math.floor((b - f + 1) / 3);
  const h = (19 * a + b - d - g + 15) % 30;
  const i = Math.floor(c / 4);
  const k = c % 4;
  const l = (32 + 2 * e + 2 * i - h - k) % 7;
  const m = Math.floor((a + 11 * h + 22 * l) / 451);
  const month = Math.floor((h + l - 7 * m + 114) / 31);
  const day = ((h + l - 7 * m + 114) % 31) + 1;
  return daysFromCivil(year, month, day);
}
