import type {SourcePlan} from '../config/plan.js';
import {didYouMean} from '../config/suggest.js';
import type {Frequency} from '../time/period.js';
import {labelFrequency, parseDateCell} from '../time/parseDate.js';
import * as msg from './messages.js';
import {numberAdvice, parseNumberCell} from './parseNumber.js';
import type {ProblemLog} from './problemLog.js';
import {sniffDelimiter} from './sniffDelimiter.js';

/** Most distinct date texts remembered per file: long files repeat each date once per key. */
const DATE_CACHE = 4096;

/**
 * Reads the cells of one source (header columns, dates, numbers), reporting each bad cell at its
 * line and 1-based column with what to do about it. A wrong frequency is reported once per file.
 */
export class CellReader {
  /** 0-based index of the date column, once the header is known. */
  dateColumn = -1;
  private readonly dates = new Map<string, number | undefined>();
  private mixedReported = false;

  constructor(
    readonly source: SourcePlan,
    readonly frequency: Frequency,
    readonly problems: ProblemLog,
  ) {}

  /** 0-based index of a header name, or -1 with a problem suggesting the nearest name or the right delimiter. */
  column(header: string[], line: number, what: string, name: string): number {
    const at = header.indexOf(name);
    if (at >= 0) return at;
    // A one-column header that another delimiter splits: the source declares the wrong delimiter.
    const declared = this.source.delimiter;
    const found = header.length === 1 && declared !== 'auto' ? sniffDelimiter(header[0]) : declared;
    const message =
      found !== declared && header[0].includes(found)
        ? msg.missingColumnDelimiter(what, name, declared, found)
        : msg.missingColumn(what, name, didYouMean(name, header), header);
    this.problems.add(this.source.file, line, null, message);
    return at;
  }

  /** Period index of a date cell, or undefined (problem reported). */
  period(text: string, line: number): number | undefined {
    let period = this.dates.get(text);
    if (period === undefined && !this.dates.has(text)) {
      period = parseDateCell(text, this.frequency);
      if (this.dates.size >= DATE_CACHE) this.dates.clear();
      this.dates.set(text, period);
    }
    if (period !== undefined) return period;
    const {file, dateColumn: name} = this.source;
    const column = this.dateColumn + 1;
    const shown = text.trim();
    const found = labelFrequency(shown);
    if (found !== undefined && found !== this.frequency) {
      if (!this.mixedReported) {
        this.problems.add(file, line, column, msg.mixedFrequency(shown, name, found, this.frequency));
      }
      this.mixedReported = true;
    } else if (shown === '') this.problems.add(file, line, column, msg.blankDate(name));
    else this.problems.add(file, line, column, msg.badDate(shown, name, this.frequency));
    return undefined;
  }

  /** Number in a cell (NaN when missing), or undefined (problem reported). */
  value(text: string, line: number, at: number, name: string): number | undefined {
    const value = parseNumberCell(text, this.source.decimal);
    if (value === undefined) {
      const advice = numberAdvice(text, this.source.decimal);
      this.problems.add(this.source.file, line, at + 1, msg.notANumber(text.trim(), name, advice));
    }
    return value;
  }
}
