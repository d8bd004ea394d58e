import type {Frequency} from '../time/period.js';
import type {Note} from '../words/index.js';

/**
 * Every note of the combine stage, one function each, as coded notes (worded in the pack's language by
 * src/words for the data-notes page, results.json and the manifest).
 */

export const partsGap = (
  group: string,
  total: string,
  at: {frequency: Frequency; period: number},
  gap: number,
  percent: number,
  periods: number,
): Note => ({
  code: 'partsGap',
  values: {group, total, periods},
  periods: {frequency: at.frequency, named: {period: at.period}},
  figures: {gap, percent},
});

export const mintFallback = (group: string, reason: string): Note => ({code: 'mintFallback', values: {group, reason}});

/** `why`: `noForecast` (of series `series`) or `notFinite`. */
export const notReconciled = (group: string, why: 'noForecast' | 'notFinite', series = ''): Note => ({
  code: 'notReconciled',
  values: {group, why, series},
});
