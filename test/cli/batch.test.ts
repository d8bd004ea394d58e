import {cp, mkdtemp, rename} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {beforeAll, beforeEach, describe, expect, test, vi} from 'vitest';

// The pipeline and the browser are replaced: these tests are about how the command line splits and runs a batch.
const pipeline = vi.hoisted(() => ({build: vi.fn(), check: vi.fn(), close: vi.fn(), session: {} as object}));
vi.mock('../../src/run.js', () => ({build: pipeline.build, check: pipeline.check}));
vi.mock('../../src/render/pdfSession.js', () => ({pdfSession: () => pipeline.session}));

const {main} = await import('../../src/cli/main.js');

const minimal = fileURLToPath(new URL('../fixtures/config/minimal/', import.meta.url));
const names = ['delta', 'alpha', 'echo', 'charlie', 'bravo'];
let dir = '';
const pack = (name: string) => path.join(dir, `${name}.yaml`);

async function run(argv: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(argv, {
    stdout: {write: (s: string) => (stdout += s)},
    stderr: {write: (s: string) => (stderr += s)},
  });
  return {code, stdout, stderr};
}

const builtPacks = () => pipeline.build.mock.calls.map((c) => path.basename(c[0].packFile, '.yaml'));

beforeAll(async () => {
  // Five copies of a valid quarterly pack (with its data) under different names.
  dir = await mkdtemp(path.join(tmpdir(), 'ebbflow-batch-'));
  await cp(minimal, dir, {recursive: true});
  for (const name of names) await cp(path.join(dir, 'quarterly-minimal.yaml'), pack(name));
  await rename(path.join(dir, 'quarterly-minimal.yaml'), path.join(dir, 'unused.yml'));
});

beforeEach(() => {
  vi.resetAllMocks();
  pipeline.build.mockImplementation(async (req: {packFile: string; period?: string}) => {
    const id = path.basename(req.packFile, '.yaml');
    return {packId: id, period: req.period ?? '2026-Q1', folder: `/out/${id}/${req.period ?? '2026-Q1'}`, outputs: []};
  });
  pipeline.session = {warm: vi.fn(), print: vi.fn(), close: pipeline.close};
});

describe('many packs', () => {
  test('are built in the order given, all with one browser session, closed once at the end', async () => {
    const {code, stdout} = await run(['build', ...names.map(pack), '--formats', 'html,pdf']);
    expect(code).toBe(0);
    expect(builtPacks()).toEqual(names);
    expect(stdout.split('\n').filter(Boolean)).toHaveLength(5);
    for (const c of pipeline.build.mock.calls) expect(c[0].pdf).toBe(pipeline.session);
    expect(pipeline.close).toHaveBeenCalledTimes(1);
  });

  test('the browser is closed when a build fails part-way', async () => {
    pipeline.build.mockResolvedValueOnce({packId: 'delta', period: 'x', folder: '/out/delta/x', outputs: []});
    pipeline.build.mockRejectedValueOnce(new Error('out of disk space'));
    const {code, stderr} = await run(['build', ...names.map(pack), '--formats', 'pdf']);
    expect(code).toBe(1);
    expect(stderr).toBe('ebbflow: out of disk space\n');
    expect(pipeline.build).toHaveBeenCalledTimes(2);
    expect(pipeline.close).toHaveBeenCalledTimes(1);
  });
});

describe('--shard', () => {
  test('the parts of a batch are disjoint and together build every pack once', async () => {
    const seen: string[][] = [];
    for (const part of ['1/2', '2/2']) {
      pipeline.build.mockClear();
      const {code, stderr} = await run(['build', ...names.map(pack), '--formats', 'json', '--shard', part]);
      expect(code).toBe(0);
      expect(stderr).toContain(`shard ${part}: ${part === '1/2' ? 3 : 2} of 5 packs\n`);
      seen.push(builtPacks());
    }
    // Sorted by full path: alpha, bravo, charlie, delta, echo; part 1 takes positions 1, 3, 5.
    expect(seen).toEqual([
      ['alpha', 'charlie', 'echo'],
      ['bravo', 'delta'],
    ]);
  });

  test('does not depend on the order the packs are given in', async () => {
    await run(['build', ...names.map(pack), '--formats', 'json', '--shard', '2/3']);
    const first = builtPacks();
    pipeline.build.mockClear();
    await run(['build', ...[...names].reverse().map(pack), '--formats', 'json', '--shard', '2/3']);
    expect(builtPacks()).toEqual(first);
    expect(first).toEqual(['bravo', 'echo']);
  });

  test('with a period range splits the packs, and every pack of the part gets every period', async () => {
    const {code} = await run(['build', ...names.map(pack), '--period', '2025-Q4..2026-Q1', '--shard', '2/2']);
    expect(code).toBe(0);
    expect(pipeline.build.mock.calls.map((c) => `${path.basename(c[0].packFile, '.yaml')} ${c[0].period}`)).toEqual([
      'bravo 2025-Q4',
      'bravo 2026-Q1',
      'delta 2025-Q4',
      'delta 2026-Q1',
    ]);
  });

  test('a part with no packs says so and succeeds', async () => {
    expect(await run(['build', pack('alpha'), pack('bravo'), '--shard', '3/4'])).toEqual({
      code: 0,
      stdout: '',
      stderr: 'shard 3/4: 0 of 2 packs\n',
    });
    expect(pipeline.build).not.toHaveBeenCalled();
  });

  test('only the packs of the part are checked before building', async () => {
    // "bravo" is at position 2 of 2: part 1/2 never reads it, so its problem does not stop part 1.
    const broken = path.join(dir, 'missing-bravo.yaml');
    expect((await run(['build', pack('alpha'), broken, '--formats', 'json', '--shard', '1/2'])).code).toBe(0);
    expect(builtPacks()).toEqual(['alpha']);
    const other = await run(['build', pack('alpha'), broken, '--formats', 'json', '--shard', '2/2']);
    expect(other.code).toBe(2);
    expect(other.stderr).toMatch(/missing-bravo\.yaml: pack file not found/);
  });

  test.each([
    ['0/8', 'the part i must be from 1 to 8 (parts count from 1)'],
    ['9/8', 'the part i must be from 1 to 8 (parts count from 1)'],
    ['3', 'write it as i/n, e.g. 3/8 for the third of eight parts'],
  ])('--shard %s is a usage error (exit 2)', async (value, message) => {
    const {code, stdout, stderr} = await run(['build', pack('alpha'), '--shard', value]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(stderr).toContain(`error: option '--shard <i/n>' argument '${value}' is invalid. ${message}`);
    expect(pipeline.build).not.toHaveBeenCalled();
  });

  test('is listed in the help', async () => {
    const {stdout} = await run(['build', '--help']);
    expect(stdout).toContain('--shard <i/n>');
    expect(stdout).toContain('ebbflow build packs/*.yaml --shard 3/8');
  });
});
