import type {SourcePlan} from '../config/plan.js';
import type {Frequency} from '../time/period.js';
import {CellReader} from './cells.js';
import * as msg from './messages.js';
import type {ProblemLog} from './problemLog.js';
import {readCsv} from './readCsv.js';
import {longVisitor} from './readLong.js';
import {wideVisitor} from './readWide.js';
import type {SourceData, Wanted} from './sourceData.js';

/**
 * Read one source into period stores, reporting bad headers, dates, numbers, duplicates and short rows
 * with line and column. Rows with a bad date or value are skipped; the rest of the file is still checked,
 * so one run lists every problem.
 */
export async function readSource(
  source: SourcePlan,
  wanted: Wanted,
  frequency: Frequency,
  problems: ProblemLog,
): Promise<SourceData> {
  const data: SourceData = {input: undefined, stores: new Map(), headerLine: 1, columnNumbers: new Map(), notes: []};
  const cells = new CellReader(source, frequency, problems);
  if (source.layout === 'wide') {
    data.input = await readCsv(source, wideVisitor(cells, wanted, data), problems);
  } else {
    const visitor = longVisitor(cells, wanted, data);
    data.input = await readCsv(source, visitor, problems);
    if (data.input !== undefined && data.input.rows > 0) visitor.finish();
  }
  if (data.input !== undefined && data.input.rows === 0) problems.add(source.file, data.headerLine, null, msg.noRows());
  return data;
}
