import {en} from './catalog/en.js';
import type {Words} from './words.js';

type Phase = 'rising-above' | 'falling-above' | 'falling-below' | 'rising-below';

/**
 * The cycle's current phase in words. The analysis gives the phase code and, for results.json, an English label;
 * a gap that has not moved at all is labelled "on trend" there, and is worded so here.
 */
export function phaseWords(w: Words, cycle: {phase: Phase; phaseLabel: string}): string {
  return cycle.phaseLabel === en['phase.onTrend'] ? w.t('phase.onTrend') : w.t(`phase.${cycle.phase}`);
}
