import {easterSunday} from './easter.js';
import {civilFromDays, periodLength, periodStartDay, seasonOf, weekday, type Frequency} from './period.js';

/**
 * Calendar regressors for monthly and quarterly flow series: trading-day composition, Easter and holidays.
 * Each regressor is centred on its long-run mean for the same month or quarter, so that the part every year
 * shares stays in the seasonal component and only the year-to-year calendar variation is estimated.
 * Weekly periods have no calendar regressors here (every week has five weekdays).
 */

function checkFrequency(frequency: Frequency): void {
  if (frequency === 'weekly') throw new RangeError('calendar regressors need monthly or quarterly periods');
}

/**
 * Monday-to-Friday days in a period, less the `holidays` (days since 1970-01-01) that fall on one of them.
 * Complexity: O(1) plus O(holidays). @example weekdayCount('monthly', monthIndex(2026, 2)) // => 20
 */
export function weekdayCount(frequency: Frequency, index: number, holidays: readonly number[] = []): number {
  const start = periodStartDay(frequency, index);
  const length = periodLength(frequency, index);
  let count = Math.floor(length / 7) * 5;
  for (let d = start + Math.floor(length / 7) * 7; d < start + length; d++) if (weekday(d) < 5) count++;
  for (const h of holidays) if (h >= start && h < start + length && weekday(h) < 5) count--;
  return count;
}

const longRunWeekdays = new Map<Frequency, Float64Array>();

/**
 * Mean weekday count per month (or quarter) over the 400-year Gregorian cycle, which repeats exactly
 * (146 097 days = 20 871 weeks), so these are the true long-run means. Leap-year Februaries are included.
 */
function meanWeekdays(frequency: Frequency): Float64Array {
  let means = longRunWeekdays.get(frequency);
  if (means === undefined) {
    const perYear = frequency === 'monthly' ? 12 : 4;
    means = new Float64Array(perYear);
    const first = 2000 * perYear;
    for (let i = first; i < first + 400 * perYear; i++) means[i % perYear] += weekdayCount(frequency, i) / 400;
    longRunWeekdays.set(frequency, means);
  }
  return means;
}

/**
 * Working-day regressor: weekdays in the period minus their long-run mean for that month or quarter (e.g. a
 * March with 23 weekdays scores 23 − 22.14 = +0.86). Its coefficient is the effect of one extra working day.
 * Complexity: O(n). @example workingDayRegressor('monthly', monthIndex(2026, 1), 12)
 */
export function workingDayRegressor(frequency: Frequency, start: number, n: number): Float64Array {
  checkFrequency(frequency);
  const means = meanWeekdays(frequency);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = weekdayCount(frequency, start + i) - means[seasonOf(frequency, start + i)];
  return out;
}

/** Share of the `window` days before Easter Sunday (Easter − window … Easter − 1) that fall in March. */
function easterMarchShare(year: number, window: number): number {
  const easter = easterSunday(year);
  let march = 0;
  for (let d = easter - window; d < easter; d++) if (civilFromDays(d).month === 3) march++;
  return march / window;
}

const EASTER_MEAN_YEARS = {first: 1800, last: 2299};
const meanShares = new Map<number, number>();

/** Mean of {@link easterMarchShare} over 1800–2299, worked out once per window (500 Easter dates each time). */
function meanEasterMarchShare(window: number): number {
  let mean = meanShares.get(window);
  if (mean === undefined) {
    let sum = 0;
    for (let y = EASTER_MEAN_YEARS.first; y <= EASTER_MEAN_YEARS.last; y++) sum += easterMarchShare(y, window);
    mean = sum / (EASTER_MEAN_YEARS.last - EASTER_MEAN_YEARS.first + 1);
    meanShares.set(window, mean);
  }
  return mean;
}

/**
 * Easter regressor: the share of the `window` days before Easter Sunday that fall in the period (March/Q1 or
 * April/Q2; those days never fall elsewhere), minus its mean over the years 1800–2299. A positive coefficient
 * means activity rises in the days before Easter. Default window: 8 days (common practice).
 * Complexity: O(n · window).
 */
export function easterRegressor(frequency: Frequency, start: number, n: number, window = 8): Float64Array {
  checkFrequency(frequency);
  const meanMarch = meanEasterMarchShare(window);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const index = start + i;
    const season = seasonOf(frequency, index);
    const year = civilFromDays(periodStartDay(frequency, index)).year;
    const first = frequency === 'monthly' ? season === 2 : season === 0;
    const second = frequency === 'monthly' ? season === 3 : season === 1;
    if (first) out[i] = easterMarchShare(year, window) - meanMarch;
    else if (second) out[i] = 1 - easterMarchShare(year, window) - (1 - meanMarch);
  }
  return out;
}

/**
 * Holiday regressor: holidays (days since 1970-01-01) falling on a weekday in the period, minus the mean of that
 * count for the same month or quarter over the `n` periods, so holidays on fixed dates that land on a weekday
 * every year stay in the seasonal. Its coefficient is the effect of one extra weekday holiday.
 * Complexity: O(n · holidays).
 */
export function holidayRegressor(frequency: Frequency, start: number, n: number, holidays: readonly number[]): Float64Array {
  checkFrequency(frequency);
  const perYear = frequency === 'monthly' ? 12 : 4;
  const out = new Float64Array(n);
  const sums = new Float64Array(perYear);
  const counts = new Float64Array(perYear);
  for (let i = 0; i < n; i++) {
    const index = start + i;
    out[i] = weekdayCount(frequency, index) - weekdayCount(frequency, index, holidays);
    sums[seasonOf(frequency, index)] += out[i];
    counts[seasonOf(frequency, index)]++;
  }
  for (let i = 0; i < n; i++) {
    const s = seasonOf(frequency, start + i);
    out[i] -= sums[s] / counts[s];
  }
  return out;
}
