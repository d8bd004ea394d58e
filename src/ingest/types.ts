import type {Note, QueryPlace} from '../words/index.js';
import type {SeriesPlan} from '../config/plan.js';
import type {Frequency} from '../time/period.js';

/** One series on a regular calendar, ending at the review period. */
export interface Series {
  id: string;
  frequency: Frequency;
  /** Period index of values[0]. */
  start: number;
  /** One value per period up to and including the review period; NaN where missing (gaps are kept, never dropped). */
  values: Float64Array;
  /**
   * Values after the review period, kept only for series another series names as its `target` (a budget runs to
   * the end of the fiscal year); empty otherwise. Never analysed as data.
   */
  ahead: Float64Array;
  sourceId: string;
  /** Absolute path of the CSV or workbook it came from; the pack file for a query source. */
  file: string;
}

/**
 * Something worth telling the reader about the data (not fatal), as a coded note that the words module words in the
 * pack's language: `series` is the id of the series it is about (or null), `query` the query source and row it came
 * from (query sources only).
 */
export interface DataNote {
  file: string;
  line: number | null;
  series: string | null;
  note: Note;
  query?: QueryPlace;
}

/** An input file (or query) as read, for the manifest and the data-notes page. */
export interface InputFile {
  /** Absolute path; for a query, `<source id> (<engine> query)`. */
  file: string;
  sha256: string;
  bytes: number;
  /** Data rows read (header excluded). */
  rows: number;
  /** Workbooks: the sheet read (a workbook two sources read is listed once per sheet). */
  sheet?: string;
  /**
   * Query sources: the engine and the query text as written in the pack. The hash is of the rows it returned, or,
   * when `summarised`, of the per-key, per-period summaries the engine computed from them (ingest/duckdbSummary.ts).
   */
  query?: {engine: 'duckdb' | 'postgres'; text: string; summarised?: boolean};
}

/** Everything ingest produced for one pack. */
export interface Dataset {
  /** Review period index: the pack's period, or the last period with data in any series. */
  period: number;
  /** Every series the pack reads from a source (visible and hidden), in pack order; derive adds the formulas. */
  series: Series[];
  inputs: InputFile[];
  notes: DataNote[];
  /**
   * The plan of each series: the pack's own series and those expanded from `fromSource` entries (id = slug of
   * the key, label = column = key), in pack order, derived series (formulas) included. Always set by `ingest`.
   */
  plans: SeriesPlan[];
}
