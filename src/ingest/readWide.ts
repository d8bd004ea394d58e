import type {CellReader} from './cells.js';
import * as msg from './messages.js';
import {PeriodStore} from './periodStore.js';
import {blankRow, type RowVisitor} from './rowVisitor.js';
import type {SourceData, Wanted} from './sourceData.js';

/**
 * Visitor for a wide source: one row per date, a date column and one column per series. Each value goes
 * straight into its column's store at the row's stamp; whether two rows of one period are a duplicate or
 * rows to aggregate is decided once the whole source is read (derive).
 */
export function wideVisitor(cells: CellReader, wanted: Wanted, data: SourceData): RowVisitor {
  const columns: {at: number; name: string; store: PeriodStore}[] = [];
  let width = 0;
  let previous = -Infinity;
  let outOfOrder = false;
  return {
    header(header, line) {
      data.headerLine = line;
      width = header.length;
      cells.dateColumn = cells.column(header, line, 'date column', cells.source.dateColumn);
      for (const [name, ids] of wanted.names) {
        const at = cells.column(header, line, `column of series ${ids.join(', ')}`, name);
        if (at < 0) continue;
        const repeats = header.flatMap((h, i) => (h === name ? [i + 1] : []));
        if (repeats.length > 1) {
          cells.report(line, null, msg.duplicateColumn(name, repeats));
          continue;
        }
        const store = new PeriodStore();
        data.stores.set(name, store);
        data.columnNumbers.set(name, at + 1);
        columns.push({at, name, store});
      }
      return cells.dateColumn >= 0;
    },
    record(fields, line) {
      // Spreadsheets often end a file with rows of bare delimiters.
      if (blankRow(fields)) return;
      const stamp = cells.stamp(fields[cells.dateColumn] ?? '', line);
      if (stamp === undefined) {
        // The row's values are unusable, not missing: a column is not then reported as all blank.
        for (const {store} of columns) store.rejected++;
        return;
      }
      if (fields.length < width) cells.report(line, null, msg.shortRow(fields.length, width), {key: 'short row'});
      // A query's rows have no order of their own unless it sorts them: no note for them.
      if (stamp.at < previous && !outOfOrder && cells.source.query === null) {
        outOfOrder = true;
        data.notes.push(cells.note(line, {code: 'outOfOrder', values: {line: String(line)}}));
      }
      previous = stamp.at;
      for (const {at, name, store} of columns) {
        const value = cells.value(fields[at] ?? '', line, at, name);
        if (value !== undefined) store.add(stamp, value, line);
        else store.rejected++;
      }
    },
  };
}
