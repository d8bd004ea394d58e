import {mkdir, mkdtemp, readdir, readFile, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import Ajv2020 from 'ajv/dist/2020.js';
import {beforeEach, describe, expect, test, vi} from 'vitest';
import {parse} from 'yaml';
import {loadPlan} from '../../src/config/index.js';
import {InputError} from '../../src/errors.js';

// The pipeline and the browser are replaced: these tests are about the command line only.
const pipeline = vi.hoisted(() => ({build: vi.fn(), check: vi.fn(), close: vi.fn(), session: {} as object}));
vi.mock('../../src/run.js', () => ({build: pipeline.build, check: pipeline.check}));
vi.mock('../../src/render/pdfSession.js', () => ({pdfSession: () => pipeline.session}));

const {main} = await import('../../src/cli/main.js');

const fixtures = fileURLToPath(new URL('../fixtures/config/', import.meta.url));
const validPack = path.join(fixtures, 'valid', 'pack.yaml');
const minimalPack = path.join(fixtures, 'minimal', 'quarterly-minimal.yaml');
const packageJson = JSON.parse(await readFile(new URL('../../package.json', import.meta.url), 'utf8'));

async function run(argv: string[], env: NodeJS.ProcessEnv = {}) {
  let stdout = '';
  let stderr = '';
  const code = await main(argv, {
    stdout: {write: (s: string) => (stdout += s)},
    stderr: {write: (s: string) => (stderr += s)},
    env,
  });
  return {code, stdout, stderr};
}

const badInput = new InputError([
  {file: 'pack.yaml', line: 12, column: 5, message: 'series[1].kind must be one of flow, stock, ratio'},
  {file: 'data/x.csv', line: 40, column: null, message: 'not a number: "n/a"'},
]);

beforeEach(() => {
  vi.resetAllMocks();
  pipeline.build.mockImplementation(async (req: {packFile: string; period?: string}) => ({
    packId: 'p',
    period: req.period ?? 'latest',
    folder: `/out/p/${req.period ?? 'latest'}`,
    outputs: ['report.html'],
    pdfSkipped: null,
  }));
  pipeline.check.mockResolvedValue(undefined);
  pipeline.session = {warm: vi.fn(), print: vi.fn(), close: pipeline.close};
});

describe('help and version', () => {
  test('--version prints the package version', async () => {
    expect(await run(['--version'])).toEqual({code: 0, stdout: `${packageJson.version}\n`, stderr: ''});
  });

  test('--help lists the commands', async () => {
    const {code, stdout} = await run(['--help']);
    expect(code).toBe(0);
    expect(stdout).toMatch(/^Usage: ebbflow \[options\] \[command\]/);
    for (const c of ['build [options] <pack...>', 'check [options] <pack...>', 'init [dir]', 'schema']) {
      expect(stdout).toContain(c);
    }
  });

  test.each([
    ['build', ['--period <period>', '--out <dir>', '--formats <list>', '--force', '--jobs <n>', 'Examples:']],
    ['check', ['<pack...>', '--json', '--quiet', '--verbose']],
    ['init', ['[dir]', 'default: "./ebbflow-pack"']],
  ])('%s --help', async (command, expected) => {
    const {code, stdout} = await run([command, '--help']);
    expect(code).toBe(0);
    expect(stdout).toContain(`Usage: ebbflow ${command}`);
    for (const e of expected) expect(stdout).toContain(e);
  });

  test('usage errors exit with 2', async () => {
    expect((await run([])).code).toBe(2);
    const unknown = await run(['bild', 'pack.yaml']);
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toMatch(/unknown command 'bild'/);
    const option = await run(['build', validPack, '--colour']);
    expect(option.code).toBe(2);
    expect(option.stderr).toMatch(/unknown option '--colour'/);
    const formats = await run(['build', validPack, '--formats', 'html,pfd']);
    expect(formats.code).toBe(2);
    expect(formats.stderr).toContain(
      'unknown format "pfd"; did you mean pdf? (choose from html, pdf, json, csv, xlsx)',
    );
    expect((await run(['build', validPack, '--jobs', '0'])).code).toBe(2);
    expect(pipeline.build).not.toHaveBeenCalled();
  });
});

describe('build', () => {
  test('passes the options to the pipeline and prints the folder', async () => {
    const argv = ['build', validPack, '-p', '2025-03', '--out', 'o', '--formats', 'html,json', '--force', '-j', '3'];
    const {code, stdout} = await run(argv);
    expect(code).toBe(0);
    expect(stdout).toBe('/out/p/2025-03\n');
    expect(pipeline.build).toHaveBeenCalledTimes(1);
    expect(pipeline.build.mock.calls[0][0]).toEqual({
      packFile: validPack,
      period: '2025-03',
      outDir: 'o',
      formats: ['html', 'json'],
      force: true,
      jobs: 3,
      pdf: pipeline.session,
      allowDirs: [],
    });
  });

  test('a period range builds each period in order, sharing one browser session', async () => {
    const {code, stdout} = await run(['build', minimalPack, '--period', '2025-Q3..2026-Q1']);
    expect(code).toBe(0);
    expect(pipeline.build.mock.calls.map((c) => c[0].period)).toEqual(['2025-Q3', '2025-Q4', '2026-Q1']);
    expect(stdout).toBe('/out/p/2025-Q3\n/out/p/2025-Q4\n/out/p/2026-Q1\n');
    expect(pipeline.close).toHaveBeenCalledTimes(1);
    for (const c of pipeline.build.mock.calls) expect(c[0].pdf).toBe(pipeline.session);
  });

  test('a bad range is bad input', async () => {
    const reversed = await run(['build', minimalPack, '--period', '2026-Q1..2025-Q3']);
    expect(reversed).toEqual({
      code: 2,
      stdout: '',
      stderr:
        'command line: --period 2026-Q1..2025-Q3 runs backwards; put the earlier period first\n' +
        '1 problem; nothing was written\n',
    });
    const label = await run(['build', minimalPack, '--period', '2025-03..2025-06']);
    expect(label.stderr).toContain(
      'command line: --period 2025-03..2025-06: 2025-03 is not a quarterly period; write it like 2026-Q3',
    );
  });

  test('bad packs are all reported before anything is built', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'ebbflow-cli-'));
    const broken = path.join(dir, 'broken.yaml');
    await writeFile(broken, 'pack:\n  title: T\n  frequency: monthly\nsources: []\nseries: []\n');
    const {code, stdout, stderr} = await run(['build', validPack, broken, 'missing.yaml']);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(stderr.split('\n')).toEqual([
      `${broken}:4:1: sources must list at least 1 item`,
      `${broken}:5:1: series must list at least 1 item`,
      expect.stringMatching(/^missing\.yaml: pack file not found/),
      '3 problems; nothing was written',
      '',
    ]);
    expect(stderr).not.toMatch(/\bat .*\.ts:\d+/);
    expect(pipeline.build).not.toHaveBeenCalled();
  });

  test('data problems found while building exit with 2 and say what was kept', async () => {
    const first = {packId: 'p', period: '2025-Q3', folder: '/out/p/2025-Q3', outputs: [], pdfSkipped: null};
    pipeline.build.mockResolvedValueOnce(first);
    pipeline.build.mockRejectedValueOnce(badInput);
    const {code, stderr} = await run(['build', minimalPack, '--period', '2025-Q3..2025-Q4', '--formats', 'html']);
    expect(code).toBe(2);
    expect(stderr).toBe(
      'pack.yaml:12:5: series[1].kind must be one of flow, stock, ratio\n' +
        'data/x.csv:40: not a number: "n/a"\n' +
        '2 problems; the 1 period folder built before were kept\n',
    );
  });

  test('a failure while working exits with 1 and one line, the stack only with EBBFLOW_DEBUG=1', async () => {
    pipeline.build.mockRejectedValue(new Error('browser crashed\nsecond line'));
    expect(await run(['build', validPack])).toEqual({code: 1, stdout: '', stderr: 'ebbflow: browser crashed\n'});
    const debug = await run(['build', validPack], {EBBFLOW_DEBUG: '1'});
    expect(debug.code).toBe(1);
    expect(debug.stderr).toMatch(/^ebbflow: browser crashed\nError: browser crashed\nsecond line\n\s+at /);
  });
});

