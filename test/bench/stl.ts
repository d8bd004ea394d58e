/**
 * STL speed: time per call for 120-, 240- and 600-point monthly series, and series per second over 10 000
 * series, for the default non-robust (seasonal window 13) and robust settings. When `Rscript` is on the PATH,
 * R's `stats::stl` is timed on the same series in the same run and the ratio ours ÷ R's is printed.
 * Times are CPU time of the process (user + system: `process.cpuUsage`, R's `proc.time`), so a busy machine
 * distorts them less than wall-clock time; each figure is the best of several blocks of calls, each block long
 * enough (about 0.1 s) that the clock's granularity does not matter.
 * Run: `npm run build && node dist/test/bench/run.js stl`.
 */
import {spawnSync} from 'node:child_process';
import {mkdtempSync, rmSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {stl} from '../../src/analyse/decompose/stl.js';

interface Setting {
  label: string;
  robust: boolean;
  rCall: string;
}

const SETTINGS: Setting[] = [
  {label: 's.window=13', robust: false, rCall: 'stl(x, s.window = 13)'},
  {label: 's.window=13 robust', robust: true, rCall: 'stl(x, s.window = 13, robust = TRUE)'},
];
const LENGTHS = [120, 240, 600];
const MANY = 10_000;

/** Deterministic monthly test series: trend + seasonal + noise from a linear congruential generator. */
function series(n: number, seed: number): Float64Array {
  let state = seed >>> 0;
  const next = (): number => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32 - 0.5;
  };
  return Float64Array.from({length: n}, (_, i) => 100 + 0.2 * i + 10 * Math.sin((2 * Math.PI * i) / 12) + 3 * next());
}

function cpuMicros(): number {
  const {user, system} = process.cpuUsage();
  return user + system;
}

/** Calls per timed block: enough for about 0.1 s, so the clock's granularity (ticks of a few ms) does not matter. */
const BLOCK_SECONDS = 0.1;

function microsPerCall(x: Float64Array, robust: boolean): number {
  const options = {period: 12, seasonalWindow: 13, robust};
  const w0 = performance.now();
  for (let i = 0; i < 200; i++) stl(x, options);
  const estimate = Math.max((performance.now() - w0) / 200, 1e-3);
  const calls = Math.max(20, Math.ceil((BLOCK_SECONDS * 1000) / estimate));
  let best = Infinity;
  for (let block = 0; block < 10; block++) {
    const t0 = cpuMicros();
    for (let i = 0; i < calls; i++) stl(x, options);
    best = Math.min(best, (cpuMicros() - t0) / calls);
  }
  return best;
}

function rMicrosPerCall(dir: string, x: Float64Array, call: string): number | null {
  const file = join(dir, `x${x.length}.txt`);
  writeFileSync(file, Array.from(x).join('\n'));
  const script = [
    `x <- ts(scan('${file}', quiet = TRUE), frequency = 12)`,
    `cpu <- function() { t <- proc.time(); t[['user.self']] + t[['sys.self']] }`,
    `t0 <- cpu(); for (i in 1:50) ${call}; estimate <- max((cpu() - t0) / 50, 1e-6)`,
    `calls <- max(20, ceiling(${BLOCK_SECONDS} / estimate))`,
    `best <- Inf`,
    `for (b in 1:5) { t0 <- cpu(); for (i in 1:calls) ${call}; best <- min(best, (cpu() - t0) * 1e6 / calls) }`,
    `cat(best)`,
  ].join('\n');
  const r = spawnSync('Rscript', ['-e', script], {encoding: 'utf8'});
  const value = Number(r.stdout.trim().split(/\s+/).pop());
  return r.status === 0 && Number.isFinite(value) ? value : null;
}

function rSeriesPerSecond(dir: string, call: string): number | null {
  const file = join(dir, 'many.txt');
  writeFileSync(file, Array.from({length: 1000}, (_, k) => Array.from(series(120, k + 1)).join(' ')).join('\n'));
  const script = [
    `m <- as.matrix(read.table('${file}'))`,
    `cpu <- function() { t <- proc.time(); t[['user.self']] + t[['sys.self']] }`,
    `t0 <- cpu()`,
    `for (k in 1:nrow(m)) { x <- ts(m[k, ], frequency = 12); ${call} }`,
    `cat(nrow(m) / (cpu() - t0))`,
  ].join('\n');
  const r = spawnSync('Rscript', ['-e', script], {encoding: 'utf8'});
  const value = Number(r.stdout.trim().split(/\s+/).pop());
  return r.status === 0 && Number.isFinite(value) ? value : null;
}

export async function run(): Promise<void> {
  const hasR = spawnSync('Rscript', ['--version'], {encoding: 'utf8'}).status === 0;
  const dir = mkdtempSync(join(tmpdir(), 'ebbflow-stl-bench-'));
  try {
    for (const setting of SETTINGS) {
      console.log(`\nSTL ${setting.label}, monthly`);
      console.log('length  ours µs/call  R µs/call  ours/R   (CPU time, best of several blocks)');
      for (const n of LENGTHS) {
        const x = series(n, n);
        const ours = microsPerCall(x, setting.robust);
        const r = hasR ? rMicrosPerCall(dir, x, setting.rCall) : null;
        const ratio = r === null ? 'n/a' : (ours / r).toFixed(3);
        console.log(`${String(n).padStart(6)}  ${ours.toFixed(1).padStart(12)}  ${(r?.toFixed(1) ?? 'n/a').padStart(9)}  ${ratio}`);
      }
      const inputs = Array.from({length: MANY}, (_, k) => series(120, k + 1));
      const t0 = cpuMicros();
      for (const x of inputs) stl(x, {period: 12, seasonalWindow: 13, robust: setting.robust});
      const perSecond = MANY / ((cpuMicros() - t0) / 1e6);
      const rRate = hasR ? rSeriesPerSecond(dir, setting.rCall) : null;
      console.log(
        `${MANY} series of 120 points: ${perSecond.toFixed(0)} series/s` +
          (rRate === null ? '' : `; R (1000 series): ${rRate.toFixed(0)} series/s; ours/R time ${(rRate / perSecond).toFixed(3)}`),
      );
    }
    if (!hasR) console.log('Rscript not found: R timings skipped');
  } finally {
    rmSync(dir, {recursive: true, force: true});
  }
}
