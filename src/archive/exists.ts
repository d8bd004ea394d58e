import {stat} from 'node:fs/promises';

/** True when a file or folder exists at `path`; other errors than "not found" are thrown. */
export async function exists(path: string): Promise<boolean> {
  try {
    await stat(path);
    return true;
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return false;
    throw e;
  }
}
