/**
 * Receives the rows of a source as text fields, whatever the reader (CSV, XLSX, query): first the header, then
 * each data record with its 1-based line (CSV), row (XLSX) or result row (query).
 */
export interface RowVisitor {
  /** Return false to stop reading (the header lacks a needed column). */
  header(fields: string[], line: number): boolean;
  record(fields: string[], line: number): void;
}

/** Whether every field is blank (spreadsheets end files with rows of bare delimiters); stops at the first that is not. */
export function blankRow(fields: string[]): boolean {
  for (const f of fields) if (f.length > 0 && f.trim() !== '') return false;
  return true;
}
