import type {SourcePlan} from '../config/plan.js';
import type {Frequency} from '../time/period.js';
import {CellReader} from './cells.js';
import * as msg from './messages.js';
import type {ProblemLog} from './problemLog.js';
import {acrossVisitor} from './readAcross.js';
import {readCsv} from './readCsv.js';
import {longVisitor, type LongVisitor} from './readLong.js';
import {wideVisitor} from './readWide.js';
import type {RowVisitor} from './rowVisitor.js';
import type {SourceData, Wanted} from './sourceData.js';
import {lineHoldingColumn} from './titleLines.js';
import type {InputFile} from './types.js';

/**
 * Read one source into period stores, whatever its reader (CSV, XLSX, DuckDB or PostgreSQL query), reporting
 * bad headers, dates, numbers and short rows at their place. Rows with a bad date or value are skipped; the
 * rest is still checked, so one run lists every problem.
 */
export async function readSource(
  source: SourcePlan,
  wanted: Wanted,
  frequency: Frequency,
  locale: string,
  problems: ProblemLog,
): Promise<SourceData> {
  const cells = new CellReader(source, frequency, problems, locale);
  const data: SourceData = {input: undefined, stores: new Map(), headerLine: 1, columnNumbers: new Map(), notes: [], cells};
  const long = source.layout === 'long' ? longVisitor(cells, wanted, data) : undefined;
  const across = source.layout === 'across' ? acrossVisitor(cells, wanted, data) : undefined;
  const visitor = long ?? across ?? wideVisitor(cells, wanted, data);
  data.input = await rowsOf(cells, visitor, problems, long && {visitor: long, wanted});
  // Reported even when the read failed later on, so a date problem found first is not lost.
  cells.settleDates();
  if (data.input !== undefined) {
    if (data.input.rows > 0) (long ?? across)?.finish();
    data.notes.push(...cells.finish());
    if (data.input.rows === 0) cells.report(source.reader === 'csv' ? data.headerLine : null, null, msg.noRows());
  }
  return data;
}

/** The reader of a source; the workbook and database libraries load only for packs that use them (about 1 s). */
async function rowsOf(
  cells: CellReader,
  visitor: RowVisitor,
  problems: ProblemLog,
  long: {visitor: LongVisitor; wanted: Wanted} | undefined,
): Promise<InputFile | undefined> {
  switch (cells.source.reader) {
    case 'csv': {
      const {file, encoding} = cells.source;
      cells.headerBelow = (name, after) => lineHoldingColumn(file, encoding, after, name);
      return readCsv(cells.source, visitor, problems);
    }
    case 'xlsx':
      return (await import('./readXlsx.js')).readXlsx(cells, visitor, problems);
    case 'duckdb':
      return (await import('./readDuckdb.js')).readDuckdb(cells, visitor, long);
    case 'postgres':
      return (await import('./readPostgres.js')).readPostgres(cells, visitor);
  }
}
