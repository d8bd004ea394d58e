/**
 * Receives the rows of a source as text fields, whatever the reader (CSV, XLSX, query): first the header, then
 * each data record with its 1-based line (CSV), row (XLSX) or result row (query).
 */
export interface RowVisitor {
  /** Return false to stop reading (the header lacks a needed column). */
  header(fields: string[], line: number): boolean;
  record(fields: string[], line: number): void;
  /**
   * A CSV line without quotes, `s` from `start` to `end`, fields cut by the one-character `delimiter`, offered before
   * it is cut into fields: return true when it was read whole (the common clean row), false to have it cut and
   * handed to {@link RowVisitor.record} instead, having changed nothing.
   */
  line?(s: string, start: number, end: number, line: number, delimiter: string): boolean;
}

/** Whether every field is blank (spreadsheets end files with rows of bare delimiters); stops at the first that is not. */
export function blankRow(fields: string[]): boolean {
  for (const f of fields) if (f.length > 0 && f.trim() !== '') return false;
  return true;
}
