import {readFile} from 'node:fs/promises';
import {join} from 'node:path';
import {parsePeriod, type Frequency} from '../time/period.js';
import {digestOfResults, parseDigest, type PeriodDigest} from './digest.js';
import {parseResults} from './read.js';
import {periodFolders} from './periodFolders.js';

/**
 * The digests of the archived periods of one pack (`out/<pack-id>/`) before period index `before`, oldest first.
 * Each comes from the folder's `digest.json`; a folder written before digests were kept gives the digest of its
 * `results.json` (read whole, one period at a time); a folder with neither is skipped, and so is a folder whose
 * name is not a period of this frequency. They come one at a time, so a reader keeps only what it needs of each.
 *
 * An unreadable file throws the InputError of {@link parseDigest} or {@link parseResults}, naming the file.
 */
export async function* earlierDigests(packDir: string, freq: Frequency, before: number): AsyncGenerator<PeriodDigest> {
  for (const folder of await periodFolders(packDir)) {
    const index = parsePeriod(freq, folder);
    if (index === undefined || index >= before) continue;
    const digestFile = join(packDir, folder, 'digest.json');
    const digestText = await readIfPresent(digestFile);
    if (digestText !== null) {
      yield parseDigest(digestText, digestFile);
      continue;
    }
    const resultsFile = join(packDir, folder, 'results.json');
    const resultsText = await readIfPresent(resultsFile);
    if (resultsText !== null) yield digestOfResults(parseResults(resultsText, resultsFile));
  }
}

async function readIfPresent(file: string): Promise<string | null> {
  try {
    return await readFile(file, 'utf8');
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return null;
    throw e;
  }
}
