/**
 * Periods are integers plus a frequency. No `Date` objects and no time zones:
 *
 * - monthly:   index = year × 12 + (month − 1)
 * - quarterly: index = year × 4 + (quarter − 1)
 * - weekly:    index = whole ISO weeks since the Monday 1970-01-05 (ISO week 1970-W02)
 *
 * Consecutive periods differ by exactly 1, so a series is a start index plus values.
 */
export type Frequency = 'monthly' | 'quarterly' | 'weekly';

/** Observations per year, as used for seasonal lags (weekly: 52, see {@link seasonalPeriod}). */
export const periodsPerYear: Record<Frequency, number> = {monthly: 12, quarterly: 4, weekly: 52};

/** Mean seasonal period in observations: 12, 4 or 365.2425 / 7 ≈ 52.18 for weeks. */
export const seasonalPeriod: Record<Frequency, number> = {monthly: 12, quarterly: 4, weekly: 365.2425 / 7};

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** Days since 1970-01-01 for a proleptic Gregorian date (month 1–12). */
export function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const mp = (month + 9) % 12;
  const doy = Math.floor((153 * mp + 2) / 5) + day - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

/** Inverse of {@link daysFromCivil}. */
export function civilFromDays(days: number): {year: number; month: number; day: number} {
  const z = days + 719468;
  const era = Math.floor(z / 146097);
  const doe = z - era * 146097;
  const yoe = Math.floor((doe - Math.floor(doe / 1460) + Math.floor(doe / 36524) - Math.floor(doe / 146096)) / 365);
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  const day = doy - Math.floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return {year: yoe + era * 400 + (month <= 2 ? 1 : 0), month, day};
}

/** Day of week, 0 = Monday … 6 = Sunday. */
export function weekday(days: number): number {
  return (((days + 3) % 7) + 7) % 7;
}

const WEEK_EPOCH = daysFromCivil(1970, 1, 5);

/** Weekly period index of the ISO week `week` of ISO year `year`. */
export function isoWeekIndex(year: number, week: number): number {
  const jan4 = daysFromCivil(year, 1, 4);
  const week1Monday = jan4 - weekday(jan4);
  return (week1Monday - WEEK_EPOCH) / 7 + (week - 1);
}

/** ISO year and week of a weekly period index. */
export function isoWeekOf(index: number): {year: number; week: number} {
  const monday = WEEK_EPOCH + index * 7;
  const thursday = monday + 3;
  const year = civilFromDays(thursday).year;
  const week = Math.floor((thursday - daysFromCivil(year, 1, 1)) / 7) + 1;
  return {year, week};
}

/** Number of ISO weeks (52 or 53) in an ISO year. */
export function isoWeeksInYear(year: number): number {
  return isoWeekIndex(year + 1, 1) - isoWeekIndex(year, 1);
}

export function monthIndex(year: number, month: number): number {
  return year * 12 + (month - 1);
}

export function quarterIndex(year: number, quarter: number): number {
  return year * 4 + (quarter - 1);
}

/** Canonical label: `2026-10`, `2026-Q3`, `2026-W41`. */
export function formatPeriod(frequency: Frequency, index: number): string {
  if (frequency === 'monthly') {
    const year = Math.floor(index / 12);
    return `${year}-${String(index - year * 12 + 1).padStart(2, '0')}`;
  }
  if (frequency === 'quarterly') {
    const year = Math.floor(index / 4);
    return `${year}-Q${index - year * 4 + 1}`;
  }
  const {year, week} = isoWeekOf(index);
  return `${year}-W${String(week).padStart(2, '0')}`;
}

/** Short human label in English: `Oct 2026`, `Q3 2026`, `W41 2026` (narrate formats by locale). */
export function periodLabel(frequency: Frequency, index: number): string {
  if (frequency === 'monthly') return `${MONTHS[mod(index, 12)]} ${Math.floor(index / 12)}`;
  if (frequency === 'quarterly') return `Q${mod(index, 4) + 1} ${Math.floor(index / 4)}`;
  const {year, week} = isoWeekOf(index);
  return `W${week} ${year}`;
}

/** Parse a canonical label (see {@link formatPeriod}); returns undefined when it does not match. */
export function parsePeriod(frequency: Frequency, label: string): number | undefined {
  const s = label.trim();
  let m: RegExpMatchArray | null;
  if (frequency === 'monthly' && (m = s.match(/^(\d{4})-(\d{2})$/))) {
    const month = Number(m[2]);
    return month >= 1 && month <= 12 ? monthIndex(Number(m[1]), month) : undefined;
  }
  if (frequency === 'quarterly' && (m = s.match(/^(\d{4})-?Q([1-4])$/i))) return quarterIndex(Number(m[1]), Number(m[2]));
  if (frequency === 'weekly' && (m = s.match(/^(\d{4})-?W(\d{2})$/i))) {
    const year = Number(m[1]);
    const week = Number(m[2]);
    return week >= 1 && week <= isoWeeksInYear(year) ? isoWeekIndex(year, week) : undefined;
  }
  return undefined;
}

/** First day of a period, as days since 1970-01-01 (UTC midnight × 86 400 000 gives epoch ms for charts). */
export function periodStartDay(frequency: Frequency, index: number): number {
  if (frequency === 'monthly') return daysFromCivil(Math.floor(index / 12), mod(index, 12) + 1, 1);
  if (frequency === 'quarterly') return daysFromCivil(Math.floor(index / 4), mod(index, 4) * 3 + 1, 1);
  return WEEK_EPOCH + index * 7;
}

/** Days in a period (28–31 for months, 90–92 for quarters, 7 for weeks). */
export function periodLength(frequency: Frequency, index: number): number {
  return periodStartDay(frequency, index + 1) - periodStartDay(frequency, index);
}

/** Position within the year: month 0–11, quarter 0–3, ISO week 0–52. */
export function seasonOf(frequency: Frequency, index: number): number {
  if (frequency === 'monthly') return mod(index, 12);
  if (frequency === 'quarterly') return mod(index, 4);
  return isoWeekOf(index).week - 1;
}

/** Calendar year a period belongs to (ISO year for weeks). */
export function yearOf(frequency: Frequency, index: number): number {
  if (frequency === 'monthly') return Math.floor(index / 12);
  if (frequency === 'quarterly') return Math.floor(index / 4);
  return isoWeekOf(index).year;
}

/** The same period one year earlier (52 or 53 weeks back for weeks: same ISO week number). */
export function yearAgo(frequency: Frequency, index: number): number {
  if (frequency !== 'weekly') return index - periodsPerYear[frequency];
  const {year, week} = isoWeekOf(index);
  return isoWeekIndex(year - 1, Math.min(week, isoWeeksInYear(year - 1)));
}

function mod(a: number, b: number): number {
  return ((a % b) + b) % b;
}
