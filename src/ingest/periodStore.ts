/**
 * Values of one column or key by period index, filled as rows arrive in any order.
 *
 * A growable window of slots, one per period from the earliest to the latest seen, with a parallel array
 * of the CSV line each value came from (0 = no row), so duplicates can name both lines. Memory is
 * 12 bytes per period between the first and last row, whatever the number of rows.
 *
 * Complexity: amortised O(1) per {@link PeriodStore.set}.
 */
export class PeriodStore {
  private base = 0;
  private values = new Float64Array(0);
  private lines = new Uint32Array(0);
  /** Cells of this column or key that could not be read, or whose row has an unreadable date (each reported). */
  rejected = 0;
  /** Set when a row arrived for an earlier period than the row before it. */
  outOfOrderLine = 0;
  private previous = -Infinity;

  /** Store a value (NaN for a missing cell); returns 0, or the line of an earlier row for the same period. */
  set(period: number, value: number, line: number): number {
    if (period < this.previous && this.outOfOrderLine === 0) this.outOfOrderLine = line;
    this.previous = period;
    this.ensure(period);
    const i = period - this.base;
    const before = this.lines[i];
    if (before !== 0) return before;
    this.values[i] = value;
    this.lines[i] = line;
    return 0;
  }

  /** The value at a period; NaN when no row gave one. */
  get(period: number): number {
    const i = period - this.base;
    return i >= 0 && i < this.values.length ? this.values[i] : NaN;
  }

  /** First and last periods holding a number (not NaN), or undefined when there is none. */
  dataRange(): {first: number; last: number} | undefined {
    let first = -1;
    let last = -1;
    for (let i = 0; i < this.values.length; i++) {
      if (!Number.isNaN(this.values[i])) {
        if (first < 0) first = i;
        last = i;
      }
    }
    return first < 0 ? undefined : {first: this.base + first, last: this.base + last};
  }

  private ensure(period: number): void {
    const size = this.values.length;
    if (size === 0) {
      this.base = period;
      this.resize(0, 16);
      return;
    }
    if (period >= this.base && period < this.base + size) return;
    const low = Math.min(period, this.base);
    const high = Math.max(period, this.base + size - 1);
    const capacity = Math.max(2 * size, high - low + 1);
    // Leave room on the side that grew, so rows arriving newest-first also grow in O(1) amortised.
    const newBase = period < this.base ? high - capacity + 1 : low;
    this.resize(this.base - newBase, capacity);
    this.base = newBase;
  }

  private resize(shift: number, capacity: number): void {
    const values = new Float64Array(capacity).fill(NaN);
    const lines = new Uint32Array(capacity);
    values.set(this.values, shift);
    lines.set(this.lines, shift);
    this.values = values;
    this.lines = lines;
  }
}
