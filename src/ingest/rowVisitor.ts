/**
 * Receives the rows of a source as text fields, whatever the reader (CSV, XLSX, query): first the header, then
 * each data record with its 1-based line (CSV), row (XLSX) or result row (query).
 */
export interface RowVisitor {
  /** Return false to stop reading (the header lacks a needed column). */
  header(fields: string[], line: number): boolean;
  record(fields: string[], line: number): void;
}
