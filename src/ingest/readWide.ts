import {formatPeriod} from '../time/period.js';
import type {CellReader} from './cells.js';
import * as msg from './messages.js';
import {PeriodStore} from './periodStore.js';
import type {CsvVisitor} from './readCsv.js';
import type {SourceData, Wanted} from './sourceData.js';

/**
 * Visitor for a wide source: one row per period, a date column and one column per series. A period
 * given by two rows is a problem naming both lines (the second row is skipped).
 */
export function wideVisitor(cells: CellReader, wanted: Wanted, data: SourceData): CsvVisitor {
  const file = cells.source.file;
  const columns: {at: number; name: string; store: PeriodStore}[] = [];
  const rowLines = new Map<number, number>();
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
          cells.problems.add(file, line, null, msg.duplicateColumn(name, repeats));
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
      if (fields.every((f) => f.trim() === '')) return;
      if (fields.length < width) cells.problems.add(file, line, null, msg.shortRow(fields.length, width));
      const period = cells.period(fields[cells.dateColumn] ?? '', line);
      if (period === undefined) {
        // The row's values are unusable, not missing: a column is not then reported as all blank.
        for (const {store} of columns) store.rejected++;
        return;
      }
      const before = rowLines.get(period);
      if (before !== undefined) {
        const label = formatPeriod(cells.frequency, period);
        cells.problems.add(file, line, cells.dateColumn + 1, msg.duplicateRow(label, before, line));
        return;
      }
      rowLines.set(period, line);
      if (period < previous && !outOfOrder) {
        outOfOrder = true;
        data.notes.push({file, line, series: null, note: msg.outOfOrder(line)});
      }
      previous = period;
      for (const {at, name, store} of columns) {
        const value = cells.value(fields[at] ?? '', line, at, name);
        if (value !== undefined) store.set(period, value, line);
        else store.rejected++;
      }
    },
  };
}
