import {basename} from 'node:path';
import {didYouMean} from '../config/suggest.js';
import type {CellReader} from './cells.js';
import * as msg from './messages.js';
import {plainDecimal} from './parseNumber.js';
import {PeriodStore} from './periodStore.js';
import {blankRow, type RowVisitor} from './rowVisitor.js';
import type {SourceData, Wanted} from './sourceData.js';

/**
 * Visitor for a long source: one row per (key, date) with date, key and value columns. Only the keys
 * the pack asks for are kept (all of them for `fromSource`), each straight into its own store, so memory
 * grows with keys × periods, not with rows. `finish` reports keys the pack names but the source lacks,
 * at the pack line of the series that names the key when `wanted.pack` gives it.
 *
 * A query's rows have no order of their own (unless it sorts them), so for query sources the keys come in text
 * order (code units) and no note says that rows were out of date order; a query whose engine already summed the rows
 * by period (duckdbSummary.ts) then reads exactly like its rows one by one.
 */
export function longVisitor(cells: CellReader, wanted: Wanted, data: SourceData): LongVisitor {
  const {keyColumn: keyName, valueColumn: valueName} = cells.source;
  const keyLabel = keyName ?? '';
  const valueLabel = valueName ?? '';
  let keyAt = -1;
  let valueAt = -1;
  let width = 0;
  let outOfOrder = 0;
  const skipped = new Set<string>();
  const query = cells.source.query !== null;
  const keep = keyStores(wanted, data, skipped);
  /**
   * A clean row read in place (no arrays, no cut fields but the key): a key already seen, the date of the row before,
   * a plain decimal value. Anything else is left to `record`, which reads it the same way or reports its problem.
   */
  function line(s: string, start: number, end: number, lineNo: number, d: string): boolean {
    let at = start;
    for (let f = 0; f < width; f++) {
      const next = f === width - 1 ? end : s.indexOf(d, at);
      if (next === -1 || next > end) return false;
      bounds[2 * f] = at;
      bounds[2 * f + 1] = next;
      at = next + 1;
    }
    if (at <= end) return false;
    const date = 2 * cells.dateColumn;
    const stamp = cells.repeatedDate(s, bounds[date], bounds[date + 1]);
    if (stamp === undefined) return false;
    const store = data.stores.get(s.slice(bounds[2 * keyAt], bounds[2 * keyAt + 1]).trim());
    if (store === undefined) return false;
    const value = plainDecimal(s, bounds[2 * valueAt], bounds[2 * valueAt + 1]);
    if (value === undefined) return false;
    store.add(stamp, value, lineNo);
    if (outOfOrder === 0 && store.outOfOrderLine !== 0) outOfOrder = store.outOfOrderLine;
    return true;
  }
  // Clean CSV lines are read in place: decimal point, exactly the header's fields.
  const inPlace = cells.source.reader === 'csv' && cells.source.decimal === '.';
  const bounds: number[] = [];
  return {
    keep,
    ...(inPlace ? {line} : {}),
    header(header, line) {
      data.headerLine = line;
      width = header.length;
      cells.dateColumn = cells.column(header, line, 'date column', cells.source.dateColumn);
      keyAt = cells.column(header, line, 'key column', keyLabel);
      valueAt = cells.column(header, line, 'value column', valueLabel);
      return cells.dateColumn >= 0 && keyAt >= 0 && valueAt >= 0;
    },
    record(fields, line) {
      // Spreadsheets often end a file with rows of bare delimiters.
      if (blankRow(fields)) return;
      const key = (fields[keyAt] ?? '').trim();
      let store = data.stores.get(key);
      const stamp = cells.stamp(fields[cells.dateColumn] ?? '', line);
      if (stamp === undefined) {
        if (store !== undefined) store.rejected++;
        return;
      }
      if (fields.length < width) cells.report(line, null, msg.shortRow(fields.length, width), {key: 'short row'});
      if (store === undefined) {
        if (key === '') {
          const repeat = {key: 'blank key', where: `column "${keyLabel}"`};
          if (!cells.reportUnusable(line, keyAt)) cells.report(line, keyAt + 1, msg.blankKey(keyLabel), repeat);
          return;
        }
        store = keep(key);
        if (store === undefined) return;
      }
      const value = cells.value(fields[valueAt] ?? '', line, valueAt, valueLabel);
      if (value === undefined) {
        store.rejected++;
        return;
      }
      store.add(stamp, value, line);
      if (outOfOrder === 0 && store.outOfOrderLine !== 0) outOfOrder = store.outOfOrderLine;
    },
    finish() {
      if (outOfOrder !== 0 && !query) {
        data.notes.push(cells.note(outOfOrder, {code: 'outOfOrder', values: {line: String(outOfOrder)}}));
      }
      if (query) {
        const sorted = [...data.stores].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
        data.stores.clear();
        for (const [key, store] of sorted) data.stores.set(key, store);
      }
      missingKeys(cells, wanted, data, skipped, keyLabel);
    },
  };
}

/**
 * The store of a key, made on first sight when the pack wants the key (every key for `fromSource`); undefined, and
 * the key remembered in `skipped` (for suggestions), when it does not.
 */
export function keyStores(
  wanted: Wanted,
  data: SourceData,
  skipped: Set<string>,
): (key: string) => PeriodStore | undefined {
  return (key) => {
    let store = data.stores.get(key);
    if (store !== undefined) return store;
    if (!wanted.all && !wanted.names.has(key)) {
      skipped.add(key);
      return undefined;
    }
    store = new PeriodStore();
    data.stores.set(key, store);
    return store;
  };
}

/**
 * Report the keys the pack names but the source lacks (read and `skipped` keys are suggested), at the pack line of
 * the series that names the key when `wanted.pack` gives it, else at the source.
 */
export function missingKeys(
  cells: CellReader,
  wanted: Wanted,
  data: SourceData,
  skipped: Set<string>,
  keyLabel: string,
): void {
  const keys = [...data.stores.keys(), ...skipped];
  for (const [key, ids] of wanted.names) {
    if (data.stores.has(key)) continue;
    const message = msg.missingKey(keyLabel, key, ids.join(', '), didYouMean(key, keys));
    // The key is written in the pack, so the problem points at the series entry that names it.
    const line = wanted.pack?.lines.get(key);
    if (wanted.pack !== undefined && line !== undefined)
      cells.problems.add(wanted.pack.file, line, null, `${basename(cells.source.file)}: ${message}`);
    else cells.report(null, null, message);
  }
}

/** The long visitor: rows one by one, or a key's store for a summary made by the engine (`keep`, undefined when the
 * pack does not want the key), and `finish` once the source is read. */
export interface LongVisitor extends RowVisitor {
  keep(key: string): PeriodStore | undefined;
  finish(): void;
}
