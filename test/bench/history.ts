/**
 * History benchmark: a back-filled year of a large pack. Eleven monthly periods of 10,000 series (120 months each,
 * 12-month forecasts with two bands) are archived into a temporary folder, then the history of the twelfth is
 * loaded in a child process of its own, which reports its time and peak resident memory (so nothing the parent
 * held while writing counts). `EBBFLOW_BENCH_HISTORY_SERIES` sets another series count.
 * Run through `npm run bench` or `node dist/test/bench/run.js history` (not on import).
 */
import {execFileSync} from 'node:child_process';
import {mkdtemp, rm} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {fileURLToPath} from 'node:url';
import {archive} from '../../src/archive/index.js';
import {digestOfReport, report} from '../archive/fixtures/report.js';

const EARLIER = 11;
const LENGTH = 120;

export async function run(): Promise<void> {
  const count = Number(process.env.EBBFLOW_BENCH_HISTORY_SERIES ?? 10_000);
  const specs = Array.from({length: count}, (_, i) => ({id: `line-${i + 1}`, length: LENGTH}));
  const out = await mkdtemp(join(tmpdir(), 'ebbflow-bench-history-'));
  try {
    for (let p = 0; p < EARLIER; p++) {
      const rep = report(2026, p + 1, specs);
      await archive({report: rep, digest: digestOfReport(rep), html: null, pdf: null, exports: [], outDir: out, force: false, plan: {}, warnings: []});
    }
    const child = fileURLToPath(new URL('./historyChild.js', import.meta.url));
    const measured = JSON.parse(execFileSync(process.execPath, ['--expose-gc', child, out, String(count)], {encoding: 'utf8'}));
    console.log(
      `history of the 12th period from ${EARLIER} earlier periods of ${count} series: ` +
        `${(measured.ms / 1000).toFixed(1)} s (CPU ${(measured.cpuMs / 1000).toFixed(1)} s), ` +
        `RSS ${measured.beforeMiB} MiB before (this period's figures), peak ${measured.peakMiB} MiB ` +
        `(${measured.tracking} tracked forecasts, ${measured.revisions} revisions)`,
    );
  } finally {
    await rm(out, {recursive: true, force: true});
  }
}
