import type {SourcePlan} from '../config/plan.js';
import {didYouMean} from '../config/suggest.js';
import {monthNames} from '../time/monthNames.js';
import {periodStartDay, type Frequency} from '../time/period.js';
import {dayMonthOrder, labelFrequency, readDateCell, type DateReading} from '../time/parseDate.js';
import {stampOf, type Grain, type Stamp} from '../time/stamp.js';
import * as msg from './messages.js';
import {numberAdvice, parseNumberCell} from './parseNumber.js';
import {placeAt} from './places.js';
import {REPEATS_LISTED, type ProblemLog} from './problemLog.js';
import {sniffDelimiter} from './sniffDelimiter.js';
import type {Note} from '../words/index.js';
import type {DataNote} from './types.js';

/** A date that could be day first or month first, where it stands, and the later date that decides it. */
interface HeldDayMonth {
  line: number;
  column: number;
  text: string;
  formats: string[];
  decided?: {line: number; text: string; format: string};
}

/** The grain of a whole pack period. */
const PERIOD_GRAIN: Record<Frequency, Grain> = {monthly: 'month', quarterly: 'quarter', weekly: 'week'};

/** Most distinct date texts remembered per file: long files repeat each date once per key. */
const DATE_CACHE = 4096;

/**
 * Reads the cells of one source (header columns, dates, numbers), reporting each bad cell at its place
 * (line and column, sheet and cell, or query row) with what to do about it. Besides the stamps it keeps what
 * derive needs of the source as a whole: the grain of its dates (one grain per column: mixing days and months
 * is a problem once the rows are aggregated) and the span of days its rows cover.
 *
 * Rows whose date cell is blank or not a date are held back: if a dated row follows, each is a problem; if none
 * does, they were a footer (`Total;;1234`) and {@link CellReader.finish} turns them into one data note.
 */
export class CellReader {
  /**
   * The line (CSV) or row (XLSX) below `after` that holds a column name, set by the reader: a missing column under
   * a title line then names the line to give as `headerRow`. Null where the reader cannot look (queries).
   */
  headerBelow: ((name: string, after: number) => number | null) | null = null;
  /** 0-based index of the date column, once the header is known. */
  dateColumn = -1;
  /** Each grain of the dates read, with the first cell of that grain (derive decides whether a mix matters). */
  readonly grains = new Map<Grain, {line: number; text: string}>();
  /** First and last day covered by the rows (days since 1970-01-01), once a date was read. */
  span: {from: number; to: number} | undefined;
  /** First and last pack period any dated row fell in. */
  periods: {first: number; last: number} | undefined;
  /** XLSX: the worksheet being read, for places such as `budget.xlsx:Budget!B12`. */
  sheet: string | null = null;
  /**
   * XLSX: the cells of the row being read that hold no usable value (an error value, a formula saved without its
   * result), by 0-based column, with their problem; handed over as blank fields. Reported only when the row's
   * value, key or date is read from one of them, so a footer's or an unread column's cells do not matter.
   */
  unusable: ReadonlyMap<number, string> = new Map();
  private readonly dates = new Map<string, Stamp | undefined>();
  /** How its date cells are read (the source's `dateFormat`, the locale's month names). */
  readonly reading: DateReading;
  private readonly decimal: '.' | ',';
  private mixedReported = false;
  /**
   * The first date that could be day first or month first, held until a later date of the same column that can
   * only be one of them (`13/01/2025`) decides which `dateFormat` to name, or the source ends.
   */
  private dayMonth: HeldDayMonth | null = null;
  private lastText = '';
  private lastStamp: Stamp | undefined;
  private held: {line: number; text: string; report: () => void}[] = [];

  constructor(
    readonly source: SourcePlan,
    readonly frequency: Frequency,
    readonly problems: ProblemLog,
    locale: string,
  ) {
    this.reading = {dateFormat: source.dateFormat, months: monthNames(locale)};
    // Query cells hold numbers as numbers, which the readers write with a `.` decimal mark; a workbook's text cells
    // may be written with either, and its number cells are written with the source's (readXlsx.ts).
    this.decimal = source.reader === 'csv' || source.reader === 'xlsx' ? source.decimal : '.';
  }

