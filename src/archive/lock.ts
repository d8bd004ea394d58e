import {randomBytes} from 'node:crypto';
import {readFileSync, readlinkSync} from 'node:fs';
import {link, open, readFile, rename, rm, stat, utimes} from 'node:fs/promises';
import {hostname} from 'node:os';
import {join} from 'node:path';
import type {Logger} from '../log.js';
import {lockLost, lockTimeout, lockWaiting} from './messages.js';

/** Name of the lock file inside a pack's archive folder. */
export const LOCK_FILE = '.lock';

/** A lock whose file has not been touched for this long belongs to a dead (or hung) run. */
export const STALE_MS = 10_000;
/** How often the holder touches its lock file. */
const REFRESH_MS = 2_000;
/** How long a run waits for a live holder before it gives up. */
const WAIT_MS = 300_000;
const POLL_MS = 200;

/** Who holds a lock: written into the lock file as JSON. */
export interface Holder {
  host: string;
  /** The kernel's boot id (Linux), or null. Equal boot ids mean one running kernel. */
  boot: string | null;
  /** The process-id namespace (`pid:[4026531836]`, Linux), or null. Process ids mean something only inside one. */
  pidns: string | null;
  pid: number;
  /** The process's start time in clock ticks since boot (Linux), or null: with the pid it tells a reused id. */
  start: string | null;
  /** Random, so two holders never write the same text. */
  token: string;
}

/** A held pack lock. */
export interface PackLock {
  /** Throw when the lock was lost (this run stalled past {@link STALE_MS} and another run took the folder over). */
  assertHeld(): void;
  /** Stop touching the lock file and delete it. */
  release(): Promise<void>;
}

/**
 * Take the lock of one pack's archive folder (`<packDir>/.lock`), waiting while another run holds it. Held while
 * a run recovers leftovers, writes its period folder, swaps it into place and rewrites the index, so two runs never
 * do that at once and every leftover found under the lock belongs to a dead run.
 *
 * The lock file is created exclusively (`O_EXCL`) and holds the {@link Holder} as JSON; the holder touches it every
 * two seconds. A holder is dead when either
 *
 * - it ran on this kernel in this process-id namespace (same boot id and namespace) and no process with its id and
 *   start time exists now (so a reused id, such as process 1 in every container, is not taken for the holder), or
 * - its lock file has not been touched for {@link STALE_MS} (a holder on another machine or in another container,
 *   whose processes this one cannot see; common practice of mtime-based lock files).
 *
 * A dead holder's lock is taken over by renaming it aside (only one waiter can) and checking that the renamed file
 * is the one judged dead. A wait for a live holder is logged once and gives up after five minutes, naming the holder.
 *
 * @throws Error when the wait times out (exit 1: an environment problem, the message names the lock file).
 */
export async function lockPackDir(packDir: string, log?: Logger): Promise<PackLock> {
  const path = join(packDir, LOCK_FILE);
  const me = self();
  const text = `${JSON.stringify(me)}\n`;
  const deadline = Date.now() + WAIT_MS;
  let logged = false;
  for (;;) {
    if (await create(path, text)) break;
    const state = await holderState(path, me);
    if (state.kind === 'gone') continue;
    if (state.kind === 'dead') {
      await takeOver(path, state.text, me.token);
      continue;
    }
    if (Date.now() > deadline) throw new Error(lockTimeout(path, describe(state.holder)));
    if (!logged) log?.info(lockWaiting(path, describe(state.holder)));
    logged = true;
    await new Promise((resolve) => setTimeout(resolve, POLL_MS));
  }
  const ino = (await stat(path)).ino;
  let lost = false;
  let busy = false;
  const timer = setInterval(() => {
    if (busy || lost) return;
    busy = true;
    void touch(path, ino)
      .then((ok) => (lost = !ok))
      .finally(() => (busy = false));
  }, REFRESH_MS);
  timer.unref();
  return {
    assertHeld() {
      if (lost) throw new Error(lockLost(path));
    },
    async release() {
      clearInterval(timer);
      const now = await stat(path).catch(() => null);
      if (!lost && now?.ino === ino) await rm(path, {force: true});
    },
  };
}

