/**
 * Crash safety: a real child process archives a large report and is killed with SIGKILL at chosen
 * steps (it pauses there) or after a delay (anywhere, usually while writing files). Whatever the
 * moment, the period folder must be absent or the old complete folder or the new complete folder,
 * never a mix, and the next run must clean up what the dead one left.
 */
import {describe, expect, it} from 'vitest';
import {spawn} from 'node:child_process';
import {readdir} from 'node:fs/promises';
import {join} from 'node:path';
import {fileURLToPath} from 'node:url';
import {archive} from '../../src/archive/archive.js';
import {recoverPackDir} from '../../src/archive/recover.js';
import {bigArchiveArgs} from './fixtures/big.js';
import {folderState, tempDir} from './helpers.js';

const here = fileURLToPath(new URL('.', import.meta.url));
const register = join(here, 'fixtures', 'ts-register.mjs');
const child = join(here, 'fixtures', 'crash-child.ts');

/** Run the child; kill it when it pauses at `step`, or `delayMs` after it is ready. Returns how it ended. */
function runAndKill(outDir: string, force: boolean, kill: {step: string} | {delayMs: number}): Promise<string> {
  return new Promise((resolve, reject) => {
    const step = 'step' in kill ? kill.step : 'none';
    const argv = ['--import', register, child, outDir, 'new', force ? 'force' : 'no-force', step];
    const proc = spawn(process.execPath, argv, {stdio: ['ignore', 'pipe', 'pipe']});
    let stdout = '';
    let stderr = '';
    proc.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    proc.stdout.on('data', (d: Buffer) => {
      stdout += d.toString();
      if ('step' in kill && stdout.includes(`paused ${kill.step}`)) proc.kill('SIGKILL');
      if ('delayMs' in kill && stdout.startsWith('ready') && !proc.killed) {
        setTimeout(() => proc.kill('SIGKILL'), kill.delayMs);
      }
    });
    proc.on('error', reject);
    proc.on('exit', (code, signal) => {
      if (code !== null && code !== 0) reject(new Error(`child failed (${code}): ${stderr}`));
      else resolve(stdout.includes('done') ? 'done' : `killed ${signal}`);
    });
  });
}

const packDirOf = (out: string) => join(out, 'harbourline-monthly');
const folderOf = (out: string) => join(packDirOf(out), '2026-10');

async function withOld(): Promise<string> {
  const out = await tempDir();
  await archive(bigArchiveArgs(out, 'old', false));
  expect(await folderState(folderOf(out))).toBe('old');
  return out;
}

/** After recovery only the period folder and index.html may remain. */
async function recoverAndCheck(out: string): Promise<'absent' | 'old' | 'new'> {
  await recoverPackDir(packDirOf(out));
  const names = (await readdir(packDirOf(out))).filter((n) => n.startsWith('.') && n !== '.lock');
  expect(names).toEqual([]);
  return folderState(folderOf(out));
}

describe('archive crash safety (SIGKILL)', () => {
  it('killed after writing the temporary folder, first build: no period folder; the next run cleans up', async () => {
    const out = await tempDir();
    expect(await runAndKill(out, false, {step: 'temp-written'})).toBe('killed SIGKILL');
    expect(await folderState(folderOf(out))).toBe('absent');
    expect((await readdir(packDirOf(out))).some((n) => /^\.2026-10\.tmp-[0-9a-f]{16}$/.test(n))).toBe(true);
    await archive(bigArchiveArgs(out, 'new', false));
    expect(await readdir(packDirOf(out))).toEqual(['2026-10', 'index.html']);
    expect(await folderState(folderOf(out))).toBe('new');
  });

  it('killed before the old folder is moved aside: the old folder stays', async () => {
    const out = await withOld();
    await runAndKill(out, true, {step: 'temp-written'});
    expect(await folderState(folderOf(out))).toBe('old');
    expect(await recoverAndCheck(out)).toBe('old');
  });

  it('killed between the two renames: the next run restores the old folder', async () => {
    const out = await withOld();
    await runAndKill(out, true, {step: 'old-moved'});
    expect(await folderState(folderOf(out))).toBe('absent');
    expect(await recoverAndCheck(out)).toBe('old');
  });

  it('killed after the new folder is in place: the new folder stays and the old one is deleted', async () => {
    const out = await withOld();
    await runAndKill(out, true, {step: 'new-in-place'});
    expect(await folderState(folderOf(out))).toBe('new');
    expect(await recoverAndCheck(out)).toBe('new');
  });

  it.each([0, 150, 400, 800])('killed %i ms into a forced rebuild: old or new, never mixed', async (delayMs) => {
    const out = await withOld();
    await runAndKill(out, true, {delayMs});
    expect(['old', 'new', 'absent']).toContain(await folderState(folderOf(out)));
    expect(['old', 'new']).toContain(await recoverAndCheck(out));
    await archive(bigArchiveArgs(out, 'new', true));
    expect(await recoverAndCheck(out)).toBe('new');
  });
});
