import {readdir, rename, rm} from 'node:fs/promises';
import {join} from 'node:path';
import {exists} from './exists.js';

/** `.<name>.tmp-<pid>` or `.<name>.old-<pid>`, optionally followed by `-<n>` (several index writes in one process). */
const LEFTOVER = /^\.(.+)\.(tmp|old)-(\d+)(?:-\d+)?$/;

/** What {@link recoverPackDir} did, by entry name. */
export interface Recovery {
  /** `.<period>.old-<pid>` folders renamed back to `<period>` because a replacement stopped half-way. */
  restored: string[];
  /** Stale temporary folders and superseded old folders deleted. */
  removed: string[];
}

/**
 * Put a pack's archive folder back in order after a run that died part-way (crash, SIGKILL, power cut
 * of the process). A period folder is replaced in two renames (`P → .P.old-pid`, `.P.tmp-pid → P`), so
 * a dead run can leave:
 *
 * - `.P.old-pid` with no `P`: the old folder was moved aside but the new one never arrived, so the
 *   old one is renamed back (the reader sees the previous complete report, never a mix);
 * - `.P.old-pid` beside `P`: the new folder is in place and the old one is deleted;
 * - `.P.tmp-pid`: an unfinished build, deleted.
 *
 * Entries whose process is still alive (another build running now, or this process) are left alone.
 * Complexity: one directory listing plus one rename or delete per leftover.
 */
export async function recoverPackDir(packDir: string): Promise<Recovery> {
  const recovery: Recovery = {restored: [], removed: []};
  let names: string[];
  try {
    names = (await readdir(packDir)).sort();
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return recovery;
    throw e;
  }
  const leftovers = names
    .map((name) => ({name, match: LEFTOVER.exec(name)}))
    .filter((x): x is {name: string; match: RegExpExecArray} => x.match !== null && !isAlive(Number(x.match[3])));
  // Old folders first, so a restored period is not then treated as missing.
  for (const {name, match} of leftovers.filter((x) => x.match[2] === 'old')) {
    const target = join(packDir, match[1]);
    if (await exists(target)) {
      await rm(join(packDir, name), {recursive: true, force: true});
      recovery.removed.push(name);
    } else {
      await rename(join(packDir, name), target);
      recovery.restored.push(name);
    }
  }
  for (const {name} of leftovers.filter((x) => x.match[2] === 'tmp')) {
    await rm(join(packDir, name), {recursive: true, force: true});
    recovery.removed.push(name);
  }
  return recovery;
}

/** True when a process with this id exists (or exists under another user), or it is this process. */
function isAlive(pid: number): boolean {
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}
