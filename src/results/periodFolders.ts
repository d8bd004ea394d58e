import {readdir} from 'node:fs/promises';

/** A canonical period label of any frequency: `2026-10`, `2026-Q3`, `2026-W41`. */
const PERIOD_LABEL = /^\d{4}-(\d{2}|Q[1-4]|W\d{2})$/;

/**
 * Names of the archived period folders of one pack (`out/<pack-id>/`), in ascending label order.
 * Only folders named like a period label count: hidden leftovers (`.2026-10.tmp-123`) and any
 * folder a user added (`drafts`) are left out. Canonical labels
 * of one frequency (`2026-09`, `2026-Q3`, `2026-W41`) sort correctly as text, so no parsing is needed.
 * A missing pack folder has no periods.
 */
export async function periodFolders(packDir: string): Promise<string[]> {
  let entries;
  try {
    entries = await readdir(packDir, {withFileTypes: true});
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return [];
    throw e;
  }
  return entries
    .filter((e) => e.isDirectory() && PERIOD_LABEL.test(e.name))
    .map((e) => e.name)
    .sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
}