describe('check', () => {
  test('exit 0 when every pack is fine', async () => {
    expect((await run(['check', validPack, minimalPack])).code).toBe(0);
    expect(pipeline.check.mock.calls.map((c) => c[0])).toEqual([validPack, minimalPack]);
  });

  test('problems from every pack, then exit 2', async () => {
    pipeline.check.mockRejectedValueOnce(badInput).mockRejectedValueOnce(
      new InputError([{file: 'b.yaml', line: 3, column: 1, message: 'pack.title is required'}]),
    );
    const {code, stderr} = await run(['check', 'a.yaml', 'b.yaml']);
    expect(code).toBe(2);
    expect(stderr).toBe(
      'pack.yaml:12:5: series[1].kind must be one of flow, stock, ratio\n' +
        'data/x.csv:40: not a number: "n/a"\n' +
        'b.yaml:3:1: pack.title is required\n' +
        '3 problems; nothing was written\n',
    );
  });

  test('an unexpected failure exits with 1', async () => {
    pipeline.check.mockRejectedValue(new TypeError('x is undefined'));
    expect(await run(['check', 'a.yaml'])).toEqual({code: 1, stdout: '', stderr: 'ebbflow: x is undefined\n'});
  });
});

describe('init', () => {
  test('copies the starter pack and the files it names, then says what to run', async () => {
    const dir = path.join(await mkdtemp(path.join(tmpdir(), 'ebbflow-init-')), 'starter');
    const {code, stdout} = await run(['init', dir]);
    expect(code).toBe(0);
    expect(stdout).toMatch(/^Wrote a starter pack \(\d+ files\) to .*starter\n/);
    expect(stdout).toMatch(/\nNext: ebbflow build .*starter\/monthly-pack\.yaml\n$/);
    const files = (await readdir(dir, {recursive: true})).sort();
    expect(files).toContain('monthly-pack.yaml');
    expect(files).toContain(path.join('data', 'trading.csv'));
    // The copy is a working pack: its paths still resolve.
    const plan = await loadPlan(path.join(dir, 'monthly-pack.yaml'));
    expect(plan.sources[0].file.startsWith(dir)).toBe(true);
  });

  test('writes the JSON Schema beside the pack, which names it on its first line and passes it (ajv)', async () => {
    const dir = path.join(await mkdtemp(path.join(tmpdir(), 'ebbflow-init-')), 'starter');
    expect((await run(['init', dir])).code).toBe(0);
    const text = await readFile(path.join(dir, 'monthly-pack.yaml'), 'utf8');
    expect(text.split('\n')[0]).toBe('# yaml-language-server: $schema=pack.schema.json');
    const schema = JSON.parse(await readFile(path.join(dir, 'pack.schema.json'), 'utf8'));
    const validate = new Ajv2020({strict: true}).compile(schema);
    expect(validate(parse(text)), JSON.stringify(validate.errors)).toBe(true);
    expect(validate(parse(text.replace('  title:', '  titel:')))).toBe(false);
  });

  test('refuses a folder that is not empty', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'ebbflow-init-'));
    await mkdir(path.join(dir, 'something'));
    expect(await run(['init', dir])).toEqual({
      code: 2,
      stdout: '',
      stderr: `${dir}: exists and is not empty; choose a new or empty folder\n1 problem; nothing was written\n`,
    });
  });
});
