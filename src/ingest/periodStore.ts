import type {Stamp} from '../time/stamp.js';
import {microUnits, UNITS_PER_ONE} from './decimalUnits.js';

/**
 * The rows of one column or key, summed up by pack period as they arrive in any order: for each period the
 * number of rows and of values, their sum, minimum and maximum, the value at the earliest and at the latest
 * instant, and the file lines of its first two rows (so a duplicate can name both). These are all that any
 * `aggregate` needs (derive/aggregate.ts), so memory grows with periods, never with rows: 112 bytes per
 * period from the earliest to the latest seen, whatever the number of rows.
 *
 * Sums are exact where the values allow: while every value of a period is a whole number of millionths
 * (`microUnits`: decimals of at most six places below about 9·10^9), the period keeps its sum as an integer count
 * of millionths (in a double while below 2^53, then as a bigint), so the sum is the same in any order of the rows;
 * it reads as that count divided by 10^6 (the double nearest to the sum of the decimals while the count is below
 * 2^53). A period with any other value (1/3, 1e-9) sums as doubles in row order. So a database engine that adds
 * the same values in parallel (ingest/duckdbSummary.ts) gives the same sum to the last bit.
 *
 * NaN policy: a missing value (NaN) counts as a row but not as a value; it changes no sum, extreme, first or last.
 *
 * Layout: one Float64Array with {@link STRIDE} numbers per period side by side, so a row touches one or two cache
 * lines. A store per field (14 typed arrays) made each row of a long file, whose consecutive rows go to different
 * keys, miss the cache 14 times: about 2.5 times slower on the ingest benchmark's 10,000 keys.
 *
 * Complexity: amortised O(1) per {@link PeriodStore.add}.
 */
export class PeriodStore {
  private base = 0;
  private size = 0;
  private slots = new Float64Array(0);
  // Periods whose exact count of millionths passed 2^53, as bigints.
  private readonly big = new Map<number, bigint>();
  /** Cells of this column or key that could not be read, or whose row has an unreadable date (each reported). */
  rejected = 0;
  /** Set when a row arrived for an earlier instant than the row before it. */
  outOfOrderLine = 0;
  /**
   * Set when two dated rows of one period carry different days or times (daily rows in a monthly pack): the rows
   * are finer than the pack. A label (`2026-10`) beside a date of its month is a repeat, not finer rows.
   */
  finer = false;
  private previous = -Infinity;

  /** Add one row's value (NaN for a missing cell) at its stamp, from file line (or row) `line`. */
  add(stamp: Stamp, value: number, line: number): void {
    const at = stamp.at;
    if (at < this.previous && this.outOfOrderLine === 0) this.outOfOrderLine = line;
    this.previous = at;
    this.ensure(stamp.period);
    const o = (stamp.period - this.base) * STRIDE;
    const a = this.slots;
    // SEEN_AT: the first row's instant, NaN when that row was a label.
    const dated = stamp.grain === 'day';
    if (a[o + ROWS] === 0) {
      a[o + LINE] = line;
      a[o + SEEN_AT] = dated ? at : NaN;
    } else {
      if (a[o + SECOND_LINE] === 0) a[o + SECOND_LINE] = line;
      if (dated && !Number.isNaN(a[o + SEEN_AT]) && at !== a[o + SEEN_AT]) this.finer = true;
    }
    a[o + ROWS]++;
    if (Number.isNaN(value)) return;
    if (a[o + VALUES] === 0) {
      a[o + SUM] = value;
      a[o + MIN] = value;
      a[o + MAX] = value;
      a[o + FIRST_AT] = at;
      a[o + FIRST] = value;
      a[o + LAST_AT] = at;
      a[o + LAST] = value;
      const u = microUnits(value);
      a[o + EXACT] = Number.isNaN(u) ? 0 : 1;
      a[o + UNITS] = Number.isNaN(u) ? 0 : u;
    } else {
      a[o + SUM] += value;
      if (value < a[o + MIN]) a[o + MIN] = value;
      if (value > a[o + MAX]) a[o + MAX] = value;
      // Ties in time keep the earlier row for `first` and the later row for `last` (file order).
      if (at < a[o + FIRST_AT]) {
        a[o + FIRST_AT] = at;
        a[o + FIRST] = value;
      }
      if (at >= a[o + LAST_AT]) {
        a[o + LAST_AT] = at;
        a[o + LAST] = value;
      }
      if (a[o + EXACT] === 1) this.addUnits(stamp.period, o, value);
    }
    a[o + VALUES]++;
  }

  /**
   * Set one period from a summary made elsewhere (a database that grouped the rows): rows and values counted, the
   * exact sum in millionths (`units`, a number while below 2^53), extremes, and whether its rows fell on more than one
   * instant. For periods of day-dated rows only; the first and last values are not known (NaN).
   */
  put(
    period: number,
    s: {rows: number; values: number; units: number | bigint; min: number; max: number; instants: boolean},
  ): void {
    this.ensure(period);
    const o = (period - this.base) * STRIDE;
    const a = this.slots;
    a[o + ROWS] = s.rows;
    a[o + VALUES] = s.values;
    a[o + EXACT] = 1;
    if (typeof s.units === 'number') a[o + UNITS] = s.units;
    else if (s.units >= -MAX_UNITS && s.units <= MAX_UNITS) a[o + UNITS] = Number(s.units);
    else this.big.set(period, s.units);
    a[o + MIN] = s.min;
    a[o + MAX] = s.max;
    a[o + FIRST] = NaN;
    a[o + LAST] = NaN;
    if (s.instants) this.finer = true;
  }

