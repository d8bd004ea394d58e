import {mkdir, mkdtemp, readdir, readFile, rm, symlink, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {afterAll, beforeAll, describe, expect, test} from 'vitest';
import {loadPlan} from '../../src/config/index.js';
import {runCli} from '../robustness/run.js';

/**
 * Which files a pack may make ebbflow read. The rule that exists today (src/config/crossCheck.ts and normalize.ts):
 * `sources[].file`, `branding.logo`, `branding.templates` and `pack.browser` are resolved with `path.resolve`
 * against the pack file's folder; absolute paths and `..` are accepted, and symbolic links are followed. There is
 * NO containment rule: a pack may name any readable file on the machine. These tests pin that down so a rule,
 * when added, changes them on purpose. What does hold: a logo must have a .png/.jpg/.svg name and (at build)
 * content matching it, and nothing read this way is written into the outputs except the logo and the CSV data.
 */

const control = fileURLToPath(new URL('../fixtures/bad/control/', import.meta.url));
let root = '';
let packDir = '';
let outside = '';

async function writePack(extra: string, file = 'data.csv'): Promise<string> {
  const base = await readFile(path.join(control, 'pack.yaml'), 'utf8');
  const text = base.replace('file: data.csv', `file: ${JSON.stringify(file)}`);
  const packFile = path.join(packDir, 'pack.yaml');
  await writeFile(packFile, text.replace('sources:', `${extra}sources:`));
  return packFile;
}

beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'ebbflow-paths-'));
  packDir = path.join(root, 'packs', 'monthly');
  outside = path.join(root, 'elsewhere');
  await mkdir(packDir, {recursive: true});
  await mkdir(path.join(outside, 'templates'), {recursive: true});
  const csv = await readFile(path.join(control, 'data.csv'));
  await writeFile(path.join(packDir, 'data.csv'), csv);
  await writeFile(path.join(outside, 'data.csv'), csv);
  await writeFile(path.join(outside, 'logo.svg'), '<svg xmlns="http://www.w3.org/2000/svg" width="1" height="1"/>');
});

afterAll(async () => {
  await rm(root, {recursive: true, force: true});
});

describe('paths outside the pack folder are accepted (no containment rule)', () => {
  test.each([
    ['sources[].file with ..', '../../elsewhere/data.csv'],
    ['sources[].file absolute', () => path.join(outside, 'data.csv')],
  ])('%s', async (_, file) => {
    const packFile = await writePack('', typeof file === 'function' ? file() : file);
    const run = await runCli(['check', packFile]);
    expect(run.code, run.stderr).toBe(0);
    expect((await loadPlan(packFile)).sources[0].file).toBe(path.join(outside, 'data.csv'));
  });

  test('branding.logo and branding.templates outside the pack folder', async () => {
    const templates = JSON.stringify(path.join(outside, 'templates'));
    const packFile = await writePack(`branding:\n  logo: ../../elsewhere/logo.svg\n  templates: ${templates}\n`);
    expect((await runCli(['check', packFile])).code).toBe(0);
    const plan = await loadPlan(packFile);
    expect(plan.branding.logo).toBe(path.join(outside, 'logo.svg'));
    expect(plan.branding.templates).toBe(path.join(outside, 'templates'));
  });

  test('pack.browser may name any executable path', async () => {
    const packFile = await writePack('');
    const text = await readFile(packFile, 'utf8');
    await writeFile(packFile, text.replace('  frequency:', '  browser: ../../elsewhere/not-a-browser\n  frequency:'));
    const plan = await loadPlan(packFile);
    expect(plan.browser).toBe(path.join(outside, 'not-a-browser'));
  });

  test('a CSV source that is a symbolic link to a system file is followed (and rejected only as bad CSV)', async () => {
    await symlink('/etc/hostname', path.join(packDir, 'linked.csv'));
    const packFile = await writePack('', 'linked.csv');
    const run = await runCli(['check', packFile]);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/linked\.csv:1: date column "date" is not in the header/);
  });
});

describe('logo content', () => {
  test('a logo named .svg that is not an image is bad input: exit 2 with the pack line, nothing written', async () => {
    await writeFile(path.join(packDir, 'fake.svg'), 'not an image\n');
    const packFile = await writePack('branding:\n  logo: fake.svg\n');
    const out = path.join(root, 'out-logo');
    const run = await runCli(['build', packFile, '--out', out, '--formats', 'html', '--jobs', '1']);
    expect(run.stderr).not.toMatch(/^\s+at /m);
    expect(run.stderr).toMatch(/pack\.yaml:\d+:\d+: branding\.logo/);
    expect(run.code, run.stderr).toBe(2);
    expect(await readdir(out).catch(() => [])).toEqual([]);
  });
});
