import {readFile} from 'node:fs/promises';
import {join} from 'node:path';
import {parseResults} from '../render/results.js';
import {parsePeriod, type Frequency} from '../time/period.js';
import type {History} from './types.js';
import {revisions, type ResultsLike} from './revisions.js';
import {summariseTracking, trackForecasts} from './tracking.js';
import {periodFolders} from './periodFolders.js';

/**
 * History of a pack from earlier archived results: revisions against `previous` (the latest earlier
 * pack) and tracking of the forecasts published in every pack of `earlier` (which includes
 * `previous`). Pure.
 */
export function buildHistory(
  previous: ResultsLike,
  earlier: ResultsLike[],
  current: ResultsLike,
  thresholdPct: number,
): History {
  const tracking = trackForecasts(earlier, current);
  return {
    previousPeriod: previous.pack.period,
    revisions: revisions(previous, current, thresholdPct),
    tracking,
    trackingSummary: summariseTracking(tracking, current),
  };
}

/**
 * Read the archived packs of `packId` older than `period` and compare them with `current()`, the
 * results of this run built without history (the analyse stage needs History before the report is
 * rendered, so this works from results alone). Returns null when no earlier period is archived, without
 * calling `current` (building the results of a large pack costs time and memory).
 *
 * Period folders whose name is not a period of the pack's frequency, or that hold no results.json,
 * are ignored. An unreadable results.json throws the {@link parseResults} InputError naming the file.
 */
export async function loadHistory(
  outDir: string,
  packId: string,
  period: string,
  freq: Frequency,
  current: () => ResultsLike,
  thresholdPct: number,
): Promise<History | null> {
  const now = parsePeriod(freq, period);
  if (now === undefined) throw new RangeError(`invalid period: ${period}`);
  const packDir = join(outDir, packId);
  const earlier: ResultsLike[] = [];
  for (const folder of await periodFolders(packDir)) {
    const index = parsePeriod(freq, folder);
    if (index === undefined || index >= now) continue;
    const file = join(packDir, folder, 'results.json');
    let text: string;
    try {
      text = await readFile(file, 'utf8');
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code === 'ENOENT') continue;
      throw e;
    }
    earlier.push(parseResults(text, file));
  }
  if (earlier.length === 0) return null;
  return buildHistory(earlier[earlier.length - 1], earlier, current(), thresholdPct);
}
