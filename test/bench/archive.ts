/**
 * Archive-stage benchmark: write 12 monthly period folders of one pack (20 series × 120 months,
 * 0.5 MB HTML, 0.3 MB PDF stand-in, a CSV export each), regenerate index.html over the 12 periods,
 * and load the history (revisions + forecast tracking) of the 12th period from the 11 before it.
 * Prints medians of wall-clock and CPU time over several repetitions. Run through `npm run bench` (not on import).
 */
import {mkdtemp, rm} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {archive, writeIndex} from '../../src/archive/index.js';
import {loadHistory} from '../../src/history/index.js';
import {digestOfReport, report} from '../archive/fixtures/report.js';

const PERIODS = 12;
const SERIES = 20;
const LENGTH = 120;
const REPEATS = 3;

/** Wall-clock and CPU (user + system) milliseconds; CPU time stays meaningful on a busy machine. */
interface Timing {
  wall: number;
  cpu: number;
}

function start(): () => Timing {
  const wall = performance.now();
  const cpu = process.cpuUsage();
  return () => {
    const used = process.cpuUsage(cpu);
    return {wall: performance.now() - wall, cpu: (used.user + used.system) / 1000};
  };
}

export async function run(): Promise<void> {
  const specs = Array.from({length: SERIES}, (_, i) => ({id: `line-${i + 1}`, length: LENGTH}));
  const html = `<!DOCTYPE html>${'<p>filler paragraph</p>'.repeat(25_000)}`;
  const pdf = new Uint8Array(300_000).map((_, i) => i & 255);
  const archiveMs: Timing[] = [];
  const indexMs: Timing[] = [];
  const historyMs: Timing[] = [];
  for (let r = 0; r < REPEATS; r++) {
    const out = await mkdtemp(join(tmpdir(), 'ebbflow-bench-archive-'));
    try {
      for (let p = 0; p < PERIODS; p++) {
        const rep = report(2026 + Math.floor(p / 12), (p % 12) + 1, specs);
        const t0 = start();
        await archive({
          report: rep,
          digest: digestOfReport(rep),
          html,
          pdf,
          exports: [{name: 'series.csv', content: 'period,value\n'.repeat(2_000)}],
          outDir: out,
          force: false,
          plan: rep.plan,
          warnings: [],
        });
        archiveMs.push(t0());
      }
      const t1 = start();
      await writeIndex(out, 'harbourline-monthly');
      indexMs.push(t1());
      const current = digestOfReport(report(2027, 1, specs));
      const t2 = start();
      await loadHistory(out, 'harbourline-monthly', '2027-01', 'monthly', current, 1);
      historyMs.push(t2());
    } finally {
      await rm(out, {recursive: true, force: true});
    }
  }
  const line = (name: string, xs: Timing[]) => {
    const med = (k: keyof Timing) => [...xs].map((x) => x[k]).sort((a, b) => a - b)[Math.floor(xs.length / 2)];
    const wall = xs.map((x) => x.wall);
    const range = `wall min ${Math.min(...wall).toFixed(1)}, max ${Math.max(...wall).toFixed(1)}, n=${xs.length}`;
    const median = `median ${med('wall').toFixed(1)} ms wall, ${med('cpu').toFixed(1)} ms CPU`;
    return `archive: ${name.padEnd(44)} ${median} (${range})`;
  };
  console.log(line(`one period folder (${SERIES} series × ${LENGTH}), incl. index`, archiveMs));
  console.log(line(`index.html over ${PERIODS} periods`, indexMs));
  console.log(line(`loadHistory over ${PERIODS} earlier periods`, historyMs));
}
