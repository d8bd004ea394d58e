/**
 * The archive, end to end through the command line: back-fill a range of periods, refuse to replace an
 * archived period without --force, detect a data revision in an old CSV value, track the forecasts that
 * earlier packs published, and survive a build killed part-way (SIGKILL of a real child process).
 *
 * Everything runs on a copy of sample-config/ in a temporary folder (the test edits a CSV), with HTML and
 * JSON outputs only: the archive logic is the same for every format and the PDF step only adds time.
 */
import {spawn} from 'node:child_process';
import {createHash} from 'node:crypto';
import {watch, type FSWatcher} from 'node:fs';
import {cp, mkdtemp, readdir, readFile, rm, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import {join, relative, resolve} from 'node:path';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {main, type Io} from '../../src/cli/main.js';

const PACK_ID = 'tarnwick-monthly';
const REGISTER = resolve('test/archive/fixtures/ts-register.mjs');
const CLI = resolve('src/cli/main.ts');
const FORMATS = 'json,html';
const BUILD_TIMEOUT = 900_000;

let root = '';
let pack = '';
let out = '';
let packDir = '';

/** Run the CLI in-process; returns the exit code and what it printed. */
async function cli(...args: string[]): Promise<{code: number; stdout: string; stderr: string}> {
  let stdout = '';
  let stderr = '';
  const io: Io = {stdout: {write: (t: string) => (stdout += t)}, stderr: {write: (t: string) => (stderr += t)}};
  const code = await main(args, io);
  return {code, stdout, stderr};
}

const buildArgs = (period: string, ...more: string[]) =>
  ['build', pack, '--period', period, '--out', out, '--formats', FORMATS, '--jobs', '1', ...more] as const;

/** Every file under `dir` (relative, sorted) with its SHA-256: a fingerprint of a whole folder. */
async function fingerprint(dir: string): Promise<Record<string, string>> {
  const entries = (await readdir(dir, {recursive: true, withFileTypes: true})).filter((e) => e.isFile());
  const pairs = await Promise.all(
    entries.map(async (e) => {
      const p = join(e.parentPath, e.name);
      return [relative(dir, p), sha256(await readFile(p))] as const;
    }),
  );
  return Object.fromEntries(pairs.sort((a, b) => (a[0] < b[0] ? -1 : 1)));
}

function sha256(content: Buffer | string): string {
  return createHash('sha256').update(content).digest('hex');
}

async function readJson(file: string): Promise<any> {
  return JSON.parse(await readFile(file, 'utf8'));
}

/**
 * A period folder is complete when manifest.json lists exactly the other files present, each with its
 * size and hash. Returns 'absent' when there is no folder, else the manifest's hash (to tell old from new).
 */
async function completeOrAbsent(folder: string): Promise<string> {
  let files: Record<string, string>;
  try {
    files = await fingerprint(folder);
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return 'absent';
    throw e;
  }
  const manifestText = await readFile(join(folder, 'manifest.json'), 'utf8');
  const manifest = JSON.parse(manifestText);
  const listed = Object.fromEntries(
    (manifest.outputs as {path: string; sha256: string}[]).map((o) => [o.path, o.sha256]),
  );
  const {['manifest.json']: _, ...present} = files;
  expect(present).toEqual(listed);
  return sha256(manifestText);
}

beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'ebbflow-e2e-archive-'));
  await cp(resolve('sample-config'), join(root, 'pack'), {recursive: true});
  pack = join(root, 'pack', 'monthly-pack.yaml');
  out = join(root, 'out');
  packDir = join(out, PACK_ID);
});

afterAll(async () => {
  if (root) await rm(root, {recursive: true, force: true});
});

