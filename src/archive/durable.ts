import {open} from 'node:fs/promises';

/**
 * Write a file and flush it to the disk before returning. Why: the archive renames a finished
 * folder into place, and after a power cut a rename can survive while unflushed file contents do
 * not; flushing first keeps "old or new complete folder" true beyond process crashes.
 */
export async function writeFileDurable(path: string, content: string | Uint8Array): Promise<void> {
  const handle = await open(path, 'w');
  try {
    await handle.writeFile(content);
    await handle.sync();
  } finally {
    await handle.close();
  }
}

/** Flush a folder's entries (renames into and out of it) to the disk. */
export async function syncFolder(path: string): Promise<void> {
  const handle = await open(path, 'r');
  try {
    await handle.sync();
  } finally {
    await handle.close();
  }
}
