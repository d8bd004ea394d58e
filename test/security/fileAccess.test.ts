import {chmod, mkdir, mkdtemp, readdir, readFile, rm, symlink, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {afterAll, beforeAll, describe, expect, test} from 'vitest';
import {loadPlan} from '../../src/config/index.js';
import {InputError} from '../../src/errors.js';
import {runCli} from '../robustness/run.js';

/**
 * Which files a pack may make ebbflow read (rule enforced in src/config/fileAccess.ts via crossCheck.ts):
 * `sources[].file`, `branding.logo`, `branding.templates` (and every file in that folder) must, with symbolic
 * links resolved, lie inside the pack file's folder or below it, unless the operator allows more folders with
 * `PlanOverrides.allowDirs` (`--allow-dir`). A path outside is a config problem at the key's line, exit 2, and
 * the file is never read. `pack.browser` must be an executable Chromium-family browser by file name.
 */

const control = fileURLToPath(new URL('../fixtures/bad/control/', import.meta.url));
/** Text only the outside files hold: it must never show up in any output. */
const SECRET = 'outside-secret-5c1f9';
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

/** Problems `loadPlan` throws, as `line:column: message` lines (file name only for other files). */
async function problemsOf(packFile: string, allowDirs?: string[]): Promise<string[]> {
  try {
    await loadPlan(packFile, {allowDirs});
    return [];
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    return e.problems.map((p) =>
      p.file === packFile ? `${p.line}:${p.column}: ${p.message}` : `${path.basename(p.file)}:${p.line}: ${p.message}`,
    );
  }
}

const outsideText = (key: string, real: string) =>
  `${key} is outside the pack's folder (${real}); move the file next to the pack or allow its folder with --allow-dir`;

beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'ebbflow-paths-'));
  packDir = path.join(root, 'packs', 'monthly');
  outside = path.join(root, 'elsewhere');
  await mkdir(packDir, {recursive: true});
  await mkdir(path.join(outside, 'templates'), {recursive: true});
  const csv = await readFile(path.join(control, 'data.csv'), 'utf8');
  await writeFile(path.join(packDir, 'data.csv'), csv);
  await writeFile(path.join(outside, 'data.csv'), csv);
  await writeFile(path.join(outside, 'secret.csv'), `${SECRET}\n${SECRET},1\n`);
  await writeFile(path.join(outside, 'logo.svg'), '<svg xmlns="http://www.w3.org/2000/svg" width="1" height="1"/>');
  await writeFile(path.join(outside, 'templates', 'styles.css'), `/* ${SECRET} */\n`);
  await symlink(path.join(outside, 'secret.csv'), path.join(packDir, 'linked.csv'));
  await symlink('/etc/hostname', path.join(packDir, 'hostname.csv'));
});

afterAll(async () => {
  await rm(root, {recursive: true, force: true});
});

describe('a pack names only files inside its own folder', () => {
  test.each([
    ['absolute path outside', () => path.join(outside, 'secret.csv'), () => path.join(outside, 'secret.csv')],
    ['.. leading outside', () => '../../elsewhere/secret.csv', () => path.join(outside, 'secret.csv')],
    ['symbolic link inside pointing outside', () => 'linked.csv', () => path.join(outside, 'secret.csv')],
    ['symbolic link to a system file', () => 'hostname.csv', () => '/etc/hostname'],
  ])('sources[].file: %s → exit 2 at the key, nothing read', async (_, file, real) => {
    const packFile = await writePack('', file());
    for (const command of [['check', packFile], ['build', packFile, '--out', path.join(root, 'out'), '--jobs', '1']]) {
      const run = await runCli(command);
      expect(run.code, run.stderr).toBe(2);
      // The control pack names its file on line 9 (key at column 5).
      expect(run.stderr).toContain(`pack.yaml:9:5: ${outsideText('sources[0].file', real())}`);
      expect(run.stderr).not.toContain(SECRET);
      expect(run.stderr).not.toMatch(/date column|header/);
    }
    expect(await readdir(path.join(root, 'out')).catch(() => [])).toEqual([]);
  });

  test('/etc/hostname content never appears in the problems', async () => {
    const host = (await readFile('/etc/hostname', 'utf8').catch(() => '')).trim();
    const packFile = await writePack('', '/etc/hostname');
    const run = await runCli(['check', packFile]);
    expect(run.code).toBe(2);
    expect(run.stderr).toContain(outsideText('sources[0].file', '/etc/hostname'));
    if (host.length >= 4) expect(run.stderr.replace(/\/etc\/hostname/g, '')).not.toContain(host);
  });

  test('a missing file outside is reported as outside, not as missing (no probing)', async () => {
    const packFile = await writePack('', '../../elsewhere/none.csv');
    expect(await problemsOf(packFile)).toEqual([
      `9:5: ${outsideText('sources[0].file', path.join(outside, 'none.csv'))}`,
    ]);
  });

  test('allowDirs lets a folder through, symbolic links included', async () => {
    for (const file of ['../../elsewhere/data.csv', path.join(outside, 'data.csv')]) {
      const packFile = await writePack('', file);
      expect(await problemsOf(packFile, [outside])).toEqual([]);
      expect((await loadPlan(packFile, {allowDirs: [outside]})).sources[0].file).toBe(path.join(outside, 'data.csv'));
    }
    await symlink(path.join(outside, 'data.csv'), path.join(packDir, 'linked-ok.csv'));
    expect(await problemsOf(await writePack('', 'linked-ok.csv'), [outside])).toEqual([]);
    // Allowing one folder does not allow its parent's other folders.
    expect(await problemsOf(await writePack('', 'hostname.csv'), [outside])).toHaveLength(1);
  });

  test('files in a sub-folder of the pack folder are inside', async () => {
    await mkdir(path.join(packDir, 'data'), {recursive: true});
    await writeFile(path.join(packDir, 'data', 'main.csv'), await readFile(path.join(packDir, 'data.csv')));
    expect(await problemsOf(await writePack('', 'data/main.csv'))).toEqual([]);
  });

  test('branding.logo and branding.templates outside the pack folder; allowDirs lets them through', async () => {
    const templates = JSON.stringify(path.join(outside, 'templates'));
    const packFile = await writePack(`branding:\n  logo: ../../elsewhere/logo.svg\n  templates: ${templates}\n`);
    expect(await problemsOf(packFile)).toEqual([
      `8:3: ${outsideText('branding.logo', path.join(outside, 'logo.svg'))}`,
      `9:3: ${outsideText('branding.templates', path.join(outside, 'templates'))}`,
    ]);
    const run = await runCli(['check', packFile]);
    expect(run.code).toBe(2);
    expect(run.stderr).not.toContain(SECRET);
    const plan = await loadPlan(packFile, {allowDirs: [outside]});
    expect(plan.branding.logo).toBe(path.join(outside, 'logo.svg'));
    expect(plan.branding.templates).toBe(path.join(outside, 'templates'));
  });

  test('a file in the pack template folder that links outside is a problem', async () => {
    const mine = path.join(packDir, 'tpl-link');
    await mkdir(mine, {recursive: true});
    await symlink(path.join(outside, 'templates', 'styles.css'), path.join(mine, 'styles.css'));
    const packFile = await writePack('branding:\n  templates: tpl-link\n');
    expect(await problemsOf(packFile)).toEqual([
      `styles.css:null: ${outsideText('a file in branding.templates', path.join(outside, 'templates', 'styles.css'))}`,
    ]);
    const out = path.join(root, 'out-tpl');
    const run = await runCli(['build', packFile, '--out', out, '--formats', 'html', '--jobs', '1']);
    expect(run.code, run.stderr).toBe(2);
    expect(run.stderr).not.toContain(SECRET);
    expect(await readdir(out).catch(() => [])).toEqual([]);
  });
});