describe('archive through the CLI', () => {
  it(
    '(a) back-fills 2026-08..2026-10 into three folders, each built with the data up to its own period',
    async () => {
      const run = await cli(...buildArgs('2026-08..2026-10'));
      expect(run.stderr).not.toMatch(/^ebbflow:/m);
      expect(run.code).toBe(0);
      expect(run.stdout.trim().split('\n')).toEqual(['2026-08', '2026-09', '2026-10'].map((p) => join(packDir, p)));
      expect((await readdir(packDir)).sort()).toEqual(['2026-08', '2026-09', '2026-10', 'index.html']);
      for (const period of ['2026-08', '2026-09', '2026-10']) {
        const r = await readJson(join(packDir, period, 'results.json'));
        expect(r.pack.period).toBe(period);
        const sales = r.series.find((s: any) => s.id === 'net-sales');
        // "As if run at the time": the series stops at the review period and the forecast starts after it.
        expect(sales.periods.at(-1)).toBe(period);
        expect(sales.forecast.periods[0] > period).toBe(true);
      }
      // The first archived period has nothing to compare with; the later ones compare with the one before.
      expect((await readJson(join(packDir, '2026-08', 'results.json'))).history ?? null).toBeNull();
      expect((await readJson(join(packDir, '2026-09', 'results.json'))).history.previousPeriod).toBe('2026-08');
      expect((await readJson(join(packDir, '2026-10', 'results.json'))).history.previousPeriod).toBe('2026-09');
    },
    BUILD_TIMEOUT,
  );

  it('(a) index.html lists the three periods newest first, with links to their files', async () => {
    const index = await readFile(join(packDir, 'index.html'), 'utf8');
    expect(index).toContain('newest first: 3 periods.');
    const at = ['2026-10', '2026-09', '2026-08'].map((p) => index.indexOf(`<section id="period-${p}">`));
    expect(at.every((i) => i >= 0)).toBe(true);
    expect(at).toEqual([...at].sort((a, b) => a - b));
    for (const p of ['2026-10', '2026-09', '2026-08']) {
      for (const f of ['report.html', 'results.json', 'manifest.json']) expect(index).toContain(`href="${p}/${f}"`);
      // No PDF was asked for, so none is linked.
      expect(index).not.toContain(`href="${p}/report.pdf"`);
    }
    // Headline figure: net sales in October 2026 is 2025 EUR k in data/trading.csv.
    expect(index).toContain('<tr><th scope="row">Net sales</th><td>2,025 EUR k</td>');
  });

  it('(d) tracks the forecasts published in 2026-08 and 2026-09 against the actuals of 2026-10', async () => {
    const current = await readJson(join(packDir, '2026-10', 'results.json'));
    const earlier = {
      '2026-08': await readJson(join(packDir, '2026-08', 'results.json')),
      '2026-09': await readJson(join(packDir, '2026-09', 'results.json')),
    } as Record<string, any>;
    const rows = current.history.tracking as any[];
    const sales = rows.filter((r) => r.seriesId === 'net-sales');
    // 2026-08 published forecasts for 2026-09 (1 step) and 2026-10 (2 steps); 2026-09 for 2026-10 (1 step).
    expect(sales.map((r) => [r.publishedIn, r.period, r.horizon])).toEqual([
      ['2026-08', '2026-09', 1],
      ['2026-08', '2026-10', 2],
      ['2026-09', '2026-10', 1],
    ]);
    // data/trading.csv: net_sales is 2042.6 in 2026-09 and 2025 in 2026-10.
    expect(sales.map((r) => r.actual)).toEqual([2042.6, 2025, 2025]);
    for (const r of rows) {
      const fc = earlier[r.publishedIn].series.find((s: any) => s.id === r.seriesId).forecast;
      const k = fc.periods.indexOf(r.period);
      expect(k).toBe(r.horizon - 1);
      expect(r.forecast).toBe(fc.mean[k]);
      const s = current.series.find((x: any) => x.id === r.seriesId);
      expect(r.actual).toBe(s.original[s.periods.indexOf(r.period)]);
      expect(r.error).toBe(r.actual - r.forecast);
      for (const level of ['80', '95']) {
        expect(r.inside[level]).toBe(fc.lower[level][k] <= r.actual && r.actual <= fc.upper[level][k]);
      }
    }
    // Every visible series with a forecast in both earlier packs gets its three rows.
    const withForecast = current.series.filter((s: any) => s.forecast && !s.hidden).map((s: any) => s.id);
    for (const id of withForecast) expect(rows.filter((r) => r.seriesId === id).length, id).toBe(3);

    // The running summary by hand: MASE = mean |error| / mean |y[t] − y[t − 12]| (Hyndman & Koehler 2006).
    const summary = current.history.trackingSummary.find((t: any) => t.seriesId === 'net-sales');
    const y = current.series.find((s: any) => s.id === 'net-sales').original as (number | null)[];
    let scale = 0;
    let n = 0;
    for (let t = 12; t < y.length; t++) {
      if (y[t] !== null && y[t - 12] !== null) {
        scale += Math.abs(y[t]! - y[t - 12]!);
        n++;
      }
    }
    const mae = sales.reduce((sum, r) => sum + Math.abs(r.actual - r.forecast), 0) / 3;
    expect(summary.count).toBe(3);
    expect(summary.mase).toBeCloseTo(mae / (scale / n), 12);
    for (const level of ['80', '95']) {
      expect(summary.coverage[level]).toBeCloseTo(sales.filter((r) => r.inside[level]).length / 3, 12);
    }

    // The report shows the tracking table with the published-in and actual figures of net sales.
    const html = await readFile(join(packDir, '2026-10', 'report.html'), 'utf8');
    expect(html).toContain('How earlier forecasts fared');
    // The report lists the forecasts made for the review period (Oct 2026), here from Aug 2026, 2 steps ahead.
    expect(html).toMatch(/<tr><td>Net sales<\/td><td>Aug 2026<\/td><td class="num">2<\/td>/);
    expect(html).toMatch(/<tr><td>Net sales<\/td><td>Sept 2026<\/td><td class="num">1<\/td>.*?<td class="num">2,025<\/td>/);
  });

  it(
    '(b) refuses to rebuild 2026-10 without --force (exit 2, folder untouched) and replaces it with --force',
    async () => {
      const folder = join(packDir, '2026-10');
      const before = await fingerprint(folder);
      const refused = await cli(...buildArgs('2026-10'));
      expect(refused.code).toBe(2);
      expect(refused.stderr).toContain(`${folder}: period folder already exists; use --force to replace it`);
      expect(refused.stderr).toContain('1 problem; nothing was written');
      expect(await fingerprint(folder)).toEqual(before);
      expect((await readdir(packDir)).filter((n) => n.startsWith('.'))).toEqual([]);

      // A file the build did not write shows that --force replaced the folder rather than writing into it.
      await writeFile(join(folder, 'stray.txt'), 'not from ebbflow\n');
      const forced = await cli(...buildArgs('2026-10', '--force'));
      expect(forced.code).toBe(0);
      expect(await fingerprint(folder)).toEqual(before);
      expect((await readdir(packDir)).filter((n) => n.startsWith('.'))).toEqual([]);
    },
    BUILD_TIMEOUT,
  );

  it(
    '(c) a changed old CSV value shows as a data revision in results.json and in the report',
    async () => {
      const csvFile = join(root, 'pack', 'data', 'trading.csv');
      const csv = await readFile(csvFile, 'utf8');
      // data/trading.csv: net_sales for 2026-03 is 2108.2; the corrected value is 2213.6 (+5.0%).
      expect(csv).toContain('\n2026-03,2108.2,');
      await writeFile(csvFile, csv.replace('\n2026-03,2108.2,', '\n2026-03,2213.6,'));
      const run = await cli(...buildArgs('2026-10', '--force'));
      expect(run.code).toBe(0);

      const r = await readJson(join(packDir, '2026-10', 'results.json'));
      const revised = r.history.revisions.filter((x: any) => x.kind === 'data');
      // The formulas over net sales (gross margin, average basket) are revised with it.
      expect(revised.map((x: any) => x.seriesId)).toEqual(['net-sales', 'gross-margin', 'avg-basket']);
      const data = revised.filter((x: any) => x.seriesId === 'net-sales');
      expect(data[0]).toMatchObject({
        seriesId: 'net-sales',
        period: '2026-03',
        measure: 'original',
        previous: 2108.2,
        current: 2213.6,
        large: true,
      });
      // (2213.6 − 2108.2) / 2108.2 × 100 = 4.99952...%, above the pack's 1% threshold.
      expect(data[0].revisionPct).toBeCloseTo(((2213.6 - 2108.2) / 2108.2) * 100, 10);

      const html = await readFile(join(packDir, '2026-10', 'report.html'), 'utf8');
      expect(html).toMatch(
        /<tr class="row-large"><td>Net sales<\/td><td>Mar 2026<\/td><td>[^<]+<\/td><td>Data changed<\/td><td class="num">2,108<\/td><td class="num">2,214<\/td>/,
      );
      // The manifest records the corrected input.
      const manifest = await readJson(join(packDir, '2026-10', 'manifest.json'));
      const input = manifest.inputs.find((i: any) => i.file === 'data/trading.csv');
      expect(input.sha256).toBe(sha256(await readFile(csvFile)));
    },
    BUILD_TIMEOUT,
  );
});

