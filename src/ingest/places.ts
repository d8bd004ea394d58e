import type {SourcePlan} from '../config/plan.js';

/** A problem's or note's place: what errors.ts prints before the message, and a prefix for the message. */
export interface Place {
  file: string;
  line: number | null;
  column: number | null;
  /** Put before the message (query sources name the source and row there). */
  prefix: string;
}

/** `A`, `B`, … `Z`, `AA`: a spreadsheet column name from its 1-based number. */
export function columnName(column: number): string {
  let name = '';
  for (let n = column; n > 0; n = Math.floor((n - 1) / 26)) name = String.fromCharCode(65 + ((n - 1) % 26)) + name;
  return name;
}

/**
 * A sheet's name as a cell reference writes it: as is when it is a plain name (letters of any script, digits, `_`
 * and `.`, not starting with a digit and not itself a cell address like `Q1`), else in single quotes with any
 * quote doubled, as spreadsheet formulas write it (`'Plan 2026'!B12`, `'Tom''s'!A1`; the sheet references of
 * ECMA-376 and OpenFormula).
 */
export function sheetReference(sheet: string): string {
  const plain = /^[\p{L}_][\p{L}\p{N}_.]*$/u.test(sheet) && !/^[A-Za-z]{1,3}[0-9]+$/.test(sheet);
  return plain ? sheet : `'${sheet.replace(/'/g, "''")}'`;
}

/**
 * How a place is written for one source, from the 1-based line (CSV), row (XLSX) or row of the query's result,
 * and the 1-based column when known:
 *
 * - CSV: `data/tills.csv:12:3`
 * - XLSX: `data/budget.xlsx:Budget!C12` (the whole row `Budget!12:12` when no column is known; a sheet name with
 *   spaces or other signs quoted, `'Plan 2026'!C12`)
 * - query: the pack file at the source's line, the message starting `source ledger, query row 12: `
 */
export function placeAt(source: SourcePlan, sheet: string | null, line: number | null, column: number | null): Place {
  if (source.reader === 'csv') return {file: source.file, line, column, prefix: ''};
  if (source.reader === 'xlsx') {
    const cell = line === null ? '' : column === null ? `!${line}:${line}` : `!${columnName(column)}${line}`;
    const name = sheet === null ? '' : cell === '' ? sheet : sheetReference(sheet);
    return {file: `${source.file}:${name}${cell}`, line: null, column: null, prefix: ''};
  }
  const row = line === null ? '' : `, query row ${line}`;
  return {file: source.file, line: source.line, column: null, prefix: `source ${source.id}${row}: `};
}
