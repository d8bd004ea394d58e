import {periodStartDay, type Frequency} from '../time/period.js';
import type {Note} from '../words/index.js';

/** Periods of a source that its rows cover whole, and a note for each end period that is cut. */
export interface Coverage {
  first: number;
  last: number;
  notes: Note[];
}

/**
 * Which periods a source finer than the pack covers whole. Rows cover the days from `span.from` to `span.to`
 * (a daily row one day, a weekly row seven); the first period with rows is incomplete when the span starts after
 * its first day, the last when the span ends before its last day (daily data up to 12 December: December has
 * 12 of 31 days). Such a period is left out: it would be analysed as if it were whole (a December of 12 days
 * reads as a slump).
 *
 * `periods` are the first and last period any row fell in (for ISO weeks in months, the month of the week's
 * Thursday, so a week that starts in the month before still covers its month's first days).
 *
 * Complexity: O(1).
 */
export function completePeriods(
  span: {from: number; to: number},
  periods: {first: number; last: number},
  frequency: Frequency,
): Coverage {
  let {first, last} = periods;
  const notes: Note[] = [];
  const note = (p: number, days: number, edge: 'start' | 'end'): Note => ({
    code: 'incomplete',
    values: {days, length: length(p), edge},
    periods: {frequency, named: {period: p}},
  });
  const start = periodStartDay(frequency, first);
  const length = (p: number) => periodStartDay(frequency, p + 1) - periodStartDay(frequency, p);
  if (span.from > start) {
    const days = periodStartDay(frequency, first + 1) - span.from;
    notes.push(note(first, days, 'start'));
    first++;
  }
  const end = periodStartDay(frequency, last + 1) - 1;
  if (span.to < end && last >= first) {
    const days = span.to - periodStartDay(frequency, last) + 1;
    notes.push(note(last, days, 'end'));
    last--;
  }
  return {first, last, notes};
}
