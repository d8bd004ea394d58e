import type {Stamp} from '../time/stamp.js';

/**
 * The rows of one column or key, summed up by pack period as they arrive in any order: for each period the
 * number of rows and of values, their sum, minimum and maximum, the value at the earliest and at the latest
 * instant, and the file lines of its first two rows (so a duplicate can name both). These are all that any
 * `aggregate` needs (derive/aggregate.ts), so memory grows with periods, never with rows: about 90 bytes per
 * period from the earliest to the latest seen, whatever the number of rows.
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

  /** Rows, values and the summaries of one period (zero counts, NaN summaries when no row fell in it). */
  at(period: number): PeriodSummary {
    const i = period - this.base;
    if (i < 0 || i >= this.size || this.rowCount[i] === 0) return EMPTY;
    const has = this.valueCount[i] > 0;
    const v = (a: Float64Array) => (has ? a[i] : NaN);
    return {
      rows: this.rowCount[i],
      values: this.valueCount[i],
      sum: v(this.sum),
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
    const grow = <T extends Uint32Array | Float64Array>(a: T, make: (n: number) => T): T => {
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
