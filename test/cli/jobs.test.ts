import {execFile} from 'node:child_process';
import {existsSync, readdirSync, statSync} from 'node:fs';
import {mkdtemp, readFile, symlink, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {promisify} from 'node:util';
import {beforeAll, describe, expect, test} from 'vitest';
import {analysisThreads} from '../../src/analyse/index.js';
import {runPool} from '../../src/analyse/pool.js';
import type {SeriesInput} from '../../src/analyse/types.js';
import {mulberry32} from '../../src/analyse/numeric/mulberry32.js';
import {loadPlan} from '../../src/config/index.js';
import {collectingLogger} from '../../src/log.js';

const root = fileURLToPath(new URL('../../', import.meta.url));
const minimalPack = path.join(root, 'test/fixtures/config/minimal/quarterly-minimal.yaml');
const options = (await loadPlan(minimalPack)).series[0].analysis;

/** A quarterly input too short to adjust or forecast, so analysing it is quick. */
function shortInput(id: string): SeriesInput {
  return {
    id,
    frequency: 'quarterly',
    start: 8000,
    values: Float64Array.from([5, NaN, NaN]),
    kind: 'flow',
    fiscalYearStart: 1,
    target: null,
    options,
    residualSigma: 3,
  };
}

describe('runPool in-process (no threads, or TypeScript sources)', () => {
  test('results come in input order, with a plain progress line every 10% through the logger', async () => {
    const log = collectingLogger();
    const inputs = Array.from({length: 120}, (_, i) => shortInput(`s${i}`));
    const results = await runPool(inputs, {threads: 0, log});
    expect(results.map((r) => r.id)).toEqual(inputs.map((i) => i.id));
    expect(log.infos).toEqual([12, 24, 36, 48, 60, 72, 84, 96, 108, 120].map((n) => `analysed ${n}/120 series`));
  });

  test('a logger that draws progress itself gets every step instead of lines', async () => {
    const steps: string[] = [];
    const log = {
      info: (m: string) => steps.push(m),
      warn: () => undefined,
      progress: (d: number, t: number) => steps.push(`${d}/${t}`),
    };
    await runPool(Array.from({length: 100}, (_, i) => shortInput(`s${i}`)), {threads: 2, log});
    expect(steps).toEqual(Array.from({length: 100}, (_, i) => `${i + 1}/100`));
  });

  test('no progress for small packs', async () => {
    const log = collectingLogger();
    await runPool([shortInput('a'), shortInput('b')], {threads: 0, log});
    expect(log.infos).toEqual([]);
  });

  test('an error names the series', async () => {
    const bad = {...shortInput('broken-one'), values: undefined} as unknown as SeriesInput;
    await expect(runPool([shortInput('a'), bad], {threads: 0, log: collectingLogger()})).rejects.toThrow(
      /^series broken-one: analysis failed: /,
    );
  });
});

/**
 * Worker threads run compiled JavaScript, so these tests run `dist/` in child processes: the project's own when it
 * is newer than every source file (after `npm run build`), otherwise a fresh compile into a temporary folder
 * (`tsc --outDir`, beside links to package.json, node_modules and templates), as CI does not build first.
 */
function distIsFresh(): boolean {
  const src = path.join(root, 'src');
  const files = readdirSync(src, {recursive: true, encoding: 'utf8'}).filter(
    (f) => f.endsWith('.ts') && !f.endsWith('.d.ts'),
  );
  return files.every((f) => {
    const built = path.join(root, 'dist/src', f.replace(/\.ts$/, '.js'));
    return existsSync(built) && statSync(built).mtimeMs >= statSync(path.join(src, f)).mtimeMs;
  });
}

const run = promisify(execFile);
let compiled = root;


describe('analysis threads for --jobs', () => {
  test('one job analyses in-process; while charts are drawn the main thread counts as one of the jobs', () => {
    expect([1, 2, 4].map((jobs) => analysisThreads(jobs, false))).toEqual([0, 2, 4]);
    expect([1, 2, 4].map((jobs) => analysisThreads(jobs, true))).toEqual([0, 1, 3]);
  });
});

describe('worker-thread pool from the compiled code', () => {
  beforeAll(async () => {
    if (distIsFresh()) return;
    compiled = await mkdtemp(path.join(tmpdir(), 'ebbflow-dist-'));
    for (const name of ['package.json', 'node_modules', 'templates']) {
      await symlink(path.join(root, name), path.join(compiled, name));
    }
    const tsc = path.join(root, 'node_modules/typescript/bin/tsc');
    const args = [tsc, '-p', path.join(root, 'tsconfig.json'), '--outDir', path.join(compiled, 'dist')];
    await run(process.execPath, args).catch((e: unknown) => {
      // Type errors elsewhere still emit JavaScript; only a missing output is fatal.
      if (!existsSync(path.join(compiled, 'dist/src/cli/main.js'))) throw e;
    });
  }, 600_000);

  test('results.json is the same bytes with --jobs 1 and --jobs 2', {timeout: 300_000}, async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'ebbflow-jobs-'));
    // 10 monthly series of 6 years (seasonal, trending, noisy; seeded), long layout.
    const rng = mulberry32(7);
    let csv = 'month,series,value\n';
    for (let s = 0; s < 10; s++) {
      const level = 100 + 900 * rng();
      for (let t = 0; t < 72; t++) {
        const v = level * (1 + 0.004 * t) * (1 + 0.15 * Math.sin((2 * Math.PI * t) / 12)) * (1 + 0.04 * (rng() - 0.5));
        csv += `${2020 + Math.floor(t / 12)}-${String((t % 12) + 1).padStart(2, '0')},k${s},${v.toFixed(2)}\n`;
      }
    }
    await writeFile(path.join(dir, 'data.csv'), csv);
    const pack =
      'pack: {title: Jobs, frequency: monthly, formats: [json]}\n' +
      'sources: [{id: d, file: data.csv, layout: long, dateColumn: month, keyColumn: series, valueColumn: value}]\n' +
      'series: [{fromSource: d}]\n';
    await writeFile(path.join(dir, 'pack.yaml'), pack);
    const texts: string[] = [];
    for (const jobs of ['1', '2']) {
      const out = path.join(dir, `out-${jobs}`);
      const cli = path.join(compiled, 'dist/src/cli/main.js');
      const argv = [cli, 'build', path.join(dir, 'pack.yaml'), '--out', out, '-j', jobs];
      const {stdout} = await run(process.execPath, argv, {env: {...process.env, TZ: 'UTC'}});
      texts.push(await readFile(path.join(stdout.trim(), 'results.json'), 'utf8'));
    }
    expect(JSON.parse(texts[0]).series).toHaveLength(10);
    expect(texts[1]).toBe(texts[0]);
  });

  test('an error inside a worker names the series and leaves no worker running', {timeout: 120_000}, async () => {
    const script = `
      import {runPool} from ${JSON.stringify(path.join(compiled, 'dist/src/analyse/pool.js'))};
      const good = ${JSON.stringify(shortInput('x'))};
      const values = () => Float64Array.from([5, NaN, NaN]);
      const inputs = Array.from({length: 12}, (_, i) => ({...good, id: 'k' + i, values: values()}));
      inputs[7] = {...inputs[7], values: null};
      try { await runPool(inputs, {threads: 2, log: {info() {}, warn() {}}}); console.log('no error'); }
      catch (e) { console.log(e.message.split('\\n')[0]); }`;
    // Ten times: the failure comes while the other thread may still be starting or busy, and shutting the pool
    // down at such a moment once crashed Node itself now and then (see src/analyse/workerEntry.cts).
    for (let i = 0; i < 10; i++) {
      const {stdout} = await run(process.execPath, ['--input-type=module', '-e', script], {timeout: 60_000});
      // The child exits on its own (the pool was shut down), and the message names the series.
      expect(stdout).toMatch(/^series k7: analysis failed: \S/);
    }
  });
});