/** How a killed child build is stopped: once its log shows `text`, or once an entry named like `entry` appears. */
type KillAt = {log: string} | {entry: RegExp};

/**
 * Run the CLI in a child process and SIGKILL it at the given moment. Resolves with how it ended:
 * 'killed', or 'finished <code>' when the build was over before the moment came.
 */
function buildAndKill(period: string, force: boolean, at: KillAt): Promise<string> {
  return new Promise((done, fail) => {
    const args = [...buildArgs(period, ...(force ? ['--force'] : []))];
    const proc = spawn(process.execPath, ['--import', REGISTER, CLI, ...args], {
      env: {...process.env, TZ: 'UTC'},
      stdio: ['ignore', 'ignore', 'pipe'],
    });
    let watcher: FSWatcher | null = null;
    const kill = () => {
      if (proc.exitCode === null && !proc.killed) proc.kill('SIGKILL');
    };
    if ('entry' in at) {
      // inotify on the pack folder: the temporary or set-aside folder of this very process.
      watcher = watch(packDir, (_event, name) => {
        if (name && at.entry.test(name) && name.endsWith(`-${proc.pid}`)) kill();
      });
    }
    let stderr = '';
    proc.stderr.on('data', (d: Buffer) => {
      stderr += d.toString();
      if ('log' in at && stderr.includes(at.log)) kill();
    });
    proc.on('error', fail);
    proc.on('exit', (code, signal) => {
      watcher?.close();
      done(signal === 'SIGKILL' ? 'killed' : `finished ${code}: ${stderr}`);
    });
  });
}

