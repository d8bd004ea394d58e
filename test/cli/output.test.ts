/** `--json`, `--quiet`, `--verbose`, the PDF warning said once, and the `schema` command (pipeline replaced). */
import {mkdir, mkdtemp, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {beforeEach, describe, expect, test, vi} from 'vitest';
import {packJsonSchema} from '../../src/config/jsonSchema.js';
import {InputError} from '../../src/errors.js';
import type {Logger} from '../../src/log.js';

const pipeline = vi.hoisted(() => ({build: vi.fn(), check: vi.fn(), openBrowser: vi.fn(), close: vi.fn()}));
vi.mock('../../src/run.js', () => ({build: pipeline.build, check: pipeline.check}));
vi.mock('../../src/render/index.js', () => ({openBrowser: pipeline.openBrowser}));

const {main} = await import('../../src/cli/main.js');

const fixtures = fileURLToPath(new URL('../fixtures/config/', import.meta.url));
const minimalPack = path.join(fixtures, 'minimal', 'quarterly-minimal.yaml');
const NO_BROWSER = 'PDF skipped: no Chromium or Chrome found; install one';

async function run(argv: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(argv, {
    stdout: {write: (s: string) => (stdout += s)},
    stderr: {write: (s: string) => (stderr += s)},
    env: {},
  });
  return {code, stdout, stderr};
}

let out: string;

beforeEach(async () => {
  vi.resetAllMocks();
  out = await mkdtemp(path.join(tmpdir(), 'ebbflow-cli-output-'));
  // Each build announces its stages, logs a line and leaves a period folder with a manifest.
  pipeline.build.mockImplementation(async (req: {period?: string}, log: Logger) => {
    const period = req.period ?? '2025-Q1';
    for (const stage of ['config', 'ingest', 'analyse']) log.stage?.(stage);
    log.info(`p ${period}: 1 series read`);
    const folder = path.join(out, 'p', period);
    await mkdir(folder, {recursive: true});
    const outputs = [{path: 'results.json', bytes: 2, sha256: 'ab'.repeat(32)}];
    await writeFile(
      path.join(folder, 'manifest.json'),
      '{"outputs":[{"path":"results.json","bytes":2,"sha256":"' + 'ab'.repeat(32) + '"}]}',
    );
    return {
      packId: 'p',
      period,
      folder,
      outputs: outputs.map((o) => path.join(folder, o.path)),
      pdfSkipped: NO_BROWSER,
    };
  });
  pipeline.openBrowser.mockResolvedValue({missing: NO_BROWSER});
});

describe('build', () => {
  test('a missing browser is said once for a period range', async () => {
    const {code, stderr, stdout} = await run(['build', minimalPack, '--period', '2025-Q3..2026-Q1']);
    expect(code).toBe(0);
    expect(stderr.split(NO_BROWSER).length - 1).toBe(1);
    expect(stdout.trim().split('\n')).toHaveLength(3);
  });

  test('--json prints one document: each period with its files and hashes, skipped formats, warnings', async () => {
    const {code, stdout, stderr} = await run(['build', minimalPack, '--period', '2025-Q4..2026-Q1', '--json']);
    expect(code).toBe(0);
    const doc = JSON.parse(stdout);
    expect(Object.keys(doc)).toEqual(['built', 'warnings', 'problems']);
    expect(doc.built.map((b: {period: string}) => b.period)).toEqual(['2025-Q4', '2026-Q1']);
    expect(doc.built[0]).toEqual({
      pack: 'p',
      period: '2025-Q4',
      folder: path.join(out, 'p', '2025-Q4'),
      files: [
        {path: 'manifest.json', bytes: expect.any(Number), sha256: expect.stringMatching(/^[0-9a-f]{64}$/)},
        {path: 'results.json', bytes: 2, sha256: 'ab'.repeat(32)},
      ],
      skipped: [{format: 'pdf', reason: NO_BROWSER}],
    });
    expect(doc.warnings).toEqual([NO_BROWSER]);
    expect(doc.problems).toEqual([]);
    expect(stderr).toContain(`warning: ${NO_BROWSER}`);
  });

  test('--json with bad input: exit 2 and the problems in the document, not as lines on stderr', async () => {
    pipeline.build.mockRejectedValueOnce(
      new InputError([{file: 'data/x.csv', line: 40, column: 3, message: 'not a number: "n/a"'}]),
    );
    const {code, stdout, stderr} = await run(['build', minimalPack, '--json']);
    expect(code).toBe(2);
    expect(JSON.parse(stdout)).toEqual({
      built: [],
      warnings: [],
      problems: [{file: 'data/x.csv', line: 40, column: 3, message: 'not a number: "n/a"'}],
    });
    expect(stderr).not.toContain('not a number');
  });

  test('--json when the run fails while working: exit 1 and its message as error', async () => {
    pipeline.build.mockRejectedValueOnce(new Error('out of disk space\nmore'));
    const {code, stdout} = await run(['build', minimalPack, '--json']);
    expect(code).toBe(1);
    expect(JSON.parse(stdout)).toEqual({built: [], warnings: [], problems: [], error: 'out of disk space'});
  });

  test('--quiet prints only warnings', async () => {
    const {code, stdout, stderr} = await run(['build', minimalPack, '--quiet']);
    expect(code).toBe(0);
    expect(stdout).toBe('');
    expect(stderr).toBe(`warning: ${NO_BROWSER}\n`);
  });

  test('--verbose stamps each line and prints the time of each stage', async () => {
    const {code, stderr} = await run(['build', minimalPack, '--verbose']);
    expect(code).toBe(0);
    const lines = stderr.trim().split('\n');
    for (const line of lines) expect(line).toMatch(/^\[ *\d+\.\d\d s\] /);
    expect(lines.at(-1)).toMatch(
      / timings p 2025-Q1: config \d+\.\d\d s, ingest \d+\.\d\d s, analyse \d+\.\d\d s \(total \d+\.\d\d s\)$/,
    );
  });

  test('--quiet and --verbose together are a usage error', async () => {
    const {code, stderr} = await run(['build', minimalPack, '--quiet', '--verbose']);
    expect(code).toBe(2);
    expect(stderr).toMatch(/cannot be used with option '-v, --verbose'/);
  });
});

describe('check --json', () => {
  test('prints {problems: [{file, line, column, message}]} and exits 2', async () => {
    pipeline.check.mockRejectedValueOnce(
      new InputError([{file: 'a.yaml', line: 3, column: 5, message: 'pack.title is required'}]),
    );
    const {code, stdout, stderr} = await run(['check', 'a.yaml', '--json']);
    expect(code).toBe(2);
    expect(JSON.parse(stdout)).toEqual({
      problems: [{file: 'a.yaml', line: 3, column: 5, message: 'pack.title is required'}],
    });
    expect(stderr).toBe('');
  });

  test('no problems: an empty list and exit 0', async () => {
    expect(await run(['check', minimalPack, '--json'])).toEqual({
      code: 0,
      stdout: '{\n  "problems": []\n}\n',
      stderr: '',
    });
  });
});

test('schema prints the JSON Schema of the pack file', async () => {
  const {code, stdout} = await run(['schema']);
  expect(code).toBe(0);
  expect(stdout).toBe(packJsonSchema());
  expect(JSON.parse(stdout).$schema).toBe('https://json-schema.org/draft/2020-12/schema');
});
