import {formatPeriod} from '../time/period.js';
import type {Frequency} from '../time/period.js';
import * as msg from '../ingest/messages.js';
import type {Note} from '../words/index.js';

/** Values by period index (NaN where there is none). */
export type PeriodValues = (period: number) => number;

/** A series placed on the calendar, or why it could not be. */
export type Placement =
  | {ok: true; start: number; values: Float64Array; ahead: Float64Array; notes: Note[]; dropped: number}
  | {ok: false; problem: string};

/**
 * Place one series' values on a regular calendar from its first value to the review period.
 *
 * - Starts at the first period with a number (leading blanks dropped).
 * - Periods with no number in between stay NaN and are listed in a note.
 * - Values after the review period are dropped (`dropped` counts them; derive says so once for the pack): a
 *   pack built for an earlier period sees only the data up to it. A target keeps them as `ahead` instead.
 * - A series ending before the review period is padded with NaN to it, with a note.
 * - A review period before the first value is a problem.
 *
 * Complexity: O(n) for n periods from the first value to the review period.
 */
export function placeSeries(
  id: string,
  store: PeriodValues,
  range: {first: number; last: number},
  period: number,
  frequency: Frequency,
  keepAhead = false,
): Placement {
  const label = (p: number): string => formatPeriod(frequency, p);
  if (period < range.first) return {ok: false, problem: msg.periodBeforeData(id, label(period), label(range.first))};
  const values = new Float64Array(period - range.first + 1);
  const missing: number[] = [];
  const end = Math.min(range.last, period);
  for (let p = range.first; p <= period; p++) {
    const v = store(p);
    values[p - range.first] = v;
    if (Number.isNaN(v) && p <= end) missing.push(p);
  }
  const notes: Note[] = [];
  const named = (periods: Record<string, number | number[]>) => ({frequency, named: periods});
  if (missing.length > 0) notes.push({code: 'gaps', values: {frequency, n: missing.length}, periods: named({list: missing})});
  const ahead = new Float64Array(keepAhead ? Math.max(0, range.last - period) : 0);
  for (let k = 0; k < ahead.length; k++) ahead[k] = store(period + 1 + k);
  let dropped = 0;
  if (range.last > period && !keepAhead) {
    for (let p = period + 1; p <= range.last; p++) if (!Number.isNaN(store(p))) dropped++;
  } else if (range.last < period) {
    notes.push({code: 'padded', values: {frequency, n: period - range.last}, periods: named({last: range.last, period})});
  }
  return {ok: true, start: range.first, values, ahead, notes, dropped};
}
