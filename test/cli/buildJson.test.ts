/** `build --json` on a real build: the files it lists are exactly those on disk, with their sizes and SHA-256. */
import {createHash} from 'node:crypto';
import {mkdtemp, readdir, readFile, rm} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {expect, onTestFinished, test} from 'vitest';
import {main} from '../../src/cli/main.js';

const pack = fileURLToPath(new URL('../fixtures/config/minimal/quarterly-minimal.yaml', import.meta.url));

test('build --json lists every file written with its size and SHA-256', async () => {
  const out = await mkdtemp(path.join(tmpdir(), 'ebbflow-json-'));
  onTestFinished(() => rm(out, {recursive: true, force: true}));
  let stdout = '';
  const io = {stdout: {write: (s: string) => (stdout += s)}, stderr: {write: () => true}, env: {}};
  const argv = ['build', pack, '--out', out, '--formats', 'json,csv', '--jobs', '1', '--json'];
  expect(await main(argv, io)).toBe(0);
  const doc = JSON.parse(stdout);
  expect(doc.problems).toEqual([]);
  expect(doc.built).toHaveLength(1);
  const [period] = doc.built;
  expect(period).toMatchObject({pack: 'quarterly-minimal', period: '2025-Q1', skipped: []});
  const onDisk = (await readdir(period.folder, {recursive: true, withFileTypes: true}))
    .filter((e) => e.isFile())
    .map((e) => path.relative(period.folder, path.join(e.parentPath, e.name)).split(path.sep).join('/'))
    .sort();
  expect(period.files.map((f: {path: string}) => f.path)).toEqual(onDisk);
  expect(onDisk).toContain('exports/summary.csv');
  for (const f of period.files as {path: string; bytes: number; sha256: string}[]) {
    const bytes = await readFile(path.join(period.folder, f.path));
    expect([f.path, bytes.length, createHash('sha256').update(bytes).digest('hex')]).toEqual([
      f.path,
      f.bytes,
      f.sha256,
    ]);
  }
});
