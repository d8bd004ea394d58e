/**
 * Back-fill benchmark: the demo pack (sample-config/monthly-pack.yaml) built for the 12 periods 2025-11..2026-10
 * through the command line (`ebbflow build --period 2025-11..2026-10 --formats json,html,pdf`) into a temporary
 * folder, so every stage runs as a user would run it, one browser shared by the whole range. Prints the seconds of
 * each period (the time between the folder lines the CLI prints), the total and the mean per period.
 * Run through `npm run bench` or `node dist/test/bench/run.js backfill` (not on import).
 */
import {mkdtemp, rm} from 'node:fs/promises';
import {availableParallelism, tmpdir} from 'node:os';
import {basename, join} from 'node:path';
import {performance} from 'node:perf_hooks';
import {main, type Io} from '../../src/cli/main.js';
import {packageRoot} from '../../src/version.js';

const RANGE = '2025-11..2026-10';

export async function run(): Promise<void> {
  const pack = join(packageRoot(), 'sample-config', 'monthly-pack.yaml');
  const out = await mkdtemp(join(tmpdir(), 'ebbflow-bench-backfill-'));
  const jobs = availableParallelism();
  const finished: {period: string; at: number}[] = [];
  let stderr = '';
  const io: Io = {
    // The CLI prints one period folder per line on stdout as each period is archived.
    stdout: {
      write: (text: string) => {
        const at = performance.now();
        for (const line of text.split('\n').filter(Boolean)) finished.push({period: basename(line), at});
      },
    },
    stderr: {write: (text: string) => (stderr += text)},
  };
  try {
    const start = performance.now();
    const cpu = process.cpuUsage();
    const args = ['build', pack, '--period', RANGE, '--out', out, '--formats', 'json,html,pdf', '--jobs', String(jobs)];
    const code = await main(args, io);
    const total = (performance.now() - start) / 1000;
    const used = process.cpuUsage(cpu);
    if (code !== 0) {
      console.log(`backfill: build failed with exit code ${code}\n${stderr}`);
      return;
    }
    const skipped = stderr.split('\n').find((l) => l.startsWith('warning:') && /pdf/i.test(l));
    if (skipped) console.log(`backfill: ${skipped} (timings exclude the PDF)`);
    let previous = start;
    for (const f of finished) {
      console.log(`backfill: ${f.period} ${((f.at - previous) / 1000).toFixed(1)} s`);
      previous = f.at;
    }
    const cpuSeconds = (used.user + used.system) / 1e6;
    const perPeriod = (total / finished.length).toFixed(1);
    console.log(
      `backfill: ${finished.length} periods in ${total.toFixed(1)} s wall, ${perPeriod} s per period ` +
        `(${jobs} analysis threads; process CPU incl. worker threads ${cpuSeconds.toFixed(1)} s, browser not included)`,
    );
  } finally {
    await rm(out, {recursive: true, force: true});
  }
}