  /**
   * Report a problem at a line (or row) and 1-based column of this source. A problem that can recur row after row
   * names its kind (`repeat.key`, and the column it is in as `repeat.where`): after the first few of a kind, the
   * log counts the rest in one line (problemLog.ts).
   */
  report(line: number | null, column: number | null, message: string, repeat?: {key: string; where?: string}): void {
    const p = placeAt(this.source, this.sheet, line, column);
    const whole = placeAt(this.source, this.sheet, null, null);
    const unit = this.source.reader === 'csv' ? 'line' : this.source.reader === 'xlsx' ? 'row' : 'query row';
    this.problems.add(p.file, p.line, p.column, p.prefix + message, {
      source: whole.file,
      row: line,
      ...(repeat && {
        repeat: {
          key: repeat.key,
          file: whole.file,
          line: whole.line,
          summary: (count: number, last: number | null) =>
            whole.prefix + msg.moreLikeThese(count, REPEATS_LISTED, repeat.where ?? null, unit, last),
        },
      }),
    });
  }

  /** A data note at a line (or row) of this source; a query source's note names the source and row. */
  note(line: number | null, note: Note): DataNote {
    const p = placeAt(this.source, this.sheet, line, null);
    const query = this.source.reader !== 'csv' && this.source.reader !== 'xlsx' ? {query: {source: this.source.id, row: line}} : {};
    return {file: p.file, line: p.line, series: null, note, ...query};
  }

  /** 0-based index of a header name, or -1 with a problem suggesting the nearest name or the right delimiter. */
  column(header: string[], line: number, what: string, name: string): number {
    const at = header.indexOf(name);
    if (at >= 0) return at;
    // A one-column header that another delimiter splits: the source declares the wrong delimiter.
    const declared = this.source.delimiter;
    const found =
      this.source.reader === 'csv' && header.length === 1 && declared !== 'auto' ? sniffDelimiter(header[0]) : declared;
    // A title line read as the header: the line below that holds the name, if the reader can look for one.
    const find = this.headerBelow;
    const title = header.filter((h) => h.trim() !== '').length <= 1;
    const below = find !== null && title ? find(name, line) : null;
    const message =
      found !== declared && header[0].includes(found)
        ? msg.missingColumnDelimiter(what, name, declared, found)
        : below !== null
          ? msg.columnBelowTitle(what, name, header, below, this.source.reader === 'xlsx' ? 'row' : 'line')
          : msg.missingColumn(what, name, didYouMean(name, header), header);
    this.report(line, null, message);
    return at;
  }

  /** The stamp of a date cell, or undefined (a problem reported, or the row held back as a possible footer). */
  stamp(text: string, line: number): Stamp | undefined {
    // Exports repeat a date on consecutive rows (one per key): the last one is checked before the cache.
    if (text === this.lastText && this.lastStamp !== undefined && this.held.length === 0) {
      this.cover(this.lastStamp);
      return this.lastStamp;
    }
    let stamp = this.dates.get(text);
    if (stamp === undefined && !this.dates.has(text)) {
      const cell = readDateCell(text, this.reading);
      stamp = cell === undefined ? undefined : stampOf(cell, this.frequency, this.source.timeZone);
      if (this.dates.size >= DATE_CACHE) this.dates.clear();
      this.dates.set(text, stamp);
    }
    if (stamp !== undefined) {
      this.release();
      if (!this.grains.has(stamp.grain)) this.grains.set(stamp.grain, {line, text: text.trim()});
      this.cover(stamp);
      this.lastText = text;
      this.lastStamp = stamp;
      return stamp;
    }
    this.badDate(text, line);
    return undefined;
  }

  /**
   * The stamp of a header cell that names a period (layout across), recorded as a date cell's is; undefined when the
   * cell names none (a label column such as `Unit` or `Total`). A day that starts or ends a pack period (a workbook's
   * `2026-01-01` or `2026-01-31` over a month's column) names that period. A coarser period than the pack's (a
   * quarter's subtotal among months) names none here.
   */
  headerStamp(text: string, line: number): Stamp | undefined {
    const cell = readDateCell(text, this.reading);
    let stamp = cell === undefined ? undefined : stampOf(cell, this.frequency, this.source.timeZone);
    if (stamp === undefined) return undefined;
    if (stamp.grain === 'day') {
      const from = periodStartDay(this.frequency, stamp.period);
      const to = periodStartDay(this.frequency, stamp.period + 1) - 1;
      if (stamp.from === from || stamp.from === to) {
        stamp = {period: stamp.period, at: from * 86_400_000, from, to, grain: PERIOD_GRAIN[this.frequency]};
      }
    }
    if (!this.grains.has(stamp.grain)) this.grains.set(stamp.grain, {line, text: text.trim()});
    this.cover(stamp);
    return stamp;
  }

  /**
   * The stamp of the date cell before, when the text `s` from `a` to `b` repeats it and no row is held back (what
   * {@link CellReader.stamp} would return for it, with nothing else to record), else undefined.
   */
  repeatedDate(s: string, a: number, b: number): Stamp | undefined {
    const last = this.lastText;
    if (this.lastStamp === undefined || this.held.length > 0 || b - a !== last.length) return undefined;
    return s.startsWith(last, a) ? this.lastStamp : undefined;
  }

