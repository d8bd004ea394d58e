/**
 * M3 benchmark (`npm run bench:m3`): forecast every monthly (h = 18) and quarterly (h = 8) series of the M3
 * competition from its training part, through `forecastSeries` (the pack's code path) for `auto` and through the
 * shared method dispatch for the other methods, then print sMAPE (M3 definition), MASE, interval coverage and time
 * per series beside the published figures.
 *
 * Data: ../shared/benchmarks/m3/m3-{monthly,quarterly}.csv relative to the repository root (Makridakis & Hibon 2000,
 * converted from the R package Mcomp 2.9; see its README), or the folder in EBBFLOW_M3_DIR (a worktree elsewhere).
 * Prints a note and exits 0 when absent.
 * Work is split over worker threads (one per core, at most 2). With Rscript present, forecast::ets is timed on a
 * subset of monthly series in the same run, after ours on the same subset in the main thread (each alone, series
 * after series), and the time ratio printed.
 */
import {execFileSync} from 'node:child_process';
import {existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync} from 'node:fs';
import {availableParallelism, tmpdir} from 'node:os';
import {dirname, join, resolve} from 'node:path';
import {fileURLToPath} from 'node:url';
import {Worker, isMainThread, parentPort, workerData} from 'node:worker_threads';
import {accuracy} from '../../src/analyse/forecast/accuracy.js';
import {forecastSeries} from '../../src/analyse/forecast/forecastSeries.js';
import {runMethod, type MethodName} from '../../src/analyse/forecast/methods.js';

interface M3Series {
  id: string;
  frequency: number;
  horizon: number;
  train: number[];
  test: number[];
}

interface Score {
  smape: number;
  mase: number;
  cover80: number;
  cover95: number;
  ms: number;
}

type Row = {id: string; frequency: number; scores: Record<string, Score>};

/** The methods compared; `EBBFLOW_M3_METHODS=auto,ETS` runs only those (by label). */
const ALL_METHODS: {label: string; name: MethodName | 'auto'}[] = [
  {label: 'auto', name: 'auto'},
  {label: 'ETS', name: 'ets'},
  {label: 'Theta', name: 'theta'},
  {label: 'ARIMA', name: 'arima'},
  {label: 'Damped', name: 'damped'},
  {label: 'Comb S-H-D', name: 'comb-shd'},
  {label: 'Naive2', name: 'naive2'},
  {label: 'Seasonal naive', name: 'seasonal-naive'},
];
const chosen = process.env.EBBFLOW_M3_METHODS?.split(',');
const METHODS = chosen ? ALL_METHODS.filter((m) => chosen.includes(m.label)) : ALL_METHODS;
/** Decimal places beyond the usual, for comparing two versions: `EBBFLOW_M3_PLACES=2` prints sMAPE as 13.4813. */
const MORE = Number(process.env.EBBFLOW_M3_PLACES ?? 0);

/** Published sMAPE (Makridakis & Hibon 2000; Hyndman 2018 for ETS; mean of ETS, ARIMA, Theta) and R 8.20 MASE. */
const PUBLISHED: Record<string, {monthly: string; quarterly: string}> = {
  auto: {monthly: 'ETS+ARIMA+Theta 13.52 / —', quarterly: '9.01 / —'},
  ETS: {monthly: '14.14 / 0.865', quarterly: '9.68 / 1.170'},
  Theta: {monthly: '13.85 / 0.864', quarterly: '8.96 / 1.117'},
  ARIMA: {monthly: '— (ours: on STL-adjusted data)', quarterly: '—'},
  Damped: {monthly: '14.00 / 0.882', quarterly: '9.74 / 1.158'},
  'Comb S-H-D': {monthly: '14.48 / 0.872', quarterly: '9.22 / 1.126'},
  Naive2: {monthly: '16.91 / 1.038', quarterly: '9.95 / 1.252'},
  'Seasonal naive': {monthly: '17.23 / 1.146', quarterly: '11.07 / 1.425'},
};

function readM3(file: string): M3Series[] {
  const lines = readFileSync(file, 'utf8').trim().split('\n');
  const header = lines[0].split(',');
  const col = (name: string) => header.indexOf(name);
  const [iId, iFreq, iH, iPart, iValue] = ['series_id', 'frequency', 'horizon', 'part', 'value'].map(col);
  const byId = new Map<string, M3Series>();
  for (const line of lines.slice(1)) {
    const f = line.split(',');
    let s = byId.get(f[iId]);
    if (!s) {
      s = {id: f[iId], frequency: Number(f[iFreq]), horizon: Number(f[iH]), train: [], test: []};
      byId.set(s.id, s);
    }
    (f[iPart] === 'train' ? s.train : s.test).push(Number(f[iValue]));
  }
  return [...byId.values()];
}

