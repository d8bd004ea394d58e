import type {Problem} from '../errors.js';

/** Most problems listed per file; the rest are counted in one closing line, so a wrong file stays readable. */
export const PROBLEMS_PER_FILE = 50;
/** Problems of one kind (a column of `12.5%` cells) listed per file before the rest are counted in one line. */
export const REPEATS_LISTED = 3;

/** A problem that may recur along a file: the same kind of cell in the same column, row after row. */
export interface Repeat {
  /** Problems of one file with the same key are of one kind. */
  key: string;
  /** Where the line that counts the unlisted ones is printed (the file, or the workbook's sheet, or the pack). */
  file: string;
  line: number | null;
  /** That line's text, from the number of problems it stands for and the line (or row) of the last. */
  summary: (count: number, last: number | null) => string;
}

/** A listed entry: a problem, or the line standing for the unlisted problems of one kind. */
interface Entry {
  problem: Problem;
  /** The file the limit counts against. */
  source: string;
  /** Problems the entry stands for. */
  count: number;
  repeat?: Repeat;
  last?: number | null;
}

/**
 * Collects every problem across all sources, at most {@link PROBLEMS_PER_FILE} per file; of one kind (see
 * {@link Repeat}), the first {@link REPEATS_LISTED}, then one line counting the rest in place of the next.
 */
export class ProblemLog {
  private readonly entries: Entry[] = [];
  private readonly totals = new Map<string, number>();
  private readonly kinds = new Map<string, {listed: number; rest: Entry | null}>();
  private readonly listedPerSource = new Map<string, number>();
  private added = 0;

  /**
   * Add a problem at `file` (a workbook's `file` names its cell). `source` is the file it counts against, when
   * `file` is more than the file; `row`, its line or row there, when `line` does not say it (a workbook's cell).
   */
  add(
    file: string,
    line: number | null,
    column: number | null,
    message: string,
    {source = file, repeat, row = line}: {source?: string; repeat?: Repeat; row?: number | null} = {},
  ): void {
    this.added++;
    this.totals.set(source, (this.totals.get(source) ?? 0) + 1);
    if (repeat) {
      const id = `${source}\u0000${repeat.key}`;
      let kind = this.kinds.get(id);
      if (!kind) this.kinds.set(id, (kind = {listed: 0, rest: null}));
      if (kind.listed >= REPEATS_LISTED) {
        if (kind.rest) {
          kind.rest.count++;
          kind.rest.last = row;
        } else {
          const problem = {file: repeat.file, line: repeat.line, column: null, message: ''};
          kind.rest = {problem, source, count: 1, repeat, last: row};
          this.keep(kind.rest);
        }
        return;
      }
      kind.listed++;
    }
    this.keep({problem: {file, line, column, message}, source, count: 1});
  }

  /** Problems added so far, listed or not. */
  get size(): number {
    return this.added;
  }

  /**
   * Problems in the order found (a count of one kind's unlisted ones where the last listed was), then one line per
   * file that had more than the limit. `count` tells how many problems a counting line stands for.
   */
  list(): Problem[] {
    const shown = new Map<string, number>();
    const listed = this.entries.map((e) => {
      shown.set(e.source, (shown.get(e.source) ?? 0) + e.count);
      if (!e.repeat) return e.problem;
      return {...e.problem, message: e.repeat.summary(e.count, e.last ?? null), count: e.count};
    });
    const more: Problem[] = [];
    for (const [source, total] of this.totals) {
      const n = total - (shown.get(source) ?? 0);
      if (n > 0) {
        more.push({file: source, line: null, column: null, message: `${n} more problems not listed`, count: n});
      }
    }
    return [...listed, ...more];
  }

  private keep(entry: Entry): void {
    const listed = this.listedPerSource.get(entry.source) ?? 0;
    if (listed >= PROBLEMS_PER_FILE) return;
    this.listedPerSource.set(entry.source, listed + 1);
    this.entries.push(entry);
  }
}
