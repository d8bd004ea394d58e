/**
 * ebbflow as an installed package: `npm pack` (as run after the `prepare` build, which installing from a git URL
 * also runs) holds the compiled code with its type declarations, the templates and the starter pack, and nothing
 * of the tests or benchmarks. The packed files, unpacked into a fresh node_modules/ebbflow beside the project's
 * own dependencies (linked, so nothing is downloaded), give a working `ebbflow` command and a typed library.
 * Needs the compiled dist/ (`npm test` builds it first).
 */
import {execFileSync, spawnSync} from 'node:child_process';
import {chmod, mkdir, mkdtemp, readdir, readFile, rm, symlink, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));
const manifest = JSON.parse(await readFile(path.join(root, 'package.json'), 'utf8'));
let work: string;
let packed: string[];
let installed: string;

beforeAll(async () => {
  work = await mkdtemp(path.join(tmpdir(), 'ebbflow-package-'));
  const out = execFileSync('npm', ['pack', '--json', '--ignore-scripts', '--pack-destination', work], {
    cwd: root,
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'ignore'],
  });
  const [info] = JSON.parse(out) as {filename: string; files: {path: string}[]}[];
  packed = info.files.map((f) => f.path).sort();
  // Unpack as npm would install it, with the project's dependencies beside it.
  const modules = path.join(work, 'app', 'node_modules');
  installed = path.join(modules, 'ebbflow');
  await mkdir(installed, {recursive: true});
  execFileSync('tar', ['-xzf', path.join(work, info.filename), '-C', installed, '--strip-components=1']);
  for (const name of await readdir(path.join(root, 'node_modules'))) {
    if (name === 'ebbflow' || name.startsWith('.')) continue;
    await symlink(path.join(root, 'node_modules', name), path.join(modules, name));
  }
  // As npm does when it installs a package: the bin's target made executable and linked from node_modules/.bin.
  await chmod(path.join(installed, manifest.bin.ebbflow), 0o755);
  await mkdir(path.join(modules, '.bin'));
  await symlink(path.join('..', 'ebbflow', manifest.bin.ebbflow), path.join(modules, '.bin', 'ebbflow'));
}, 120_000);

afterAll(() => rm(work, {recursive: true, force: true}));

describe('the packed package', () => {
  it('builds in prepare, so an install from a git URL compiles it', () => {
    expect(manifest.scripts.prepare).toBe('npm run build');
  });

  it('holds the compiled code, declarations, templates and starter pack, and no tests or benchmarks', () => {
    for (const f of [
      'package.json',
      'README.md',
      'dist/src/cli/main.js',
      'dist/src/index.js',
      'dist/src/index.d.ts',
      'dist/src/analyse/workerEntry.cjs',
      'templates/report.hbs',
      'sample-config/monthly-pack.yaml',
      'sample-config/pack.schema.json',
    ]) {
      expect(packed).toContain(f);
    }
    expect(packed.filter((f) => /^(test|src|scripts)\/|^dist\/test\//.test(f))).toEqual([]);
    expect(manifest.types).toBe('dist/src/index.d.ts');
    expect(manifest.exports['.'].types).toBe('./dist/src/index.d.ts');
  });

  it('gives a working ebbflow command: init a starter pack and build it', async () => {
    const bin = path.join(work, 'app', 'node_modules', '.bin', 'ebbflow');
    const env = {...process.env, TZ: 'UTC'};
    const version = spawnSync(bin, ['--version'], {encoding: 'utf8', env});
    expect(version.stdout.trim()).toBe(manifest.version);
    const starter = path.join(work, 'starter');
    expect(spawnSync(bin, ['init', starter], {encoding: 'utf8', env}).status).toBe(0);
    const out = path.join(work, 'out');
    const args = ['build', path.join(starter, 'monthly-pack.yaml'), '--formats', 'json', '--jobs', '1', '--out', out];
    const built = spawnSync(bin, [...args, '--json'], {encoding: 'utf8', env});
    expect(built.status, built.stderr).toBe(0);
    expect(JSON.parse(built.stdout).built[0].files.map((f: {path: string}) => f.path)).toEqual([
      'digest.json',
      'headlines.json',
      'manifest.json',
      'results.json',
    ]);
  }, 120_000);

  it('is a typed library: a TypeScript program importing it type-checks against the declarations', async () => {
    const app = path.join(work, 'app');
    await writeFile(
      path.join(app, 'use.ts'),
      "import {loadPlan, toolVersion, type Plan} from 'ebbflow';\n" +
        'const plan: Promise<Plan> = loadPlan(process.argv[2]);\n' +
        'plan.then((p) => console.log(toolVersion, p.id, p.series.length));\n',
    );
    await writeFile(path.join(app, 'package.json'), '{"name": "app", "private": true, "type": "module"}\n');
    const tsc = path.join(root, 'node_modules', 'typescript', 'bin', 'tsc');
    const options = ['--noEmit', '--strict', '--module', 'nodenext', '--moduleResolution', 'nodenext'];
    const checked = spawnSync(process.execPath, [tsc, ...options, '--types', 'node', '--skipLibCheck', 'use.ts'], {
      cwd: app,
      encoding: 'utf8',
    });
    expect(checked.status, checked.stdout).toBe(0);
    const bad = "import {loadPlan} from 'ebbflow';\nconst n: number = loadPlan('x');\n";
    await writeFile(path.join(app, 'bad.ts'), bad);
    const rejected = spawnSync(process.execPath, [tsc, ...options, '--types', 'node', '--skipLibCheck', 'bad.ts'], {
      cwd: app,
      encoding: 'utf8',
    });
    expect(rejected.stdout).toMatch(/bad\.ts.*error TS2322/);
  }, 120_000);
});
