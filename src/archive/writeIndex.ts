import {readdir, readFile, rename, rm, writeFile} from 'node:fs/promises';
import {join} from 'node:path';
import {z} from 'zod';
import {RESULTS_SCHEMA} from '../render/results.js';
import {periodFolders} from './periodFolders.js';
import {renderIndex, type Headlines, type IndexEntry} from './indexPage.js';

let counter = 0;

/**
 * Just the fields the index shows. Checking only these (instead of the whole file with
 * `parseResults`) keeps regenerating the index cheap when a back-fill rewrites it after every period.
 */
const headlines = z.object({
  schema: z.literal(RESULTS_SCHEMA),
  pack: z.object({
    title: z.string(),
    locale: z.string(),
    frequency: z.union([z.literal(12), z.literal(4), z.literal(52)]),
  }),
  series: z.array(
    z.object({
      label: z.string(),
      unit: z.string().nullable(),
      hidden: z.boolean(),
      original: z.custom<(number | null)[]>(
        (v) => Array.isArray(v) && v.every((x) => x === null || typeof x === 'number'),
      ),
      changes: z.object({yearOnYear: z.number().nullable()}),
    }),
  ),
});

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

async function readResults(file: string): Promise<Headlines | null> {
  try {
    const parsed = headlines.safeParse(JSON.parse(await readFile(file, 'utf8')));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}
