import {mkdtemp, readdir, readFile, rm} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {createServer} from 'node:net';
import {afterAll, afterEach, beforeAll, beforeEach, describe, expect, test} from 'vitest';
import {startCluster, type Cluster} from '../helpers/postgresCluster.js';
import {CRASH_TEXT, runCli} from './run.js';

/**
 * Broken packs and CSV files (test/fixtures/bad/, described in cases.json): each must give exit code 2, the
 * expected `file:line: message` on stderr, no stack trace, and write nothing — neither into --out nor next to
 * the pack.
 */

interface BadCase {
  name: string;
  pack: string;
  /** Regular expressions, each matched against one stderr line. */
  expect: string[];
  /** Regular expressions no stderr line may match (misleading follow-on problems, leaked passwords). */
  reject?: string[];
  why: string;
  /**
   * Environment variables set for the run; `{closedPort}` becomes a port nothing listens on, `{clusterPort}` the
   * port of a throwaway PostgreSQL server (test/helpers/postgresCluster.ts), started when a case sets `postgres`.
   */
  env?: Record<string, string>;
  postgres?: boolean;
}

const fixtures = fileURLToPath(new URL('../fixtures/bad/', import.meta.url));
const cases: BadCase[] = JSON.parse(await readFile(path.join(fixtures, 'cases.json'), 'utf8'));

let cluster: Cluster | undefined;
let closedPort = 0;
beforeAll(async () => {
  closedPort = await new Promise<number>((resolve) => {
    const server = createServer().listen(0, '127.0.0.1', () => {
      const {port} = server.address() as {port: number};
      server.close(() => resolve(port));
    });
  });
  if (cases.some((c) => c.postgres)) cluster = await startCluster();
});
afterAll(() => cluster?.stop());

/** Set a case's environment variables for the length of `run`. */
async function withEnv<T>(env: Record<string, string> | undefined, run: () => Promise<T>): Promise<T> {
  const names = Object.keys(env ?? {});
  for (const name of names)
    process.env[name] = env![name].replace('{closedPort}', String(closedPort)).replace('{clusterPort}', String(cluster?.port));
  try {
    return await run();
  } finally {
    for (const name of names) delete process.env[name];
  }
}

let out = '';
beforeEach(async () => {
  out = await mkdtemp(path.join(tmpdir(), 'ebbflow-bad-'));
});
afterEach(async () => {
  await rm(out, {recursive: true, force: true});
});

/** Every expected pattern matches some stderr line; stderr ends with the "nothing was written" summary. */
function expectProblems(stderr: string, expected: string[], rejected: string[] = []): void {
  const lines = stderr.split('\n');
  for (const e of expected) {
    const re = new RegExp(e);
    expect(
      lines.some((l) => re.test(l)),
      `no stderr line matches /${e}/ in:\n${stderr}`,
    ).toBe(true);
  }
  for (const r of rejected) expect(stderr).not.toMatch(new RegExp(r));
  expect(stderr).toMatch(/\d+ problems?; nothing was written\n$/);
  expect(stderr).not.toMatch(CRASH_TEXT);
}

test('the manifest lists at least 30 cases, each with a folder and an expectation', async () => {
  expect(cases.length).toBeGreaterThanOrEqual(30);
  expect(new Set(cases.map((c) => c.name)).size).toBe(cases.length);
  for (const c of cases) {
    expect(c.expect.length, c.name).toBeGreaterThan(0);
    expect(c.why, c.name).not.toBe('');
    await readFile(path.join(fixtures, c.pack));
  }
});

test('the control pack the cases derive from is valid', async () => {
  const run = await runCli(['check', path.join(fixtures, 'control', 'pack.yaml')]);
  expect(run.stderr).toContain('no problems');
  expect(run.code).toBe(0);
});

describe.each(cases)('$name', ({pack, expect: expected, reject, env}) => {
  const packFile = path.join(fixtures, pack);

  test('check: exit 2 with file:line problems', async () => {
    const before = await readdir(path.dirname(packFile));
    const run = await withEnv(env, () => runCli(['check', packFile]));
    expectProblems(run.stderr, expected, reject);
    expect(run.stdout).toBe('');
    expect(run.code).toBe(2);
    expect(await readdir(path.dirname(packFile))).toEqual(before);
  });

  test('build: exit 2, same problems, nothing written', async () => {
    const before = await readdir(path.dirname(packFile));
    const run = await withEnv(env, () => runCli(['build', packFile, '--out', out, '--jobs', '1']));
    expectProblems(run.stderr, expected, reject);
    expect(run.stdout).toBe('');
    expect(run.code).toBe(2);
    expect(await readdir(out)).toEqual([]);
    expect(await readdir(path.dirname(packFile))).toEqual(before);
  });
});

test('check lists every problem of a pack at once: config keys, missing files and CSV cells', async () => {
  const packFile = path.join(fixtures, 'several-problems', 'pack.yaml');
  const run = await runCli(['check', packFile]);
  expect(run.code).toBe(2);
  expectProblems(run.stderr, [
    String.raw`pack\.yaml:\d+:\d+: series\[0\] has an unknown key lable; did you mean label\?`,
    String.raw`pack\.yaml:\d+:5: sources\[2\]\.file not found: gone\.csv`,
    String.raw`data\.csv:12:1: 2023-05 appears twice, on lines 6 and 12`,
    String.raw`other\.csv:8:2: "n/k" in column "orders" is not a number`,
  ]);
});
