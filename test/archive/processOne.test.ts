/**
 * Crash safety where every run has the same process id: the command line runs as process 1 of its own pid
 * namespace (`unshare --pid --fork --mount-proc`, as in a container), rebuilding an archived period with --force,
 * and is killed with SIGKILL before each change it makes to the archive (numbered by the fs-steps.mjs preload:
 * every mkdir, open for writing, rename and rm under the output folder). After each kill the period folder must be
 * absent, the old complete folder or the new complete one, and a second rebuild, again as process 1, must succeed
 * and leave only the new folder and the index. Needs root (or user namespaces); skipped where unshare fails.
 */
import {describe, expect, it} from 'vitest';
import {spawn, spawnSync} from 'node:child_process';
import {createHash} from 'node:crypto';
import {cp, mkdtemp, readdir, readFile, rm, stat} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {fileURLToPath} from 'node:url';
import {listFiles} from './helpers.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const cli = join(root, 'dist', 'src', 'cli', 'main.js');
const preload = join(root, 'test', 'archive', 'fixtures', 'fs-steps.mjs');
const fixture = join(root, 'test', 'fixtures', 'config', 'minimal');
const UNSHARE = ['--pid', '--fork', '--mount-proc', '--kill-child'];
const canUnshare = spawnSync('unshare', [...UNSHARE, 'true']).status === 0;

interface Run {
  code: number | null;
  stderr: string;
  steps: string[];
  paused: {step: number; pid: number} | null;
}

/** Build the pack as process 1 (old: json only; new: json and csv), killed when it pauses at `pauseAt`. */
function buildAsProcessOne(work: string, version: 'old' | 'new', pauseAt = 0): Promise<Run> {
  const formats = version === 'old' ? 'json' : 'json,csv';
  const args = [
    ...UNSHARE,
    process.execPath,
    '--import',
    preload,
    cli,
    'build',
    join(work, 'pack', 'quarterly-minimal.yaml'),
  ];
  args.push('--out', join(work, 'out'), '--formats', formats, '--jobs', '1', '--force');
  const env = {...process.env, TZ: 'UTC', FS_STEPS_UNDER: join(work, 'out'), FS_STEPS_PAUSE_AT: String(pauseAt)};
  return new Promise((resolve, reject) => {
    const proc = spawn('unshare', args, {env, stdio: ['ignore', 'ignore', 'pipe']});
    let stderr = '';
    let paused: Run['paused'] = null;
    proc.stderr.on('data', (d: Buffer) => {
      stderr += d.toString();
      const m = /fs-paused (\d+) pid (\d+)/.exec(stderr);
      if (m && paused === null) {
        paused = {step: Number(m[1]), pid: Number(m[2])};
        proc.kill('SIGKILL'); // unshare's --kill-child passes it to process 1, which takes the namespace down
      }
    });
    proc.on('error', reject);
    proc.on('exit', (code) => {
      const steps = [...stderr.matchAll(/^fs-step \d+ (.*)$/gm)].map((m) => m[1]);
      resolve({code, stderr, steps, paused});
    });
  });
}

/**
 * `absent`, or which version a complete period folder is: every file the manifest lists is there with its hash and
 * nothing else is (old has no exports/). Throws on a mixed or half-written folder.
 */
async function periodState(folder: string): Promise<'absent' | 'old' | 'new'> {
  if (!(await stat(folder).catch(() => null))) return 'absent';
  const manifest = JSON.parse(await readFile(join(folder, 'manifest.json'), 'utf8'));
  const listed = (manifest.outputs as {path: string; sha256: string}[]).map((o) => o.path);
  const present = (await listFiles(folder)).filter((f) => f !== 'manifest.json');
  expect(present).toEqual(listed);
  for (const o of manifest.outputs as {path: string; sha256: string}[]) {
    expect(
      createHash('sha256')
        .update(await readFile(join(folder, o.path)))
        .digest('hex'),
    ).toBe(o.sha256);
  }
  const version = present.some((f) => f.startsWith('exports/')) ? 'new' : 'old';
  expect(manifest.plan.formats).toEqual(version === 'old' ? ['json'] : ['json', 'csv']);
  return version;
}

/** Run `task` over `items`, at most `limit` at once. */
async function pool<T, R>(items: T[], limit: number, task: (item: T) => Promise<R>): Promise<R[]> {
  const out: R[] = new Array(items.length);
  let next = 0;
  const worker = async () => {
    while (next < items.length) {
      const i = next++;
      out[i] = await task(items[i]);
    }
  };
  await Promise.all(Array.from({length: Math.min(limit, items.length)}, worker));
  return out;
}

describe.skipIf(!canUnshare)('archive crash safety with the command line as process 1', () => {
  it('killed before each change of a forced rebuild: old or new, never mixed; the next rebuild succeeds', async () => {
    const base = await mkdtemp(join(tmpdir(), 'ebbflow-pid1-'));
    try {
      const template = join(base, 'template');
      await cp(fixture, join(template, 'pack'), {recursive: true});
      const first = await buildAsProcessOne(template, 'old');
      expect(first.code, first.stderr).toBe(0);
      const packDir = (w: string) => join(w, 'out', 'quarterly-minimal');
      const folder = (w: string) => join(packDir(w), '2025-Q1');
      expect(await periodState(folder(template))).toBe('old');

      // A full rebuild, to number its steps: the swap is among them.
      const traced = join(base, 'traced');
      await cp(template, traced, {recursive: true});
      const trace = await buildAsProcessOne(traced, 'new');
      expect(trace.code, trace.stderr).toBe(0);
      expect(
        trace.steps.some((s) => /^rename quarterly-minimal\/2025-Q1 quarterly-minimal\/\.2025-Q1\.old-/.test(s)),
      ).toBe(true);
      expect(trace.steps.some((s) => /^open quarterly-minimal\/\.lock$/.test(s))).toBe(true);
      const steps = trace.steps.map((_, i) => i + 1);

      const outcomes = await pool(steps, 10, async (k) => {
        const work = join(base, `kill-${k}`);
        await cp(template, work, {recursive: true});
        const killed = await buildAsProcessOne(work, 'new', k);
        expect(killed.paused, `step ${k}: ${killed.stderr}`).toEqual({step: k, pid: 1});
        const afterKill = await periodState(folder(work));
        const lockLeft = (await readdir(packDir(work))).includes('.lock');
        if (lockLeft) expect(JSON.parse(await readFile(join(packDir(work), '.lock'), 'utf8')).pid).toBe(1);
        const rebuilt = await buildAsProcessOne(work, 'new');
        expect(rebuilt.code, `rebuild after step ${k}: ${rebuilt.stderr}`).toBe(0);
        expect(await periodState(folder(work))).toBe('new');
        expect(await readdir(packDir(work))).toEqual(['2025-Q1', 'index.html']);
        expect(await readFile(join(packDir(work), 'index.html'), 'utf8')).toContain('2025-Q1/results.json');
        return {step: trace.steps[k - 1], afterKill, lockLeft};
      });
      // The swap itself: killed between the renames the folder is absent until the next run restores it.
      const between = outcomes.find((o) => /^rename quarterly-minimal\/\.2025-Q1\.tmp-/.test(o.step));
      expect(between?.afterKill).toBe('absent');
      expect(outcomes.filter((o) => o.afterKill === 'new').length).toBeGreaterThan(0);
      expect(outcomes.filter((o) => o.lockLeft).length).toBeGreaterThan(0);
    } finally {
      await rm(base, {recursive: true, force: true});
    }
  }, 240_000);
});
