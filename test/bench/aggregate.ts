import {execFileSync} from 'node:child_process';
import {existsSync, mkdirSync, renameSync, statSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {performance} from 'node:perf_hooks';
import {fileURLToPath} from 'node:url';
import {DuckDBInstance} from '@duckdb/node-api';
import {fromSource, plan, readPack, source} from '../ingest/plan.js';

const KEYS = Number(process.env.EBBFLOW_BENCH_KEYS ?? 10_000);
const DAYS = Number(process.env.EBBFLOW_BENCH_DAYS ?? 1_000);

/**
 * Ingest with aggregation: KEYS series × DAYS daily transaction rows (default 10,000 × 1,000 = 10 million rows,
 * 1 January 2023 on, about 33 months), read as a long CSV and through DuckDB from Parquet, summed into months.
 * The files are written once by DuckDB into a folder under the system's temp folder (`ebbflow-bench-aggregate-…`)
 * and reused by later runs. Each reading runs in a child process of its own, so its peak resident set size is its
 * own; it prints rows per second of wall time and of CPU time (DuckDB's threads count in CPU time) and the peak.
 * Choose sizes with EBBFLOW_BENCH_KEYS and EBBFLOW_BENCH_DAYS.
 */
export async function run(): Promise<void> {
  const dir = join(tmpdir(), `ebbflow-bench-aggregate-${KEYS}x${DAYS}`);
  await writeFiles(dir);
  const self = fileURLToPath(import.meta.url);
  for (const kind of ['csv', 'duckdb']) {
    const out = execFileSync(process.execPath, [self, 'measure', kind, dir], {encoding: 'utf8', env: process.env});
    console.log(out.trim());
  }
}

/** The CSV and the Parquet file of the transactions, written by DuckDB (to a temporary name, then renamed). */
async function writeFiles(dir: string): Promise<void> {
  mkdirSync(dir, {recursive: true});
  const rows = `SELECT DATE '2023-01-01' + (i // ${KEYS})::INTEGER AS day, 'Account ' || (i % ${KEYS}) AS account, ` +
    `round(100 + (i % 97) * 1.5 + (i % ${KEYS}) / 100, 2)::DOUBLE AS amount FROM range(${KEYS * DAYS}) t(i)`;
  const db = await (await DuckDBInstance.create(':memory:')).connect();
  for (const [name, format] of [['tx.csv', "FORMAT csv, HEADER true"], ['tx.parquet', 'FORMAT parquet']]) {
    const file = join(dir, name);
    if (existsSync(file)) continue;
    const t0 = performance.now();
    await db.run(`COPY (${rows}) TO '${file}.part' (${format})`);
    renameSync(`${file}.part`, file);
    console.log(`wrote ${file} (${(statSync(file).size / 1e6).toFixed(0)} MB) in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
  }
  db.closeSync();
}

/** One reading, in this (child) process: ingest + derive of every key into monthly series. */
async function measure(kind: string, dir: string): Promise<void> {
  const long = {layout: 'long' as const, dateColumn: 'day', keyColumn: 'account', valueColumn: 'amount'};
  const src =
    kind === 'csv'
      ? source('tx', join(dir, 'tx.csv'), long)
      : source('tx', join(dir, 'pack.yaml'), {
          ...long,
          reader: 'duckdb',
          query: "SELECT day, account, amount FROM read_parquet('tx.parquet')",
          readFolders: [dir],
        });
  const p = plan('monthly', [src], [], {fromSource: [fromSource('tx', 0)], packFile: join(dir, 'pack.yaml')});
  const t0 = performance.now();
  const cpu0 = process.cpuUsage();
  const data = await readPack(p);
  const seconds = (performance.now() - t0) / 1000;
  const cpu = process.cpuUsage(cpu0);
  const cpuSeconds = (cpu.user + cpu.system) / 1e6;
  const rows = data.inputs[0].rows;
  const periods = data.series.reduce((n, s) => n + s.values.length, 0);
  console.log(
    `aggregate ${kind === 'csv' ? 'CSV   ' : 'DuckDB'}: ${rows} rows → ${data.series.length} series × ` +
      `${data.series[0].values.length} months in ${seconds.toFixed(2)} s = ${Math.round(rows / seconds)} rows/s ` +
      `(CPU ${cpuSeconds.toFixed(2)} s, ${Math.round(rows / cpuSeconds)} rows per CPU second); ` +
      `peak RSS ${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MB for ${periods} series-months`,
  );
}

if (process.argv[2] === 'measure' && process.argv[1] === fileURLToPath(import.meta.url)) {
  await measure(process.argv[3], process.argv[4]);
}
