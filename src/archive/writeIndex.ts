import {readdir, readFile, rename, rm, writeFile} from 'node:fs/promises';
import {join} from 'node:path';
import {parseResults, type ResultsV1} from '../render/results.js';
import {periodFolders} from './periodFolders.js';
import {renderIndex, type IndexEntry} from './indexPage.js';

let counter = 0;

/**
 * Regenerate `<outDir>/<packId>/index.html` from the archived period folders. A period whose
 * results.json is missing or unreadable is still listed, with a note. The page is written to a
 * temporary file and renamed, so readers never see half a page. Returns the page's path.
 */
export async function writeIndex(outDir: string, packId: string): Promise<string> {
  const packDir = join(outDir, packId);
  const entries: IndexEntry[] = [];
  for (const folder of await periodFolders(packDir)) {
    const dir = join(packDir, folder);
    const files = (await readdir(dir)).sort();
    entries.push({folder, results: await readResults(join(dir, 'results.json')), files});
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

async function readResults(file: string): Promise<ResultsV1 | null> {
  try {
    return parseResults(await readFile(file, 'utf8'), file);
  } catch {
    return null;
  }
}