describe('pack.browser', () => {
  async function withBrowser(browser: string): Promise<string[]> {
    const packFile = await writePack('');
    const text = await readFile(packFile, 'utf8');
    await writeFile(packFile, text.replace('  frequency:', `  browser: ${JSON.stringify(browser)}\n  frequency:`));
    return problemsOf(packFile);
  }

  test('a file name that is not a Chromium-family browser is refused, even if it exists', async () => {
    await writeFile(path.join(packDir, 'helper.sh'), '#!/bin/sh\n');
    await chmod(path.join(packDir, 'helper.sh'), 0o755);
    for (const name of ['./helper.sh', '/bin/sh', 'firefox', '../../elsewhere/not-a-browser']) {
      const problems = await withBrowser(name);
      expect(problems).toHaveLength(1);
      expect(problems[0]).toMatch(/^4:3: pack\.browser .* does not look like a Chromium browser; set EBBFLOW_CHROMIUM/);
    }
  });

  test('a Chromium-family name must exist and be executable', async () => {
    await writeFile(path.join(packDir, 'chromium'), '#!/bin/sh\n');
    expect(await withBrowser('./chromium')).toEqual([
      '4:3: pack.browser ./chromium is not an executable file; install it or set the EBBFLOW_CHROMIUM environment ' +
        'variable',
    ]);
    expect(await withBrowser('./google-chrome-stable')).toHaveLength(1);
    await chmod(path.join(packDir, 'chromium'), 0o755);
    expect(await withBrowser('./chromium')).toEqual([]);
  });
});

describe('logo content', () => {
  test('a logo named .svg that is not an image is bad input for check and build: exit 2 at the pack line', async () => {
    await writeFile(path.join(packDir, 'fake.svg'), 'not an image\n');
    const packFile = await writePack('branding:\n  logo: fake.svg\n');
    const check = await runCli(['check', packFile]);
    expect(check.code, check.stderr).toBe(2);
    expect(check.stderr).toContain('pack.yaml:8:3: branding.logo fake.svg is not an SVG image');
    const out = path.join(root, 'out-logo');
    const run = await runCli(['build', packFile, '--out', out, '--formats', 'html', '--jobs', '1']);
    expect(run.stderr).not.toMatch(/^\s+at /m);
    expect(run.stderr).toContain('pack.yaml:8:3: branding.logo fake.svg is not an SVG image');
    expect(run.code, run.stderr).toBe(2);
    expect(await readdir(out).catch(() => [])).toEqual([]);
  });

  test('PNG and JPEG names are checked by their first bytes', async () => {
    await writeFile(path.join(packDir, 'fake.png'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
    await writeFile(path.join(packDir, 'real.jpg'), Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 0x10]));
    expect(await problemsOf(await writePack('branding:\n  logo: fake.png\n'))).toEqual([
      '8:3: branding.logo fake.png is not a PNG image (its content does not match the file name)',
    ]);
    expect(await problemsOf(await writePack('branding:\n  logo: real.jpg\n'))).toEqual([]);
  });
});
