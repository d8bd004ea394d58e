import {execFileSync} from 'node:child_process';
import {createHash} from 'node:crypto';
import {createReadStream, createWriteStream, mkdtempSync, readdirSync, rmSync, statSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {fileURLToPath} from 'node:url';
import {mulberry32} from '../../src/analyse/numeric/mulberry32.js';

const SERIES = Number(process.env.EBBFLOW_BENCH_SERIES ?? 10_000);
const POINTS = 120;
/**
 * The runs, as forecast method and --jobs: `theta` (the method the README suggests for packs of thousands of
 * series) at 1 and 2 threads, and the default `auto` (ETS, Theta and ARIMA combined) at 2. Override with e.g.
 * `EBBFLOW_BENCH_RUNS=auto:1,auto:2` (`seasonal-naive` measures the pipeline without model fitting).
 */
const RUNS = (process.env.EBBFLOW_BENCH_RUNS ?? 'theta:1,theta:2,auto:2').split(',').map((run) => {
  const [forecast, jobs] = run.split(':');
  return {forecast, jobs: Number(jobs)};
});

/**
 * Scale: 10,000 monthly series of 120 points (long-layout CSV) through decomposition, cycle and forecast with JSON
 * output, for each run above. Each build runs in a child process so its peak memory (maxRSS, worker threads
 * included) and CPU time are its own; CPU time is printed beside wall time because a loaded machine stretches the
 * latter. The results.json files of runs with the same forecast are compared byte for byte (the pool must not
 * change results). Goal (issue): under 60 s and under 1 GiB at --jobs 2 on a 2-core machine.
 */
export async function run(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'ebbflow-scale-'));
  try {
    await writeData(dir);
    const cli = fileURLToPath(new URL('../../src/cli/main.js', import.meta.url));
    const digests = new Map<string, string[]>();
    const builtAt = newestBuild();
    for (const {forecast, jobs} of RUNS) {
      const pack = join(dir, `pack-${forecast}.yaml`);
      writeFileSync(pack, packText(forecast));
      const t0 = performance.now();
      const out = execFileSync(
        process.execPath,
        [fileURLToPath(import.meta.url), '--child', cli, pack, join(dir, `out-${forecast}-${jobs}`), String(jobs)],
        {encoding: 'utf8', env: {...process.env, TZ: 'UTC'}, stdio: ['ignore', 'pipe', 'inherit'], maxBuffer: 1 << 26},
      );
      const seconds = (performance.now() - t0) / 1000;
      const {maxRssMiB, cpuSeconds, folder} = JSON.parse(out.trim().split('\n').pop()!);
      const results = join(folder, 'results.json');
      digests.set(forecast, [...(digests.get(forecast) ?? []), await sha256File(results)]);
      console.log(
        `--jobs ${jobs}: ${SERIES} series × ${POINTS} months (forecast ${forecast}) in ${seconds.toFixed(1)} s ` +
          `(CPU ${cpuSeconds.toFixed(1)} s), ${(SERIES / seconds).toFixed(0)} series/s, ` +
          `peak RSS ${maxRssMiB.toFixed(0)} MiB, results.json ${(statSync(results).size / 2 ** 20).toFixed(0)} MiB`,
      );
    }
    if (newestBuild() !== builtAt) {
      console.log('dist/ was rebuilt while the benchmark ran: the runs used different code, so they are not compared');
      return;
    }
    for (const [forecast, list] of digests) {
      if (list.length < 2) continue;
      const same = list.every((d) => d === list[0]);
      console.log(`results.json (forecast ${forecast}) identical across --jobs: ${same ? 'yes' : 'NO'}`);
      if (!same) process.exitCode = 1;
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
}

function packText(forecast: string): string {
  return [
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
    'defaults:',
    `  forecast: {method: ${forecast}}`,
    '',
  ].join('\n');
}

/** Newest modification time among the compiled sources: a rebuild between the runs voids their comparison. */
function newestBuild(): number {
  const dist = fileURLToPath(new URL('../../src/', import.meta.url));
  const files = readdirSync(dist, {recursive: true, encoding: 'utf8'}).filter((f) => f.endsWith('.js'));
  return Math.max(...files.map((f) => statSync(join(dist, f)).mtimeMs));
}

async function sha256File(file: string): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of createReadStream(file)) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

async function child(cli: string, pack: string, out: string, jobs: string): Promise<void> {
  const {main} = (await import(cli)) as {main: (argv: string[], io: unknown) => Promise<number>};
  let folder = '';
  const sink = {write: (text: string) => (folder += text)};
  const code = await main(['build', pack, '--out', out, '--jobs', jobs], {stdout: sink, stderr: process.stderr});
  if (code !== 0) process.exit(code);
  const usage = process.resourceUsage();
  const cpuSeconds = (usage.userCPUTime + usage.systemCPUTime) / 1e6;
  console.log(JSON.stringify({maxRssMiB: usage.maxRSS / 1024, cpuSeconds, folder: folder.trim()}));
}

if (process.argv[2] === '--child') await child(process.argv[3], process.argv[4], process.argv[5], process.argv[6]);
