import {readdir, rename, rm} from 'node:fs/promises';
import {join} from 'node:path';
import {exists} from './exists.js';

/**
 * `.<name>.tmp-<token>` or `.<name>.old-<token>`: a run's random token (hex), or the process id (and a counter)
 * that earlier versions used.
 */
const LEFTOVER = /^\.(.+)\.(tmp|old)-([0-9a-f]+(?:-\d+)?)$/;

/** What {@link recoverPackDir} did, by entry name. */
export interface Recovery {
  /** `.<period>.old-<token>` folders renamed back to `<period>` because a replacement stopped half-way. */
  restored: string[];
  /** Stale temporary folders and superseded old folders deleted. */
  removed: string[];
}

/**
 * Put a pack's archive folder back in order after a run that died part-way (crash, SIGKILL, power cut
 * of the process). A period folder is replaced in two renames (`P → .P.old-token`, `.P.tmp-token → P`), so
 * a dead run can leave:
 *
 * - `.P.old-token` with no `P`: the old folder was moved aside but the new one never arrived, so the
 *   old one is renamed back (the reader sees the previous complete report, never a mix);
 * - `.P.old-token` beside `P`: the new folder is in place and the old one is deleted;
 * - `.P.tmp-token` (also `.index.html.tmp-token`): an unfinished write, deleted.
 *
 * Call it only while holding the pack's lock ({@link lockPackDir}): every run writes its leftovers under that
 * lock, so whatever matches belongs to a run that is no longer there, whatever its process id was.
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
    .filter((x): x is {name: string; match: RegExpExecArray} => x.match !== null);
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
