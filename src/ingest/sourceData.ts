import type {CellReader} from './cells.js';
import type {PeriodStore} from './periodStore.js';
import type {DataNote, InputFile} from './types.js';

/** What one source gave: a store per wide column or long key, in header or first-seen order. */
export interface SourceData {
  /** Undefined when the source could not be read to the end (problems say why). */
  input: InputFile | undefined;
  stores: Map<string, PeriodStore>;
  /** Line (or row) of the header, for problems about columns. */
  headerLine: number;
  /** Wide layout: 1-based column number of each stored column. */
  columnNumbers: Map<string, number>;
  notes: DataNote[];
  /**
   * The cell reader that read the source: its places (for problems found later, such as duplicates), the
   * grain of its dates and the span of days its rows cover (for incomplete periods).
   */
  cells: CellReader;
}

/** Which wide columns or long keys to keep, each with the ids of the series naming it; `all`: every long key. */
export interface Wanted {
  names: Map<string, string[]>;
  all: boolean;
  /** Pack file and the pack line of the first series naming each key, so a missing key points at the pack. */
  pack?: {file: string; lines: Map<string, number>};
  /**
   * Whether some series reading the source takes the first or last value of a period (`aggregate: first|last`, or a
   * stock's default): those depend on the rows' order, so an engine may not sum the rows up for ingest.
   */
  ordered?: boolean;
}
