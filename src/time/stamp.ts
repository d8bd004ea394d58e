import type {DateCell} from './parseDate.js';
import {civilFromDays, daysFromCivil, isoWeekIndex, monthIndex, periodStartDay, quarterIndex} from './period.js';
import type {Frequency} from './period.js';
import {zoneOffset} from './zone.js';

/** How fine a date cell is: a day (or an instant within one), an ISO week, a month or a quarter. */
export type Grain = 'day' | 'week' | 'month' | 'quarter';

/** A date cell placed on the pack's calendar. */
export interface Stamp {
  /** Period index at the pack's frequency that the cell falls in. */
  period: number;
  /** Ordering key within a period: local epoch ms (days × 86 400 000 + time of day) of the cell's start. */
  at: number;
  /** First and last day (days since 1970-01-01) the cell covers: one day, or a whole week, month or quarter. */
  from: number;
  to: number;
  grain: Grain;
}

const DAY_MS = 86_400_000;

/** Period index of a day at a frequency; weeks are ISO weeks (Monday to Sunday). */
export function periodOfDay(frequency: Frequency, day: number): number {
  if (frequency === 'weekly') return Math.floor((day - periodStartDay('weekly', 0)) / 7);
  const {year, month} = civilFromDays(day);
  return frequency === 'monthly' ? monthIndex(year, month) : quarterIndex(year, Math.ceil(month / 3));
}

/**
 * Place a date cell in the pack's calendar, or undefined when the cell is coarser than the pack (a quarter in a
 * monthly pack, a month in a weekly pack), which cannot be split.
 *
 * - A day with a UTC offset (`…T23:30:00-05:00`, `…Z`) names an instant: it falls on the day it is in the
 *   source's `timeZone` (IANA name through `Intl`). A day without an offset is the local date as written.
 * - An ISO week in a monthly or quarterly pack belongs to the month (quarter) of its Thursday, the same rule
 *   ISO 8601 uses to give a week its year.
 *
 * Complexity: O(1); one `Intl` call per zone and quarter-hour for offsets (cached in zone.ts).
 */
export function stampOf(cell: DateCell, frequency: Frequency, timeZone: string): Stamp | undefined {
  if (cell.kind === 'day') {
    let local = daysFromCivil(cell.year, cell.month, cell.day) * DAY_MS + cell.ms;
    if (cell.offset !== null) {
      const utc = local - cell.offset * 60_000;
      local = utc + zoneOffset(timeZone, utc) * 60_000;
    }
    const day = Math.floor(local / DAY_MS);
    return {period: periodOfDay(frequency, day), at: local, from: day, to: day, grain: 'day'};
  }
  if (cell.kind === 'week') {
    const index = isoWeekIndex(cell.year, cell.week);
    const monday = periodStartDay('weekly', index);
    const period = frequency === 'weekly' ? index : periodOfDay(frequency, monday + 3);
    return {period, at: monday * DAY_MS, from: monday, to: monday + 6, grain: 'week'};
  }
  if (cell.kind === 'month') {
    if (frequency === 'weekly') return undefined;
    const index = monthIndex(cell.year, cell.month);
    const from = periodStartDay('monthly', index);
    const to = periodStartDay('monthly', index + 1) - 1;
    const period = frequency === 'monthly' ? index : quarterIndex(cell.year, Math.ceil(cell.month / 3));
    return {period, at: from * DAY_MS, from, to, grain: 'month'};
  }
  if (frequency !== 'quarterly') return undefined;
  const index = quarterIndex(cell.year, cell.quarter);
  const from = periodStartDay('quarterly', index);
  return {period: index, at: from * DAY_MS, from, to: periodStartDay('quarterly', index + 1) - 1, grain: 'quarter'};
}

/**
 * Whether labels of this grain are finer than the pack's periods (weeks or months in a quarterly pack), so rows
 * are always aggregated. Days are decided by the data: a daily file has rows on several days of a period, while
 * a file that names each month by one date (`2026-10-31`) has one row per period.
 */
export function finerThan(grain: Grain, frequency: Frequency): boolean {
  if (grain === 'day') return false;
  if (grain === 'week') return frequency !== 'weekly';
  return grain === 'month' && frequency === 'quarterly';
}
