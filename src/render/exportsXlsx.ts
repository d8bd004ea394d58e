import ExcelJS from 'exceljs';
import {civilFromDays, periodStartDay} from '../time/period.js';
import type {ColumnFormat, Table} from './table.js';
import type {Report} from './types.js';

/** Display formats; the cells keep full precision. Percent columns already hold percent (5.2 = 5.2%). */
const NUMBER_FORMATS: Record<ColumnFormat, string | undefined> = {
  text: undefined,
  number: '#,##0.00',
  percent: '0.0',
  factor: '0.0000',
  integer: '0',
};

/**
 * The tables as one XLSX workbook: one sheet per table, a bold frozen header row, number formats per column.
 *
 * Deterministic: the workbook's created/modified dates and every zip entry's timestamp are set to the day
 * after the review period ends (the same date the PDF carries), never the clock, so the same report gives
 * the same bytes. Sheet names are made valid and unique ({@link sheetNames}).
 */
export async function writeXlsx(tables: Table[], report: Report): Promise<Uint8Array> {
  const {year, month, day} = civilFromDays(periodStartDay(report.plan.frequency, report.period + 1));
  const date = new Date(Date.UTC(year, month - 1, day));
  const wb = new ExcelJS.Workbook();
  wb.creator = 'ebbflow';
  wb.lastModifiedBy = 'ebbflow';
  wb.title = report.plan.title;
  wb.created = date;
  wb.modified = date;
  const names = sheetNames(tables.map((t) => t.sheet));
  tables.forEach((table, i) => {
    const ws = wb.addWorksheet(names[i], {views: [{state: 'frozen', ySplit: 1}]});
    ws.columns = table.columns.map((c) => ({
      header: c.header,
      width: Math.min(60, Math.max(10, c.header.length + 2)),
      style: NUMBER_FORMATS[c.format] ? {numFmt: NUMBER_FORMATS[c.format]} : {},
    }));
    ws.getRow(1).font = {bold: true};
    for (const row of table.rows) ws.addRow(row);
  });
  const buffer = await wb.xlsx.writeBuffer();
  return stampZip(new Uint8Array(buffer as ArrayBuffer), year, month, day);
}

/**
 * Valid, unique worksheet names: characters `[]:*?/\` replaced by `_`, no leading/trailing apostrophe,
 * at most 31 characters, not blank, unique ignoring case (a `~2`, `~3`… suffix is added when needed).
 * These are the XLSX rules for sheet names (ECMA-376 and common spreadsheet programs).
 */
export function sheetNames(wanted: string[]): string[] {
  const used = new Set<string>();
  return wanted.map((w) => {
    const base = w.replace(/[[\]:*?/\\]/g, '_').replace(/^'+|'+$/g, '').trim().slice(0, 31) || 'Sheet';
    let name = base;
    for (let k = 2; used.has(name.toLowerCase()); k++) {
      const suffix = `~${k}`;
      name = `${base.slice(0, 31 - suffix.length)}${suffix}`;
    }
    used.add(name.toLowerCase());
    return name;
  });
}

/**
 * Set the modification date of every entry of a zip file to `year-month-day 00:00` (MS-DOS date fields in
 * the local and central headers; PKWARE APPNOTE 4.4.6), in a copy. CRCs and sizes do not cover the
 * timestamps, so the archive stays valid.
 *
 * Complexity: O(entries). Throws `invalid zip` when no end-of-central-directory record is found.
 */
export function stampZip(zip: Uint8Array, year: number, month: number, day: number): Uint8Array {
  const out = zip.slice();
  const view = new DataView(out.buffer, out.byteOffset, out.byteLength);
  let eocd = -1;
  for (let p = out.length - 22; p >= Math.max(0, out.length - 22 - 65535); p--) {
    if (view.getUint32(p, true) === 0x06054b50) {
      eocd = p;
      break;
    }
  }
  if (eocd < 0) throw new Error('invalid zip');
  const dosDate = ((Math.max(year, 1980) - 1980) << 9) | (month << 5) | day;
  const entries = view.getUint16(eocd + 10, true);
  let p = view.getUint32(eocd + 16, true);
  for (let i = 0; i < entries; i++) {
    if (view.getUint32(p, true) !== 0x02014b50) throw new Error('invalid zip');
    view.setUint16(p + 12, 0, true);
    view.setUint16(p + 14, dosDate, true);
    const local = view.getUint32(p + 42, true);
    view.setUint16(local + 10, 0, true);
    view.setUint16(local + 12, dosDate, true);
    p += 46 + view.getUint16(p + 28, true) + view.getUint16(p + 30, true) + view.getUint16(p + 32, true);
  }
  return out;
}