  /** Number in a cell (NaN when missing), or undefined (problem reported). */
  value(text: string, line: number, at: number, name: string): number | undefined {
    if (this.reportUnusable(line, at)) return undefined;
    const value = parseNumberCell(text, this.decimal);
    if (value === undefined) {
      const advice = numberAdvice(text, this.decimal);
      const repeat = {key: `number ${at} ${advice}`, where: `column "${name}"`};
      this.report(line, at + 1, msg.notANumber(text.trim(), name, advice), repeat);
    }
    return value;
  }

  /** Report the problem of an unusable cell (see {@link CellReader.unusable}) when `at` is one; true if it was. */
  reportUnusable(line: number, at: number): boolean {
    const problem = this.unusable.get(at);
    if (problem !== undefined) this.report(line, at + 1, problem, {key: `unusable ${at}`});
    return problem !== undefined;
  }

  /**
   * Rows that a database engine summed up by period instead of handing them over (duckdbSummary.ts): all dated by
   * day, covering the days `from` … `to` and the pack periods `first` … `last`.
   */
  summarised(from: number, to: number, first: number, last: number): void {
    this.grains.set('day', {line: 1, text: ''});
    this.span = {from, to};
    this.periods = {first, last};
  }

  /**
   * Rows still held back at the end of the data: a footer, told in one note (or nothing when there is none). When
   * no row had a date they are no footer but the data, and each is a problem.
   */
  finish(): DataNote[] {
    if (this.held.length === 0) return [];
    if (this.span === undefined) {
      this.release();
      return [];
    }
    const {line, text} = this.held[0];
    const last = this.held[this.held.length - 1].line;
    this.held = [];
    const values = {rows: last - line + 1, column: this.source.dateColumn, text, blank: text === '' ? 'yes' : 'no', last: String(last)};
    return [this.note(line, {code: 'footerIgnored', values})];
  }

  /** Widen the span of days and the range of periods to a stamp. */
  private cover(stamp: Stamp): void {
    if (this.span === undefined || this.periods === undefined) {
      this.span = {from: stamp.from, to: stamp.to};
      this.periods = {first: stamp.period, last: stamp.period};
      return;
    }
    if (stamp.from < this.span.from) this.span.from = stamp.from;
    if (stamp.to > this.span.to) this.span.to = stamp.to;
    if (stamp.period < this.periods.first) this.periods.first = stamp.period;
    if (stamp.period > this.periods.last) this.periods.last = stamp.period;
  }

  private release(): void {
    if (this.held.length === 0) return;
    for (const h of this.held) h.report();
    this.held = [];
  }

  /** Report the held day-or-month date (see {@link CellReader.dayMonth}), with the later date that decides it. */
  settleDates(): void {
    const d = this.dayMonth;
    if (d === null) return;
    this.dayMonth = null;
    const name = this.source.dateColumn;
    const unit = this.source.reader === 'csv' ? 'line' : 'row';
    const message = d.decided
      ? msg.dayMonthDecided(d.text, name, {...d.decided, unit})
      : msg.dayMonthDate(d.text, name, d.formats);
    this.report(d.line, d.column, message);
  }

  private badDate(text: string, line: number): void {
    const name = this.source.dateColumn;
    const column = this.dateColumn + 1;
    const shown = text.trim();
    const found = labelFrequency(shown, this.reading);
    const order = this.source.dateFormat === null ? dayMonthOrder(shown) : undefined;
    if (found !== undefined && found !== this.frequency) {
      if (!this.mixedReported) this.report(line, column, msg.mixedFrequency(shown, name, found, this.frequency));
      this.mixedReported = true;
    } else if (order !== undefined) {
      // One order: reported at once. Either order: held until a later date decides it or the source ends.
      if (!this.mixedReported && order.length === 1) this.report(line, column, msg.dayMonthDate(shown, name, order));
      else if (!this.mixedReported) this.dayMonth = {line, column, text: shown, formats: order};
      else if (this.dayMonth !== null && order.length === 1) {
        this.dayMonth.decided = {line, text: shown, format: order[0]};
        this.settleDates();
      }
      this.mixedReported = true;
    } else {
      const message = shown === '' ? msg.blankDate(name) : msg.badDate(shown, name, this.frequency);
      const repeat = {key: 'date', where: `column "${name}"`};
      this.held.push({line, text: shown, report: () => this.report(line, column, message, repeat)});
    }
  }
}