function scoreSeries(s: M3Series): Row {
  const train = Float64Array.from(s.train);
  const test = s.test;
  const period = s.frequency;
  const frequency = period === 12 ? 'monthly' : 'quarterly';
  const scores: Record<string, Score> = {};
  for (const m of METHODS) {
    const t0 = performance.now();
    let mean: ArrayLike<number>;
    let lo80: ArrayLike<number>, hi80: ArrayLike<number>, lo95: ArrayLike<number>, hi95: ArrayLike<number>;
    if (m.name === 'auto') {
      const r = forecastSeries(train, {
        frequency,
        options: {method: 'auto', horizon: s.horizon, levels: [80, 95], backtestOrigins: 0},
      });
      [mean, lo80, hi80, lo95, hi95] = [r.mean, r.lower['80'], r.upper['80'], r.lower['95'], r.upper['95']];
    } else {
      const f = runMethod(m.name, train, {period, h: s.horizon, levels: [80, 95]}).forecast;
      [mean, lo80, hi80, lo95, hi95] = [f.mean, f.lower.get(80)!, f.upper.get(80)!, f.lower.get(95)!, f.upper.get(95)!];
    }
    const ms = performance.now() - t0;
    const acc = accuracy(mean, test, {insample: train, period});
    let c80 = 0;
    let c95 = 0;
    test.forEach((y, i) => {
      if (y >= lo80[i] && y <= hi80[i]) c80++;
      if (y >= lo95[i] && y <= hi95[i]) c95++;
    });
    scores[m.label] = {smape: acc.sMAPE, mase: acc.MASE, cover80: c80 / test.length, cover95: c95 / test.length, ms};
  }
  return {id: s.id, frequency: period, scores};
}

function timeR(series: M3Series[]): number | null {
  try {
    execFileSync('Rscript', ['--version'], {stdio: 'ignore'});
  } catch {
    return null;
  }
  const dir = mkdtempSync(join(tmpdir(), 'm3-r-'));
  try {
    const csv = series.map((s) => s.train.join(',') + '\n').join('');
    writeFileSync(join(dir, 'series.csv'), csv);
    const code = [
      'suppressPackageStartupMessages(library(forecast))',
      `lines <- readLines("${join(dir, 'series.csv')}")`,
      'ys <- lapply(strsplit(lines, ","), function(v) ts(as.numeric(v), frequency = 12))',
      'invisible(ets(ys[[1]]))',
      't <- system.time(for (y in ys) ets(y))[["elapsed"]]',
      'cat(1000 * t / length(ys))',
    ].join('; ');
    return Number(execFileSync('Rscript', ['-e', code], {encoding: 'utf8'}).trim());
  } catch {
    return null;
  } finally {
    rmSync(dir, {recursive: true, force: true});
  }
}

async function main(): Promise<void> {
  const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
  const dataDir = process.env.EBBFLOW_M3_DIR ?? resolve(root, '../shared/benchmarks/m3');
  const files = ['m3-monthly.csv', 'm3-quarterly.csv'].map((f) => join(dataDir, f));
  if (!files.every(existsSync)) {
    console.log(`M3 data not found under ${dataDir}; nothing to benchmark.`);
    return;
  }
  const limit = Number(process.env.M3_LIMIT ?? Infinity);
  const series = files.flatMap((f) => readM3(f).slice(0, limit));
  const workers = Math.max(1, Math.min(2, availableParallelism()));
  const started = performance.now();
  const chunks = await Promise.all(
    Array.from({length: workers}, (_, w) => {
      const part = series.filter((_, i) => i % workers === w);
      return new Promise<Row[]>((done, fail) => {
        const worker = new Worker(new URL(import.meta.url), {workerData: part});
        worker.once('message', done);
        worker.once('error', fail);
      });
    }),
  );
  const wall = (performance.now() - started) / 1000;
  const rows = chunks.flat();
  console.log(`M3: ${rows.length} series on ${workers} worker thread(s), ${wall.toFixed(1)} s wall time.\n`);
  for (const [freq, name] of [
    [12, 'monthly'],
    [4, 'quarterly'],
  ] as const) {
    const sub = rows.filter((r) => r.frequency === freq);
    if (sub.length === 0) continue;
    console.log(`${name} (${sub.length} series, h = ${freq === 12 ? 18 : 8})`);
    console.log('| method | sMAPE | MASE | 80% cover | 95% cover | ms/series | published sMAPE / MASE |');
    console.log('|---|---:|---:|---:|---:|---:|---|');
    for (const m of METHODS) {
      const avg = (k: keyof Score) => sub.reduce((a, r) => a + r.scores[m.label][k], 0) / sub.length;
      const pub = PUBLISHED[m.label][name];
      console.log(
        `| ${m.label} | ${avg('smape').toFixed(2 + MORE)} | ${avg('mase').toFixed(3 + MORE)} | ` +
          `${(100 * avg('cover80')).toFixed(1 + MORE)} | ${(100 * avg('cover95')).toFixed(1 + MORE)} | ` +
          `${avg('ms').toFixed(1)} | ${pub} |`,
      );
    }
    console.log('');
  }
  const monthly = series.filter((s) => s.frequency === 12);
  const subset = monthly.slice(0, Math.min(40, monthly.length));
  // Both timed alone, one series after another, once the worker threads are done: ours here, then R.
  const oursStart = performance.now();
  for (const s of subset) runMethod('ets', Float64Array.from(s.train), {period: 12, h: s.horizon, levels: [80, 95]});
  const oursMs = (performance.now() - oursStart) / Math.max(1, subset.length);
  const rMs = timeR(subset);
  if (rMs === null) console.log('Rscript with forecast not available: R timing skipped.');
  else {
    console.log(
      `Automatic ETS on the first ${subset.length} monthly series: ours ${oursMs.toFixed(1)} ms/series, ` +
        `R forecast::ets ${rMs.toFixed(1)} ms/series (R/ours = ${(rMs / oursMs).toFixed(2)}).`,
    );
  }
}

if (isMainThread) {
  await main();
} else {
  parentPort!.postMessage((workerData as M3Series[]).map(scoreSeries));
}