describe('a build killed part-way', () => {
  it(
    'leaves no folder or a complete one at every moment, and the next build succeeds and cleans up',
    async () => {
      const folder = join(packDir, '2026-10');
      const original = await completeOrAbsent(folder);
      expect(original).not.toBe('absent');

      // While analysing: nothing of the archive has been touched yet.
      expect(await buildAndKill('2026-10', true, {log: ' series read'})).toBe('killed');
      expect(await completeOrAbsent(folder)).toBe(original);

      // While writing the temporary folder of a replacement: the old folder or, if the kill came late, the new one
      // (`completeOrAbsent` checks every file against the manifest).
      expect(await buildAndKill('2026-10', true, {entry: /^\.2026-10\.tmp-\d+$/})).toBe('killed');
      expect(await completeOrAbsent(folder)).not.toBe('absent');

      // Just after the old folder was moved aside: the period may be absent, never half there.
      expect(await buildAndKill('2026-10', true, {entry: /^\.2026-10\.old-\d+$/})).toBe('killed');
      await completeOrAbsent(folder);
      const leftovers = (await readdir(packDir)).filter((n) => n.startsWith('.'));
      const leftover = /^\.(2026-10|index\.html)\.(tmp|old)-\d+(-\d+)?$/;
      expect(leftovers.every((n) => leftover.test(n)), leftovers.join()).toBe(true);

      // A new period killed while its folder is written.
      expect(await buildAndKill('2026-07', false, {entry: /^\.2026-07\.tmp-\d+$/})).toBe('killed');
      expect(await completeOrAbsent(join(packDir, '2026-07'))).toBe('absent');

      // The next build restores what a dead run set aside, replaces the period and removes every leftover.
      const next = await cli(...buildArgs('2026-10', '--force'));
      expect(next.code).toBe(0);
      expect(await completeOrAbsent(folder)).not.toBe('absent');
      expect((await readdir(packDir)).sort()).toEqual(['2026-08', '2026-09', '2026-10', 'index.html']);
    },
    BUILD_TIMEOUT * 2,
  );
});
