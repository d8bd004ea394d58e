/** One cell: text, a number (never a pre-formatted string), or empty. */
export type Cell = string | number | null;

/** How a column is shown in the workbook; CSV always writes full-precision numbers. */
export type ColumnFormat = 'text' | 'number' | 'percent' | 'factor' | 'integer';

export interface Column {
  header: string;
  format: ColumnFormat;
}

/** A table behind the report: one CSV file and one worksheet. */
export interface Table {
  /** File name without extension, e.g. `series-net-sales`. */
  name: string;
  /** Wanted sheet name (made valid and unique when the workbook is written). */
  sheet: string;
  columns: Column[];
  rows: Cell[][];
}