  /** Rows, values and the summaries of one period (zero counts, NaN summaries when no row fell in it). */
  at(period: number): PeriodSummary {
    const i = period - this.base;
    const o = i * STRIDE;
    const a = this.slots;
    if (i < 0 || i >= this.size || a[o + ROWS] === 0) return EMPTY;
    const has = a[o + VALUES] > 0;
    const v = (field: number) => (has ? a[o + field] : NaN);
    return {
      rows: a[o + ROWS],
      values: a[o + VALUES],
      sum: !has ? NaN : a[o + EXACT] === 1 ? this.exactSum(period, o) : a[o + SUM],
      min: v(MIN),
      max: v(MAX),
      first: v(FIRST),
      last: v(LAST),
      line: a[o + LINE],
      secondLine: a[o + SECOND_LINE],
    };
  }

  /** First and last periods with a row (`rows`) or with a value (default), or undefined when there is none. */
  range(of: 'values' | 'rows' = 'values'): {first: number; last: number} | undefined {
    const field = of === 'rows' ? ROWS : VALUES;
    let first = -1;
    let last = -1;
    for (let i = 0; i < this.size; i++) {
      if (this.slots[i * STRIDE + field] > 0) {
        if (first < 0) first = i;
        last = i;
      }
    }
    return first < 0 ? undefined : {first: this.base + first, last: this.base + last};
  }

  /** Periods (in order) whose first two rows are both lines of the file: candidates for a duplicate problem. */
  repeated(): number[] {
    const out: number[] = [];
    for (let i = 0; i < this.size; i++) if (this.slots[i * STRIDE + SECOND_LINE] !== 0) out.push(this.base + i);
    return out;
  }

  /** Make room for the periods `first` … `last` at once when the store is empty (a store filled from summaries knows its span). */
  reserve(first: number, last: number): void {
    if (this.size === 0) {
      this.base = first;
      this.resize(0, last - first + 1);
    }
  }

  /** Add a value's millionths to the exact sum of `period` (slot offset o), or mark that sum as not exact. */
  private addUnits(period: number, o: number, value: number): void {
    const a = this.slots;
    const u = microUnits(value);
    if (Number.isNaN(u)) {
      a[o + EXACT] = 0;
      return;
    }
    const big = this.big.size > 0 ? this.big.get(period) : undefined;
    const next = a[o + UNITS] + u;
    if (big !== undefined) this.big.set(period, big + BigInt(u));
    else if (Math.abs(next) <= Number.MAX_SAFE_INTEGER) a[o + UNITS] = next;
    // Beyond 2^53 a double would round: the count goes on as a bigint.
    else this.big.set(period, BigInt(a[o + UNITS]) + BigInt(u));
  }

  private exactSum(period: number, o: number): number {
    const big = this.big.size > 0 ? this.big.get(period) : undefined;
    return (big === undefined ? this.slots[o + UNITS] : Number(big)) / UNITS_PER_ONE;
  }

  private ensure(period: number): void {
    if (this.size === 0) {
      this.base = period;
      this.resize(0, 16);
      return;
    }
    if (period >= this.base && period < this.base + this.size) return;
    const low = Math.min(period, this.base);
    const high = Math.max(period, this.base + this.size - 1);
    const capacity = Math.max(2 * this.size, high - low + 1);
    // Leave room on the side that grew, so rows arriving newest-first also grow in O(1) amortised.
    const newBase = period < this.base ? high - capacity + 1 : low;
    this.resize(this.base - newBase, capacity);
    this.base = newBase;
  }

  private resize(shift: number, capacity: number): void {
    const slots = new Float64Array(capacity * STRIDE);
    slots.set(this.slots, shift * STRIDE);
    this.slots = slots;
    this.size = capacity;
  }
}

// The numbers of one period's slot.
const ROWS = 0;
const VALUES = 1;
const LINE = 2;
const SECOND_LINE = 3;
const SUM = 4;
const MIN = 5;
const MAX = 6;
const FIRST_AT = 7;
const FIRST = 8;
const LAST_AT = 9;
const LAST = 10;
const SEEN_AT = 11;
/** Exact sum in millionths, and whether the period's sum is still exact (1) or a sum of doubles (0). */
const UNITS = 12;
const EXACT = 13;
/** Numbers per period. */
const STRIDE = 14;

/** What one period of a store holds. */
export interface PeriodSummary {
  rows: number;
  values: number;
  sum: number;
  min: number;
  max: number;
  first: number;
  last: number;
  /** Line (or row) of the period's first row and of its second (0 when fewer rows). */
  line: number;
  secondLine: number;
}

const MAX_UNITS = BigInt(Number.MAX_SAFE_INTEGER);

const EMPTY: PeriodSummary = {
  rows: 0,
  values: 0,
  sum: NaN,
  min: NaN,
  max: NaN,
  first: NaN,
  last: NaN,
  line: 0,
  secondLine: 0,
};
