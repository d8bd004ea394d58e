import type {Problem} from '../errors.js';

/** Most problems listed per file; the rest are counted in one closing line, so a wrong file stays readable. */
export const PROBLEMS_PER_FILE = 50;

/** Collects every problem across all sources, at most {@link PROBLEMS_PER_FILE} per file. */
export class ProblemLog {
  private readonly kept: Problem[] = [];
  private readonly counts = new Map<string, number>();

  add(file: string, line: number | null, column: number | null, message: string): void {
    const n = (this.counts.get(file) ?? 0) + 1;
    this.counts.set(file, n);
    if (n <= PROBLEMS_PER_FILE) this.kept.push({file, line, column, message});
  }

  get size(): number {
    return this.kept.length;
  }

  /** Problems in the order found, then one line per file that had more than the limit. */
  list(): Problem[] {
    const more: Problem[] = [];
    for (const [file, n] of this.counts) {
      if (n > PROBLEMS_PER_FILE) {
        more.push({file, line: null, column: null, message: `${n - PROBLEMS_PER_FILE} more problems not listed`});
      }
    }
    return [...this.kept, ...more];
  }
}
