import {describe, expect, it} from 'vitest';
import {readdir, readFile, utimes, writeFile} from 'node:fs/promises';
import {join} from 'node:path';
import {exactlyDead, lockPackDir, LOCK_FILE, self, STALE_MS, type Holder} from '../../src/archive/lock.js';
import {tempDir} from './helpers.js';

/** A holder in another pid namespace (another container): this process cannot see whether it lives. */
const foreign = (): Holder => ({...self(), pidns: 'pid:[1]', pid: 1, token: 'f00d'});

const settledWithin = (p: Promise<unknown>, ms: number) =>
  Promise.race([p.then(() => true), new Promise((r) => setTimeout(() => r(false), ms))]);

describe('pack folder lock', () => {
  it('writes who holds it and deletes it on release', async () => {
    const dir = await tempDir();
    const lock = await lockPackDir(dir);
    const holder = JSON.parse(await readFile(join(dir, LOCK_FILE), 'utf8')) as Holder;
    expect(holder.pid).toBe(process.pid);
    expect(holder.start).toMatch(/^\d+$/);
    lock.assertHeld();
    await lock.release();
    expect(await readdir(dir)).toEqual([]);
  });

  it('a dead holder seen in the same pid namespace is taken over at once, even with a reused process id', async () => {
    const me = self();
    // Same id as this process but another start time: the id was reused, as process 1 is in every container.
    expect(exactlyDead({...me, start: '1'}, me)).toBe(true);
    expect(exactlyDead(me, me)).toBe(false);
    expect(exactlyDead({...me, pidns: 'pid:[1]'}, me)).toBeNull();
    const dir = await tempDir();
    await writeFile(join(dir, LOCK_FILE), JSON.stringify({...me, start: '1'}));
    const lock = await lockPackDir(dir);
    expect(JSON.parse(await readFile(join(dir, LOCK_FILE), 'utf8')).start).toBe(me.start);
    await lock.release();
  });

  it('a holder in another pid namespace counts as alive until its lock file is older than the stale time', async () => {
    const dir = await tempDir();
    const path = join(dir, LOCK_FILE);
    await writeFile(path, JSON.stringify(foreign()));
    const infos: string[] = [];
    const waiting = lockPackDir(dir, {info: (m) => infos.push(m), warn: () => undefined});
    expect(await settledWithin(waiting, 600)).toBe(false);
    expect(infos).toEqual([
      `waiting for process 1 on ${foreign().host}, which is writing this pack's archive (lock ${path})`,
    ]);
    const old = new Date(Date.now() - STALE_MS - 1000);
    await utimes(path, old, old);
    expect(await settledWithin(waiting, 2000)).toBe(true);
    await (await waiting).release();
    expect(await readdir(dir)).toEqual([]);
  });

  it('an unreadable lock file (a crash between creating and writing it) is judged by its age', async () => {
    const dir = await tempDir();
    const path = join(dir, LOCK_FILE);
    await writeFile(path, '');
    const old = new Date(Date.now() - STALE_MS - 1000);
    await utimes(path, old, old);
    await (await lockPackDir(dir)).release();
  });
});
