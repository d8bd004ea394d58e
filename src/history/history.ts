import {join} from 'node:path';
import {earlierDigests, type History, type PeriodDigest} from '../results/index.js';
import {parsePeriod, type Frequency} from '../time/period.js';
import {revisions} from './revisions.js';
import {summariseTracking, trackForecasts, type PublishedForecasts} from './tracking.js';

/**
 * History of a pack from earlier periods: revisions against `previous` (the latest earlier period) and tracking of
 * the forecasts published in every period of `earlier` (which includes `previous`). Pure.
 */
export function buildHistory(
  previous: PeriodDigest,
  earlier: readonly PublishedForecasts[],
  current: PeriodDigest,
  thresholdPct: number,
): History {
  const tracking = trackForecasts([...earlier], current);
  return {
    previousPeriod: previous.pack.period,
    revisions: revisions(previous, current, thresholdPct),
    tracking,
    trackingSummary: summariseTracking(tracking, current),
  };
}

/**
 * Compare this run (`current`, the digest of its analyses) with the archived periods of `packId` before `period`,
 * read through their digests. Null when no earlier period is archived.
 *
 * Memory: of each earlier period only its forecasts for periods up to `period` are kept (the only ones an actual
 * can have arrived for), and only the latest period's figures, so a back-filled year of a large pack holds little
 * more than one period's digest.
 */
export async function loadHistory(
  outDir: string,
  packId: string,
  period: string,
  freq: Frequency,
  current: PeriodDigest,
  thresholdPct: number,
): Promise<History | null> {
  const now = parsePeriod(freq, period);
  if (now === undefined) throw new RangeError(`invalid period: ${period}`);
  let previous: PeriodDigest | null = null;
  const published: PublishedForecasts[] = [];
  for await (const digest of earlierDigests(join(outDir, packId), freq, now)) {
    published.push(forecastsUpTo(digest, period));
    previous = digest;
  }
  return previous === null ? null : buildHistory(previous, published, current, thresholdPct);
}

/**
 * The forecasts of a digest cut to the periods up to `period` (labels of one frequency sort as text). The digest was
 * just read and is not shared, so its band records are cut in place: a new record keyed by `"80"` and `"95"` would
 * cost about a kilobyte each (see `sharedRecord` in tracking.ts), the parsed ones a tenth of that.
 */
function forecastsUpTo(digest: PeriodDigest, period: string): PublishedForecasts {
  return {
    pack: digest.pack,
    series: digest.series.map(({id, forecast: fc}) => {
      if (fc === null) return {id, forecast: null};
      const k = fc.periods.filter((label) => label <= period).length;
      for (const bands of [fc.lower, fc.upper]) for (const level of Object.keys(bands)) bands[level] = bands[level].slice(0, k);
      return {id, forecast: {periods: fc.periods.slice(0, k), mean: fc.mean.slice(0, k), lower: fc.lower, upper: fc.upper}};
    }),
  };
}
