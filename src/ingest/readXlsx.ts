import {createHash} from 'node:crypto';
import {readFile} from 'node:fs/promises';
import ExcelJS from 'exceljs';
import {didYouMean} from '../config/suggest.js';
import type {CellReader} from './cells.js';
import * as msg from './messages.js';
import type {ProblemLog} from './problemLog.js';
import type {RowVisitor} from './rowVisitor.js';
import type {InputFile} from './types.js';

/** How many rows below a title row the column names are looked for (CellReader.headerBelow). */
const TITLE_LOOK_ROWS = 50;

/**
 * Read one worksheet of an `.xlsx` workbook through a visitor, as rows of text fields, from the source's
 * `headerRow` on (rows above it are titles). The file is read once: hashed (SHA-256) and handed to exceljs.
 *
 * Cells as stored: numbers are written in full precision (`String(number)`, which reads back to the same double),
 * date cells (exceljs gives a `Date` anchored at UTC, honouring the workbook's 1900 or 1904 date system) as
 * `YYYY-MM-DD` or `YYYY-MM-DDTHH:mm:ss.sss` from their UTC fields, formulas through their cached result, rich
 * text as its plain text. A formula without a cached result, or an error value (`#DIV/0!`), is a problem at
 * `file.xlsx:Sheet!B12` where the pack reads that cell: a data row's date (the row is then skipped), key or value
 * (see CellReader.unusable). Such cells in columns no series reads, or in a totals row under the table, do not
 * matter.
 *
 * Memory: the whole workbook (exceljs reads it into memory); rows are visited one by one.
 */
export async function readXlsx(
  cells: CellReader,
  visitor: RowVisitor,
  problems: ProblemLog,
): Promise<InputFile | undefined> {
  const {source} = cells;
  let bytes: Buffer;
  try {
    bytes = await readFile(source.file);
  } catch (e) {
    problems.add(source.file, null, null, msg.unreadableFile((e as {code?: string}).code ?? 'EIO'));
    return undefined;
  }
  const workbook = new ExcelJS.Workbook();
  try {
    await workbook.xlsx.load(bytes as unknown as ArrayBuffer);
  } catch (e) {
    problems.add(source.file, null, null, msg.notAWorkbook(e instanceof Error ? e.message.split('\n')[0] : 'unknown'));
    return undefined;
  }
  const names = workbook.worksheets.map((w) => w.name);
  const sheet = source.sheet === null ? workbook.worksheets[0] : workbook.getWorksheet(source.sheet);
  if (sheet === undefined) {
    const message = source.sheet === null ? msg.noSheets() : msg.sheetNotFound(source.sheet, didYouMean(source.sheet, names), names);
    problems.add(source.file, null, null, message);
    return undefined;
  }
  cells.sheet = sheet.name;
  const width = sheet.columnCount;
  const last = sheet.rowCount;
  cells.headerBelow = (name, after) => {
    for (let r = after + 1; r <= Math.min(last, after + TITLE_LOOK_ROWS); r++) {
      const row = sheet.getRow(r);
      for (let c = 1; c <= width; c++) {
        const text = cellText(row.getCell(c).value, source.decimal);
        if (typeof text === 'string' && text.trim() === name) return r;
      }
    }
    return null;
  };
  if (last < source.headerRow) {
    cells.report(null, null, msg.headerBeyondEnd(source.headerRow, last));
    return undefined;
  }
  let rows = 0;
  for (let r = source.headerRow; r <= last; r++) {
    const row = sheet.getRow(r);
    const fields: string[] = [];
    const unusable = new Map<number, string>();
    for (let c = 1; c <= width; c++) {
      const text = cellText(row.getCell(c).value, source.decimal);
      if (typeof text === 'string') fields.push(text);
      else {
        unusable.set(c - 1, text.problem);
        fields.push('');
      }
    }
    if (r === source.headerRow) {
      for (const [c, problem] of unusable) cells.report(r, c + 1, problem);
      const header = fields.map((f) => f.trim());
      if (header.every((f) => f === '')) {
        cells.report(r, null, msg.emptyHeader(r));
        return undefined;
      }
      if (!visitor.header(header, r)) return undefined;
      continue;
    }
    cells.unusable = unusable;
    // A date cell without a usable value: the row cannot be placed (nor told from a footer).
    if (!cells.reportUnusable(r, cells.dateColumn)) {
      if (fields.some((f) => f !== '')) rows++;
      visitor.record(fields, r);
    }
  }
  cells.unusable = new Map();
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  return {file: source.file, sha256, bytes: bytes.length, rows, sheet: sheet.name};
}

type CellValue = ExcelJS.CellValue;

/**
 * A cell's value as text, or the problem it has. A number is written with the source's decimal mark, so that number
 * cells and numbers typed as text (`1.234,50` in a workbook kept with decimal commas) read alike.
 */
function cellText(value: CellValue, decimal: '.' | ','): string | {problem: string} {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return decimal === '.' ? String(value) : String(value).replace('.', ',');
  if (typeof value === 'string') return value;
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (value instanceof Date) return dateText(value);
  if ('error' in value) return {problem: msg.cellError(String(value.error))};
  if ('richText' in value) return value.richText.map((t) => t.text).join('');
  if ('formula' in value || 'sharedFormula' in value) {
    const result = (value as {result?: unknown}).result;
    if (result === undefined || result === null) {
      const formula = String('formula' in value ? value.formula : (value as {sharedFormula: string}).sharedFormula);
      return {problem: msg.formulaWithoutResult(formula)};
    }
    return cellText(result as CellValue, decimal);
  }
  if ('text' in value) return String((value as {text: unknown}).text);
  return '';
}

/** A date cell from its UTC fields (exceljs anchors serial dates at UTC): `2026-10-31`, or with the time of day. */
function dateText(d: Date): string {
  const day = d.toISOString().slice(0, 10);
  const time = ((d.getTime() % 86_400_000) + 86_400_000) % 86_400_000;
  return time === 0 ? day : d.toISOString().slice(0, 23);
}
