import {once} from 'node:events';
import {createWriteStream, mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {performance} from 'node:perf_hooks';

import {formatPeriod, monthIndex} from '../../src/time/period.js';
import {fromSource, plan, readPack, source} from '../ingest/plan.js';

const KEYS = 10_000;
const MONTHS = 120;

/**
 * Ingest benchmark: a long-layout CSV of 10,000 series × 120 months (1.2 M rows, about 40 MB), read
 * through a `fromSource` entry so every key becomes a series. Prints rows per second (wall clock and per
 * CPU second, which is steadier on a busy machine) and the peak resident set size, which stays bounded
 * because rows are streamed and values go straight into one Float64Array per key.
 */
export async function run(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'ebbflow-bench-ingest-'));
  try {
    const file = join(dir, 'long.csv');
    await writeLongCsv(file);
    const src = source('big', file, {layout: 'long', dateColumn: 'date', keyColumn: 'series', valueColumn: 'value'});
    const p = plan('monthly', [src], [], {fromSource: [fromSource('big', 0)]});
    const rssBefore = process.memoryUsage().rss;
    const t0 = performance.now();
    const cpu0 = process.cpuUsage();
    const dataset = await readPack(p);
    const seconds = (performance.now() - t0) / 1000;
    const cpu = process.cpuUsage(cpu0);
    const cpuSeconds = (cpu.user + cpu.system) / 1e6;
    const rows = dataset.inputs[0].rows;
    const peakMb = process.resourceUsage().maxRSS / 1024;
    console.log(
      `ingest long CSV: ${rows} rows, ${dataset.series.length} series, ` +
        `${(dataset.inputs[0].bytes / 1e6).toFixed(1)} MB ` +
        `in ${seconds.toFixed(2)} s = ${Math.round(rows / seconds)} rows/s (CPU ${cpuSeconds.toFixed(2)} s, ` +
        `${Math.round(rows / cpuSeconds)} rows per CPU second); ` +
        `RSS before ${(rssBefore / 2 ** 20).toFixed(0)} MB, peak ${peakMb.toFixed(0)} MB`,
    );
  } finally {
    rmSync(dir, {recursive: true, force: true});
  }
}

/** Rows grouped by month (as exported from a database), values from a fixed formula, no randomness. */
async function writeLongCsv(file: string): Promise<void> {
  const out = createWriteStream(file);
  out.write('date,series,value\n');
  const start = monthIndex(2016, 1);
  for (let m = 0; m < MONTHS; m++) {
    const date = formatPeriod('monthly', start + m);
    const lines: string[] = [];
    for (let k = 0; k < KEYS; k++) lines.push(`${date},Account ${k},${(1000 + k + 37 * Math.sin(m + k)).toFixed(2)}`);
    if (!out.write(lines.join('\n') + '\n')) await once(out, 'drain');
  }
  out.end();
  await once(out, 'finish');
}
