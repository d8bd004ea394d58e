import type {Stamp} from '../time/stamp.js';
import {microUnits, UNITS_PER_ONE} from './decimalUnits.js';

/**
 * The rows of one column or key, summed up by pack period as they arrive in any order: for each period the
 * number of rows and of values, their sum, minimum and maximum, the value at the earliest and at the latest
 * instant, and the file lines of its first two rows (so a duplicate can name both). These are all that any
 * `aggregate` needs (derive/aggregate.ts), so memory grows with periods, never with rows: about 100 bytes per
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
 * Complexity: amortised O(1) per {@link PeriodStore.add}.
 */
export class PeriodStore {
  private base = 0;
  private size = 0;
  private rowCount = new Uint32Array(0);
  private valueCount = new Uint32Array(0);
  private lines = new Uint32Array(0);
  private secondLines = new Uint32Array(0);
  // One slot per period each (plain fields: a record of arrays made the hot loop several times slower).
  private sum = new Float64Array(0);
  private min = new Float64Array(0);
  private max = new Float64Array(0);
  private firstAt = new Float64Array(0);
  private first = new Float64Array(0);
  private lastAt = new Float64Array(0);
  private last = new Float64Array(0);
  private seenAt = new Float64Array(0);
  // Exact sums in millionths, and whether each period's sum is still exact; counts beyond 2^53 by period in `big`.
  private units = new Float64Array(0);
  private exact = new Uint8Array(0);
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
    const i = stamp.period - this.base;
    // seenAt: the first row's instant, NaN when that row was a label.
    const dated = stamp.grain === 'day';
    if (this.rowCount[i] === 0) {
      this.lines[i] = line;
      this.seenAt[i] = dated ? at : NaN;
    } else {
      if (this.secondLines[i] === 0) this.secondLines[i] = line;
      if (dated && !Number.isNaN(this.seenAt[i]) && at !== this.seenAt[i]) this.finer = true;
    }
    this.rowCount[i]++;
    if (Number.isNaN(value)) return;
    this.addUnits(stamp.period, i, value);
    if (this.valueCount[i] === 0) {
      this.sum[i] = value;
      this.min[i] = value;
      this.max[i] = value;
      this.firstAt[i] = at;
      this.first[i] = value;
      this.lastAt[i] = at;
      this.last[i] = value;
    } else {
      this.sum[i] += value;
      if (value < this.min[i]) this.min[i] = value;
      if (value > this.max[i]) this.max[i] = value;
      // Ties in time keep the earlier row for `first` and the later row for `last` (file order).
      if (at < this.firstAt[i]) {
        this.firstAt[i] = at;
        this.first[i] = value;
      }
      if (at >= this.lastAt[i]) {
        this.lastAt[i] = at;
        this.last[i] = value;
      }
    }
    this.valueCount[i]++;
  }

  /**
   * Set one period from a summary made elsewhere (a database that grouped the rows): rows and values counted, the
   * exact sum in millionths (`units`), extremes, and whether its rows fell on more than one instant. For periods of
   * day-dated rows only; the first and last values are not known (NaN).
   */
  put(period: number, s: {rows: number; values: number; units: bigint; min: number; max: number; instants: boolean}): void {
    this.ensure(period);
    const i = period - this.base;
    this.rowCount[i] = s.rows;
    this.valueCount[i] = s.values;
    this.exact[i] = 1;
    if (s.units >= -MAX_UNITS && s.units <= MAX_UNITS) this.units[i] = Number(s.units);
    else this.big.set(period, s.units);
    this.min[i] = s.min;
    this.max[i] = s.max;
    this.first[i] = NaN;
    this.last[i] = NaN;
    if (s.instants) this.finer = true;
  }

  /** Rows, values and the summaries of one period (zero counts, NaN summaries when no row fell in it). */
  at(period: number): PeriodSummary {
    const i = period - this.base;
    if (i < 0 || i >= this.size || this.rowCount[i] === 0) return EMPTY;
    const has = this.valueCount[i] > 0;
    const v = (a: Float64Array) => (has ? a[i] : NaN);
    return {
      rows: this.rowCount[i],
      values: this.valueCount[i],
      sum: !has ? NaN : this.exact[i] === 1 ? this.exactSum(period, i) : this.sum[i],
      min: v(this.min),
      max: v(this.max),
      first: v(this.first),
      last: v(this.last),
      line: this.lines[i],
      secondLine: this.secondLines[i],
    };
  }

  /** First and last periods with a row (`rows`) or with a value (default), or undefined when there is none. */
  range(of: 'values' | 'rows' = 'values'): {first: number; last: number} | undefined {
    const counts = of === 'rows' ? this.rowCount : this.valueCount;
    let first = -1;
    let last = -1;
    for (let i = 0; i < this.size; i++) {
      if (counts[i] > 0) {
        if (first < 0) first = i;
        last = i;
      }
    }
    return first < 0 ? undefined : {first: this.base + first, last: this.base + last};
  }

  /** Periods (in order) whose first two rows are both lines of the file: candidates for a duplicate problem. */
  repeated(): number[] {
    const out: number[] = [];
    for (let i = 0; i < this.size; i++) if (this.secondLines[i] !== 0) out.push(this.base + i);
    return out;
  }

  /** Add a value's millionths to the exact sum of `period` (slot i), or mark that sum as not exact. */
  private addUnits(period: number, i: number, value: number): void {
    const had = this.valueCount[i] > 0;
    if (had && this.exact[i] === 0) return;
    const u = microUnits(value);
    if (Number.isNaN(u)) {
      this.exact[i] = 0;
      return;
    }
    this.exact[i] = 1;
    const big = had && this.big.size > 0 ? this.big.get(period) : undefined;
    const next = (had ? this.units[i] : 0) + u;
    if (big !== undefined) this.big.set(period, big + BigInt(u));
    else if (Math.abs(next) <= Number.MAX_SAFE_INTEGER) this.units[i] = next;
    // Beyond 2^53 a double would round: the count goes on as a bigint.
    else this.big.set(period, BigInt(this.units[i]) + BigInt(u));
  }

  private exactSum(period: number, i: number): number {
    const big = this.big.size > 0 ? this.big.get(period) : undefined;
    return (big === undefined ? this.units[i] : Number(big)) / UNITS_PER_ONE;
  }

  /** Make room for the periods `first` … `last` at once when the store is empty (a store filled from summaries knows its span). */
  reserve(first: number, last: number): void {
    if (this.size === 0) {
      this.base = first;
      this.resize(0, last - first + 1);
    }
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
    const grow = <T extends Uint32Array | Float64Array | Uint8Array>(a: T, make: (n: number) => T): T => {
      const b = make(capacity);
      b.set(a, shift);
      return b;
    };
    this.rowCount = grow(this.rowCount, (n) => new Uint32Array(n));
    this.valueCount = grow(this.valueCount, (n) => new Uint32Array(n));
    this.lines = grow(this.lines, (n) => new Uint32Array(n));
    this.secondLines = grow(this.secondLines, (n) => new Uint32Array(n));
    const float = (n: number) => new Float64Array(n);
    this.sum = grow(this.sum, float);
    this.min = grow(this.min, float);
    this.max = grow(this.max, float);
    this.firstAt = grow(this.firstAt, float);
    this.first = grow(this.first, float);
    this.lastAt = grow(this.lastAt, float);
    this.last = grow(this.last, float);
    this.seenAt = grow(this.seenAt, float);
    this.units = grow(this.units, float);
    this.exact = grow(this.exact, (n) => new Uint8Array(n));
    this.size = capacity;
  }
}

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
