import {describe, expect, it} from 'vitest';
import {mkdir, readdir, readFile, writeFile} from 'node:fs/promises';
import {join} from 'node:path';
import {recoverPackDir} from '../../src/archive/recover.js';
import {deadPid, tempDir} from './helpers.js';

describe('recoverPackDir', () => {
  it('restores a moved-aside folder whose period is missing, deletes superseded and temporary ones', async () => {
    const dir = await tempDir();
    const pid = deadPid();
    for (const name of [`.2026-08.old-${pid}`, `.2026-09.old-${pid}`, '2026-09', `.2026-10.tmp-${pid}`]) {
      await mkdir(join(dir, name));
      await writeFile(join(dir, name, 'results.json'), name);
    }
    await writeFile(join(dir, `.index.html.tmp-${pid}-2`), '');
    expect(await recoverPackDir(dir)).toEqual({
      restored: [`.2026-08.old-${pid}`],
      removed: [`.2026-09.old-${pid}`, `.2026-10.tmp-${pid}`, `.index.html.tmp-${pid}-2`],
    });
    expect((await readdir(dir)).sort()).toEqual(['2026-08', '2026-09']);
    expect(await readFile(join(dir, '2026-08', 'results.json'), 'utf8')).toBe(`.2026-08.old-${pid}`);
    expect(await readFile(join(dir, '2026-09', 'results.json'), 'utf8')).toBe('2026-09');
  });

  it('treats every leftover as dead, whoever made it (it runs under the pack lock), and leaves other names alone', async () => {
    const dir = await tempDir();
    // Process 1's leftover, as a run in a container leaves it, and this process's own: both belong to dead runs.
    for (const name of ['.2026-10.tmp-1', '.2026-11.old-9f3a0c12d4e5b6a7', `.2026-12.tmp-${process.pid}`]) {
      await mkdir(join(dir, name));
    }
    for (const name of ['.hidden', '.lock', 'notes.txt']) await writeFile(join(dir, name), '');
    expect(await recoverPackDir(dir)).toEqual({
      restored: ['.2026-11.old-9f3a0c12d4e5b6a7'],
      removed: ['.2026-10.tmp-1', `.2026-12.tmp-${process.pid}`],
    });
    expect((await readdir(dir)).sort()).toEqual(['.hidden', '.lock', '2026-11', 'notes.txt']);
  });

  it('does nothing for a pack that has no folder yet', async () => {
    expect(await recoverPackDir(join(await tempDir(), 'none'))).toEqual({restored: [], removed: []});
  });
});
