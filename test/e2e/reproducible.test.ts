/**
 * Same inputs, same bytes (ARCHITECTURE.md, "Principles"): the demo pack built twice gives identical
 * period folders, file by file, and the PDF's dates come from the review period, not from the clock.
 *
 * The first build runs in-process into one output folder, the second through the command line with another
 * `--out`: the manifest records the plan without the output folder, so the two period folders (PDF included) and
 * the index pages must be byte-identical. A third build runs in a child process with another time zone and must
 * give the same results.json and report.html bytes.
 */
import {execFileSync, spawn} from 'node:child_process';
import {mkdtempSync, readFileSync, readdirSync, renameSync, rmSync, statSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join, relative, resolve} from 'node:path';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {build} from '../../src/run.js';
import {collectingLogger} from '../../src/log.js';

const PACK = resolve('sample-config/monthly-pack.yaml');
const PACK_ID = 'tarnwick-monthly';
const PERIOD = '2026-10';
const REGISTER = resolve('test/archive/fixtures/ts-register.mjs');
const CLI = resolve('src/cli/main.ts');

const root = mkdtempSync(join(tmpdir(), 'ebbflow-repro-'));
const out = join(root, 'out');
const first = join(root, 'first');
const zoned = join(root, 'zoned');
let pdfSkipped: string | null = null;

/** Every file under `dir`, as paths relative to it, sorted. */
function listFiles(dir: string): string[] {
  const files: string[] = [];
  const walk = (d: string) => {
    for (const e of readdirSync(d, {withFileTypes: true})) {
      const p = join(d, e.name);
      if (e.isDirectory()) walk(p);
      else files.push(relative(dir, p));
    }
  };
  walk(dir);
  return files.sort();
}

/** Build the demo pack in-process into `out` (one analysis thread). */
async function buildDemo(): Promise<void> {
  const summary = await build({packFile: PACK, outDir: out, force: false, jobs: 1}, collectingLogger());
  pdfSkipped = summary.pdfSkipped;
}

/** The CLI in a child process with its own TZ; resolves with the exit code and stderr. */
function cliChild(args: string[], tz: string): Promise<{code: number | null; stderr: string}> {
  return new Promise((done, fail) => {
    const proc = spawn(process.execPath, ['--import', REGISTER, CLI, ...args], {
      env: {...process.env, TZ: tz},
      stdio: ['ignore', 'ignore', 'pipe'],
    });
    let stderr = '';
    proc.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    proc.on('error', fail);
    proc.on('exit', (code) => done({code, stderr}));
  });
}

/**
 * Entry name → content of an XLSX (a zip), read with Info-ZIP's `unzip -p`. Its member names are wildcard
 * patterns, so `[`, `*` and `?` (as in `[Content_Types].xml`) are put in brackets to match literally.
 */
