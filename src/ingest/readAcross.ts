import type {CellReader} from './cells.js';
import * as msg from './messages.js';
import {keyStores, missingKeys, type LongVisitor} from './readLong.js';
import {blankRow} from './rowVisitor.js';
import {dayMonthOrder, labelFrequency} from '../time/parseDate.js';
import type {Stamp} from '../time/stamp.js';
import type {SourceData, Wanted} from './sourceData.js';

/**
 * Visitor for an across source (a budget or plan sheet): one row per series, named in the key column, and one
 * column per period, headed by it (`Oct 2026`, `2026-10`, a workbook's date cell). Header cells that name no period
 * (`Unit`, `FY total`, a quarter's subtotal among months, notes) are columns the source does not read, named in one
 * data note. Each value goes into its row's store at
 * its column's period, so such a source reads like the long source of the same figures; only the rows the pack asks
 * for are kept (all of them for `fromSource`), and `finish` reports rows the pack names but the sheet lacks.
 *
 * Complexity: O(rows × columns). NaN policy: blank and missing cells are missing values, as in any source.
 */
export function acrossVisitor(cells: CellReader, wanted: Wanted, data: SourceData): LongVisitor {
  const keyLabel = cells.source.keyColumn ?? '';
  let keyAt = -1;
  let names: string[] = [];
  const periods: {at: number; stamp: Stamp}[] = [];
  const skipped = new Set<string>();
  const keep = keyStores(wanted, data, skipped);
  return {
    keep,
    header(header, line) {
      data.headerLine = line;
      names = header;
      keyAt = cells.column(header, line, 'key column', keyLabel);
      if (keyAt < 0) return false;
      // The key column stands in for the date column in problems about a row.
      cells.dateColumn = keyAt;
      const unread: string[] = [];
      header.forEach((text, at) => {
        if (at === keyAt || text.trim() === '') return;
        const stamp = cells.headerStamp(text, line);
        if (stamp !== undefined) periods.push({at, stamp});
        else unread.push(text.trim());
      });
      if (periods.length === 0) {
        cells.report(line, null, noPeriodsProblem(header, cells));
        return false;
      }
      // Columns a reader may have meant as periods (a month name of another language) are named, not passed over.
      if (unread.length > 0) {
        const list = unread.map((t) => `"${t}"`).join(', ');
        data.notes.push(cells.note(line, {code: 'columnsNotRead', values: {n: unread.length, list}}));
      }
      return true;
    },
    record(fields, line) {
      if (blankRow(fields)) return;
      const key = (fields[keyAt] ?? '').trim();
      if (key === '') {
        // A row without a name holds no series (a spacer or a heading over a block of rows) unless it has values.
        if (periods.some(({at}) => (fields[at] ?? '').trim() !== '')) {
          const repeat = {key: 'blank key', where: `column "${keyLabel}"`};
          if (!cells.reportUnusable(line, keyAt)) cells.report(line, keyAt + 1, msg.blankKey(keyLabel), repeat);
        }
        return;
      }
      const store = keep(key);
      if (store === undefined) return;
      for (const {at, stamp} of periods) {
        const value = cells.value(fields[at] ?? '', line, at, names[at]);
        if (value === undefined) store.rejected++;
        else store.add(stamp, value, line);
      }
    },
    finish() {
      missingKeys(cells, wanted, data, skipped, keyLabel);
    },
  };
}

/**
 * Why a header names no period: day-first or month-first dates without a `dateFormat` (parseDate.ts; the setting
 * named from a date that can only be read one way, when the header has one), periods coarser than the pack's, or
 * no dates at all.
 */
function noPeriodsProblem(header: string[], cells: CellReader): string {
  const dated = header.flatMap((h) => {
    const formats = dayMonthOrder(h);
    return formats ? [{text: h.trim(), formats}] : [];
  });
  const decisive = dated.find((d) => d.formats.length === 1) ?? dated[0];
  if (decisive) return msg.dayMonthHeader(decisive.text, decisive.formats);
  for (const h of header) {
    const found = labelFrequency(h.trim(), cells.reading);
    if (found !== undefined && found !== cells.frequency) return msg.mixedFrequencyHeader(h.trim(), found, cells.frequency);
  }
  return msg.noPeriodColumns(header);
}
