import path from 'node:path';
import {DuckDBInstance, StatementType} from '@duckdb/node-api';
import type {CellReader} from './cells.js';
import {duckdbSummary} from './duckdbSummary.js';
import * as msg from './messages.js';
import {QueryRows} from './queryRows.js';
import type {LongVisitor} from './readLong.js';
import type {RowVisitor} from './rowVisitor.js';
import type {Wanted} from './sourceData.js';
import type {InputFile} from './types.js';

/** A SQL string literal. */
const quote = (s: string) => `'${s.replace(/'/g, "''")}'`;

/**
 * Run a source's query in a fresh in-memory DuckDB (the embedded engine of `@duckdb/node-api`) and hand its rows
 * to a visitor as text, through {@link QueryRows} (canonical text hashed for the manifest).
 *
 * The engine is locked down before the query runs, as settings on the connection in this order (measured: list
 * settings cannot be passed at creation): time zone UTC; `allowed_directories` = the pack's folder and each
 * `--allow-dir`; external access, extension auto-install and auto-load off; configuration locked. Only built-in
 * extensions work (parquet, json, icu, core functions), so nothing is downloaded. The query must be one statement
 * of type SELECT (`WITH … SELECT` and `FROM …` count): `COPY … TO`, `ATTACH`, `INSTALL`, `SET` and several
 * statements are refused before anything runs. Every column is cast to VARCHAR in the engine (`COLUMNS(*)::VARCHAR`),
 * so dates, timestamps and decimals arrive as DuckDB writes them (`2026-10-31`, `2026-10-31 10:00:00+00`), never
 * through local-time `Date` objects.
 *
 * Relative paths in the query (`read_parquet('data/orders.parquet')`) are relative to the pack's folder: DuckDB
 * resolves them against the process's working folder before it checks `allowed_directories`, so the working folder
 * is the pack's while the query runs and is restored afterwards (ingest reads one source at a time).
 *
 * Engine failures become problems at the source's pack line: a syntax or binder error with DuckDB's own first
 * line, a file outside the allowed folders, a missing extension, no rows.
 *
 * A long source is first offered to {@link duckdbSummary}, which has the engine sum the rows up by key and period
 * when that gives exactly what the rows would; otherwise (and for wide sources) the rows are read one by one.
 */
export async function readDuckdb(
  cells: CellReader,
  visitor: RowVisitor,
  long?: {visitor: LongVisitor; wanted: Wanted},
): Promise<InputFile | undefined> {
  const {source} = cells;
  const query = (source.query ?? '').trim().replace(/;\s*$/, '');
  const packDir = path.dirname(source.file);
  const instance = await DuckDBInstance.create(':memory:');
  const connection = await instance.connect();
  const cwd = process.cwd();
  try {
    const folders = source.readFolders.map((f) => quote(f.endsWith(path.sep) ? f : f + path.sep)).join(', ');
    for (const setting of [
      "SET TimeZone = 'UTC'",
      `SET allowed_directories = [${folders}]`,
      'SET enable_external_access = false',
      'SET autoinstall_known_extensions = false',
      'SET autoload_known_extensions = false',
      'SET lock_configuration = true',
    ])
      await connection.run(setting);
    let extracted;
    try {
      extracted = await connection.extractStatements(query);
    } catch (e) {
      cells.report(null, null, engineProblem(e));
      return undefined;
    }
    if (extracted.count !== 1) {
      cells.report(null, null, msg.queryNotOneSelect(extracted.count));
      return undefined;
    }
    process.chdir(packDir);
    const prepared = await extracted.prepare(0);
    if (prepared.statementType !== StatementType.SELECT) {
      prepared.destroySync();
      cells.report(null, null, msg.queryNotOneSelect(1));
      return undefined;
    }
    prepared.destroySync();
    const summary = long && (await duckdbSummary(connection, query, cells, long.visitor, long.wanted));
    if (summary) return summary;
    const result = await connection.stream(`SELECT COLUMNS(*)::VARCHAR FROM (${query}\n)`);
    const rows = new QueryRows(source, visitor);
    if (!rows.header(result.columnNames())) return undefined;
    for (;;) {
      const chunk = await result.fetchChunk();
      if (chunk === null || chunk.rowCount === 0) break;
      rows.rows(chunk.getRows() as (string | null)[][]);
    }
    if (rows.count === 0) {
      cells.report(null, null, msg.queryNoRows());
      return undefined;
    }
    return rows.input();
  } catch (e) {
    cells.report(null, null, engineProblem(e));
    return undefined;
  } finally {
    process.chdir(cwd);
    connection.closeSync();
    instance.closeSync();
  }
}

/**
 * A DuckDB error as a problem text: its kind decides the advice; its first line is DuckDB's own, followed by the
 * columns it offers for a misspelt one (its "Candidate bindings" line, nearest first).
 */
function engineProblem(e: unknown): string {
  const text = (e instanceof Error ? e.message : String(e)).replace(/^Failed to extract statements: /, '');
  const first = text.split('\n')[0].trim();
  if (/extension/i.test(first)) return msg.queryExtension(first);
  if (/^Permission Error/.test(first)) return msg.queryOutside(first.replace(/^Permission Error: /, ''));
  const candidates = /^Candidate bindings: (.+)$/m.exec(text)?.[1].trim();
  const detail = candidates ? `${first.replace(/!$/, '')} (the nearest columns: ${candidates})` : first;
  return msg.queryFailed('duckdb', detail);
}
