import {readdir, readFile, rename, rm, writeFile} from 'node:fs/promises';
import {join} from 'node:path';
import {headlinesFromResults, parseHeadlines, type Headlines} from './headlines.js';
import {periodFolders} from '../results/index.js';
import {renderIndex, type IndexEntry} from './indexPage.js';

let counter = 0;

/**
 * Regenerate `<outDir>/<packId>/index.html` from the archived period folders, reading each one's headlines.json
 * (or, for folders archived before it existed, its results.json). A period whose figures are missing or
 * unreadable is still listed, with a note. The page is written to a
 * temporary file and renamed, so readers never see half a page. Returns the page's path.
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
  const tmp = join(packDir, `.index.html.tmp-${process.pid}-${++counter}`);
  try {
    await writeFile(tmp, renderIndex(packId, entries));
    await rename(tmp, target);
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
