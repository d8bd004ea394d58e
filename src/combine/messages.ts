import type {Note} from '../words/index.js';

/**
 * Every note of the combine stage, one function each, as coded notes (worded in the pack's language by
 * src/words for the data-notes page, results.json and the manifest).
 */

export const partsGap = (
  group: string,
  total: string,
  period: string,
  gap: number,
  percent: number,
  periods: number,
): Note => ({code: 'partsGap', values: {group, total, period, gap: formatNumber(gap), percent: formatNumber(percent), periods}});

export const mintFallback = (group: string, reason: string): Note => ({code: 'mintFallback', values: {group, reason}});

/** `why`: `noForecast` (of series `series`) or `notFinite`. */
export const notReconciled = (group: string, why: 'noForecast' | 'notFinite', series = ''): Note => ({
  code: 'notReconciled',
  values: {group, why, series},
});

function formatNumber(x: number): string {
  return Number(x.toPrecision(4)).toString();
}
