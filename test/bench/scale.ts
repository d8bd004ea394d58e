import {execFileSync} from 'node:child_process';
import {mkdtempSync, rmSync, writeFileSync, createWriteStream} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {fileURLToPath} from 'node:url';
import {mulberry32} from '../../src/analyse/numeric/mulberry32.js';

const SERIES = Number(process.env.EBBFLOW_BENCH_SERIES ?? 10_000);
const POINTS = 120;

/**
 * Scale: 10,000 monthly series of 120 points (long-layout CSV) through decomposition, cycle and forecast with JSON
 * output, at --jobs 1 and --jobs 2. Each build runs in a child process so its peak memory (maxRSS) is its own.
 * Goal (issue): under 60 s and under 1 GiB at --jobs 2 on a 2-core machine.
 */
export async function run(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'ebbflow-scale-'));
  try {
    await writeData(dir);
    const cli = fileURLToPath(new URL('../../src/cli/main.js', import.meta.url));
    for (const jobs of [1, 2]) {
      const t0 = performance.now();
      const out = execFileSync(
        process.execPath,
        [fileURLToPath(import.meta.url), '--child', cli, join(dir, 'pack.yaml'), join(dir, `out-${jobs}`), String(jobs)],
        {encoding: 'utf8', env: {...process.env, TZ: 'UTC'}, stdio: ['ignore', 'pipe', 'inherit'], maxBuffer: 1 << 26},
      );
      const seconds = (performance.now() - t0) / 1000;
      const {maxRssMiB} = JSON.parse(out.trim().split('\n').pop()!);
      console.log(
        `--jobs ${jobs}: ${SERIES} series × ${POINTS} months in ${seconds.toFixed(1)} s, ` +
          `${(SERIES / seconds).toFixed(0)} series/s, peak RSS ${maxRssMiB.toFixed(0)} MiB`,
      );
    }
  } finally {
    rmSync(dir, {recursive: true, force: true});
  }
}

async function writeData(dir: string): Promise<void> {
  const rng = mulberry32(42);
  const file = createWriteStream(join(dir, 'data.csv'));
  file.write('month,series,value\n');
  for (let s = 0; s < SERIES; s++) {
    const level = 100 + 900 * rng();
    const growth = (rng() - 0.3) * 0.01;
    const amp = 0.05 + 0.2 * rng();
    let chunk = '';
    for (let t = 0; t < POINTS; t++) {
      const month = t % 12;
      const v = level * (1 + growth) ** t * (1 + amp * Math.sin((2 * Math.PI * month) / 12)) * (1 + 0.03 * (rng() - 0.5));
      chunk += `${2016 + Math.floor(t / 12)}-${String(month + 1).padStart(2, '0')},s${s},${v.toFixed(2)}\n`;
    }
    if (!file.write(chunk)) await new Promise<void>((r) => file.once('drain', () => r()));
  }
  await new Promise<void>((resolve) => file.end(resolve));
  writeFileSync(
    join(dir, 'pack.yaml'),
    [
      'pack:',
      '  title: Scale benchmark',
      '  frequency: monthly',
      '  formats: [json]',
      'sources:',
      '  - id: data',
      '    file: data.csv',
      '    layout: long',
      '    dateColumn: month',
      '    keyColumn: series',
      '    valueColumn: value',
      'series:',
      '  - fromSource: data',
      '',
    ].join('\n'),
  );
}

async function child(cli: string, pack: string, out: string, jobs: string): Promise<void> {
  const {main} = (await import(cli)) as {main: (argv: string[], io: unknown) => Promise<number>};
  const sink = {write: () => true};
  const code = await main(['build', pack, '--out', out, '--jobs', jobs], {stdout: sink, stderr: process.stderr});
  if (code !== 0) process.exit(code);
  console.log(JSON.stringify({maxRssMiB: process.resourceUsage().maxRSS / 1024}));
}

if (process.argv[2] === '--child') await child(process.argv[3], process.argv[4], process.argv[5], process.argv[6]);
