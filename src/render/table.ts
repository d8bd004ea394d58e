import type {Words} from '../words/index.js';

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

/** Triggers of formula evaluation in spreadsheet programs, as the first non-blank character of a cell. */
const FORMULA_START = /^[\s\u0000]*[=+\-@\t\r\n\u0000\uFF1D\uFF0B\uFF0D\uFF20]/;

/** A text cell made inert for spreadsheets: a leading `'` when it could start a formula (see exportTables). */
export function neutralise(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

/** Non-finite numbers become empty cells; text is neutralised. */
export function cell(value: string | number | null | undefined): Cell {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number') return Number.isFinite(value) ? value : null;
  return neutralise(value);
}

/**
 * A table's column headers in the pack's language: each header is a column key (`year_on_year_pct`) worded by
 * the catalogue's `column.<key>` message (English keeps the key itself, so English exports read as before);
 * a series id used as a header stays as it is.
 */
export function headers(table: Table, w: Words): string[] {
  return table.columns.map((c) => {
    const key = `column.${c.header}`;
    return key in COLUMN_KEYS ? w.t(key as 'column.period') : c.header;
  });
}

/** Every column key of the exports, worded by the catalogues' `column.<key>` messages. */
export const COLUMNS = [
  'period',
  'original',
  'adjusted',
  'trend',
  'seasonal',
  'irregular',
  'calendar',
  'cycle_gap_pct',
  'year_on_year_pct',
  'horizon',
  'origins',
  'summary_position',
  'actual',
  'current',
  'error',
  'forecast',
  'forecast_next',
  'mase',
  'mean',
  'outturn',
  'previous',
  'rank',
  'target',
  'value',
  'adjusted_change_annualised_pct',
  'adjusted_change_pct',
  'revision_pct',
  'smape_pct',
  'target_gap_pct',
  'trend_change_pct',
  'year_to_date_pct',
  'chart',
  'cycle_phase',
  'figures',
  'fiscal_year',
  'forecast_method',
  'kind',
  'label',
  'large',
  'measure',
  'method',
  'model',
  'published_in',
  'role',
  'rule',
  'series',
  'severity',
  'text',
  'trend_direction',
  'unit',
  'part',
  'setting',
] as const;

/** The same, as message keys. */
const COLUMN_KEYS: Record<string, true> = Object.fromEntries(
  COLUMNS.map((c) => [`column.${c}`, true]),
);