/** Create the lock file exclusively with `text`; false when it exists. */
async function create(path: string, text: string): Promise<boolean> {
  let handle;
  try {
    handle = await open(path, 'wx');
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'EEXIST') return false;
    throw e;
  }
  try {
    await handle.writeFile(text);
    await handle.sync();
  } finally {
    await handle.close();
  }
  return true;
}

type State = {kind: 'gone'} | {kind: 'dead'; text: string} | {kind: 'alive'; holder: Holder | null};

async function holderState(path: string, me: Holder): Promise<State> {
  let text: string;
  let touched: number;
  try {
    text = await readFile(path, 'utf8');
    touched = (await stat(path)).mtimeMs;
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return {kind: 'gone'};
    throw e;
  }
  const holder = parseHolder(text);
  const exact = holder === null ? null : exactlyDead(holder, me);
  const dead = exact ?? Date.now() - touched > STALE_MS;
  return dead ? {kind: 'dead', text} : {kind: 'alive', holder};
}

/**
 * True or false when this process can see the holder's process table (same kernel, same pid namespace, start
 * times known); null when it cannot tell.
 */
export function exactlyDead(holder: Holder, me: Holder): boolean | null {
  if (holder.boot === null || holder.boot !== me.boot) return null;
  if (holder.pidns === null || holder.pidns !== me.pidns || holder.start === null) return null;
  return startTime(holder.pid) !== holder.start;
}

/**
 * Move a dead holder's lock file aside and delete it. If the file moved is not the one judged dead (a new holder
 * took the lock in between), it is linked back, which fails harmlessly when yet another run holds the name now.
 */
async function takeOver(path: string, judged: string, token: string): Promise<void> {
  const aside = `${path}.stale-${token}`;
  try {
    await rename(path, aside);
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return;
    throw e;
  }
  try {
    if ((await readFile(aside, 'utf8')) !== judged) await link(aside, path).catch(() => undefined);
  } finally {
    await rm(aside, {force: true});
  }
}

/** Touch the lock file if it is still ours (same inode); false when it was taken over or deleted. */
async function touch(path: string, ino: number): Promise<boolean> {
  try {
    if ((await stat(path)).ino !== ino) return false;
    const now = new Date();
    await utimes(path, now, now);
    return true;
  } catch {
    return false;
  }
}

function parseHolder(text: string): Holder | null {
  try {
    const h = JSON.parse(text) as Holder;
    return typeof h.pid === 'number' && typeof h.host === 'string' ? h : null;
  } catch {
    return null; // created but not yet written, or cut short by a crash: judged by its age
  }
}

function describe(h: Holder | null): string {
  return h === null ? 'an unknown run' : `process ${h.pid} on ${h.host}`;
}

/** This process as a lock holder. */
export function self(): Holder {
  return {
    host: hostname(),
    boot: readOrNull(() => readFileSync('/proc/sys/kernel/random/boot_id', 'utf8').trim()),
    pidns: readOrNull(() => readlinkSync('/proc/self/ns/pid')),
    pid: process.pid,
    start: startTime('self'),
    token: randomBytes(8).toString('hex'),
  };
}

/** Field 22 of `/proc/<pid>/stat` (start time in clock ticks after boot), or null when there is no such process. */
function startTime(pid: number | 'self'): string | null {
  return readOrNull(() => {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    // The command name (field 2) may hold spaces and parentheses: count fields after its closing one.
    return stat.slice(stat.lastIndexOf(')') + 2).split(' ')[19] ?? null;
  });
}

function readOrNull(read: () => string | null): string | null {
  try {
    return read();
  } catch {
    return null;
  }
}
