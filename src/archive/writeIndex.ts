import {randomBytes} from 'node:crypto';
import {readdir, readFile, rename, rm} from 'node:fs/promises';
import {join} from 'node:path';
import {headlinesFromResults, parseHeadlines, type Headlines} from './headlines.js';
import {periodFolders} from '../results/index.js';
import {renderIndex, type IndexEntry} from './indexPage.js';
import {syncFolder, writeFileDurable} from './durable.js';

/**
 * Regenerate `<outDir>/<packId>/index.html` from the archived period folders, reading each one's headlines.json
 * (or, for folders archived before it existed, its results.json). A period whose figures are missing or
 * unreadable is still listed, with a note. The page is written to a temporary file (a random name, so no
 * leftover of a dead run is in the way), flushed to the disk and renamed, so readers never see half a page,
 * not even after a power cut. `archive` calls it under the pack's lock. Returns the page's path.
 */
export async function writeIndex(outDir: string, packId: string): Promise<string> {
  const packDir = join(outDir, packId);
  const entries: IndexEntry[] = [];
  for (const folder of await periodFolders(packDir)) {
    const dir = join(packDir, folder);
    const files = (await readdir(dir)).sort();
    entries.push({folder, results: await readHeadlines(dir, files), files});
  }
  const target = join(packDir, 'index.html');
  const tmp = join(packDir, `.index.html.tmp-${randomBytes(8).toString('hex')}`);
  try {
    await writeFileDurable(tmp, await renderIndex(packId, entries));
    await rename(tmp, target);
    await syncFolder(packDir);
  } finally {
    await rm(tmp, {force: true});
  }
  return target;
}

/** headlines.json when the folder has one, else the same figures from results.json; null when neither reads. */
async function readHeadlines(dir: string, files: string[]): Promise<Headlines | null> {
  try {
    if (files.includes('headlines.json')) return parseHeadlines(await readFile(join(dir, 'headlines.json'), 'utf8'));
    return headlinesFromResults(await readFile(join(dir, 'results.json'), 'utf8'));
  } catch {
    return null;
  }
}
