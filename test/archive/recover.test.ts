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

  it('leaves entries of live processes (this one included) and unrelated names alone', async () => {
    const dir = await tempDir();
    const names = [`.2026-10.tmp-${process.pid}`, `.2026-11.old-${process.ppid}`, '.hidden', 'notes.txt'];
    for (const name of names) await writeFile(join(dir, name), '');
    expect(await recoverPackDir(dir)).toEqual({restored: [], removed: []});
    expect((await readdir(dir)).sort()).toEqual([...names].sort());
  });

  it('does nothing for a pack that has no folder yet', async () => {
    expect(await recoverPackDir(join(await tempDir(), 'none'))).toEqual({restored: [], removed: []});
  });
});