function unzipped(file: string): Map<string, Buffer> {
  const names = execFileSync('unzip', ['-Z1', file], {encoding: 'utf8'}).split('\n').filter(Boolean).sort();
  const literal = (name: string) => name.replace(/[[*?]/g, '[$&]');
  return new Map(names.map((n) => [n, execFileSync('unzip', ['-p', file, literal(n)], {maxBuffer: 1 << 28})]));
}

beforeAll(async () => {
  await buildDemo();
  renameSync(join(out, PACK_ID), first);
  const elsewhere = join(root, 'elsewhere');
  const again = await cliChild(['build', PACK, '--out', elsewhere, '--jobs', '1'], 'UTC');
  if (again.code !== 0) throw new Error(`--out ${elsewhere} build failed (${again.code}): ${again.stderr}`);
  renameSync(join(elsewhere, PACK_ID), zoned);
  const args = ['build', PACK, '--out', out, '--formats', 'json,html', '--jobs', '1'];
  const child = await cliChild(args, 'America/New_York');
  if (child.code !== 0) throw new Error(`TZ=America/New_York build failed (${child.code}): ${child.stderr}`);
  // Put the builds where the tests read them: `first` and `second`, and the zoned one.
  renameSync(join(out, PACK_ID), join(root, 'ny'));
  renameSync(zoned, join(root, 'second'));
}, 1_200_000);

afterAll(() => rmSync(root, {recursive: true, force: true}));

const second = join(root, 'second');
const ny = join(root, 'ny');

describe('the demo pack built twice, into two different output folders', () => {
  it('writes the same set of files', () => {
    expect(pdfSkipped).toBeNull();
    const a = listFiles(first);
    expect(a).toEqual(listFiles(second));
    for (const f of ['index.html', `${PERIOD}/report.html`, `${PERIOD}/report.pdf`, `${PERIOD}/results.json`])
      expect(a).toContain(f);
    expect(a).toContain(`${PERIOD}/manifest.json`);
    expect(a).toContain(`${PERIOD}/exports/tables.xlsx`);
    expect(a.filter((f) => f.endsWith('.csv')).length).toBeGreaterThanOrEqual(5);
  });

  it('report.html, results.json, manifest.json, index.html and every CSV are byte-identical', () => {
    const files = listFiles(first).filter((f) => /\.(html|json|csv)$/.test(f));
    expect(files.length).toBeGreaterThanOrEqual(9);
    const differ = files.filter((f) => !readFileSync(join(first, f)).equals(readFileSync(join(second, f))));
    expect(differ).toEqual([]);
  });

  it('the XLSX is byte-identical (exceljs writes no clock values into the zip or the workbook properties)', () => {
    const f = `${PERIOD}/exports/tables.xlsx`;
    const a = readFileSync(join(first, f));
    const b = readFileSync(join(second, f));
    // Were the bytes to differ, the entries are still compared one by one, so a failure says which part moved.
    if (!a.equals(b)) {
      const ua = unzipped(join(first, f));
      const ub = unzipped(join(second, f));
      expect([...ua.keys()]).toEqual([...ub.keys()]);
      for (const [name, content] of ua) expect(content.equals(ub.get(name)!), name).toBe(true);
    }
    expect(a.equals(b)).toBe(true);
    // The workbook properties carry no date of the run (exceljs would otherwise write "now").
    const core = unzipped(join(first, f)).get('docProps/core.xml')?.toString('utf8') ?? '';
    const today = new Date().toISOString().slice(0, 10);
    expect(core).not.toContain(today);
  });

  it('the PDF is byte-identical', () => {
    const a = readFileSync(join(first, PERIOD, 'report.pdf'));
    const b = readFileSync(join(second, PERIOD, 'report.pdf'));
    expect(a.length).toBe(b.length);
    expect(a.equals(b)).toBe(true);
  });

  it("the PDF's creation and modification dates are the day after the review period, read back by pdfinfo", () => {
    // The review period is October 2026, so the date is 2026-11-01; never the build day.
    const info = execFileSync('pdfinfo', ['-isodates', join(first, PERIOD, 'report.pdf')], {
      encoding: 'utf8',
      env: {...process.env, TZ: 'UTC'},
    });
    expect(info).toMatch(/^CreationDate:\s+2026-11-01T00:00:00(Z|\+00)/m);
    expect(info).toMatch(/^ModDate:\s+2026-11-01T00:00:00(Z|\+00)/m);
  });

  it('the manifest hashes match the files written', () => {
    const manifest = JSON.parse(readFileSync(join(first, PERIOD, 'manifest.json'), 'utf8'));
    expect(manifest.pack).toMatchObject({id: PACK_ID, period: PERIOD});
    for (const o of manifest.outputs as {path: string; bytes: number}[]) {
      expect(statSync(join(first, PERIOD, o.path)).size, o.path).toBe(o.bytes);
    }
  });
});

describe('the demo pack built under TZ=America/New_York', () => {
  it('gives the same results.json bytes as the TZ=UTC builds', () => {
    const a = readFileSync(join(first, PERIOD, 'results.json'));
    const b = readFileSync(join(ny, PERIOD, 'results.json'));
    expect(b.equals(a)).toBe(true);
  });

  // Every temporal chart layer uses a UTC scale, so vega's labels (e.g. "t: Sept 01, 2019") do not move to
  // "Aug 31, 2019" under New York time.
  it('gives the same report.html bytes as the TZ=UTC builds', () => {
    const a = readFileSync(join(first, PERIOD, 'report.html'));
    const b = readFileSync(join(ny, PERIOD, 'report.html'));
    expect(b.equals(a)).toBe(true);
  });
});
