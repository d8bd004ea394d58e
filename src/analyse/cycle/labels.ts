import {en} from '../../words/catalog/en.js';

/** The four cycle phases: above or below the long-run trend, and the gap's direction. */
export type Phase = 'rising-above' | 'falling-above' | 'falling-below' | 'rising-below';

/**
 * The phase labels results.json carries beside the phase code (`phaseLabel`), in English whatever the pack's
 * language, from the words module's English catalogue (these messages take no arguments, so the catalogue text is
 * the label; the analysis threads need not load the message formatter); the report words the phase code itself.
 */
export const phaseLabels: Record<Phase, string> = {
  'rising-above': en['phase.rising-above'],
  'falling-above': en['phase.falling-above'],
  'falling-below': en['phase.falling-below'],
  'rising-below': en['phase.rising-below'],
};

export const onTrendLabel = en['phase.onTrend'];

/** The plain-words stationarity verdict results.json carries (`stationarity.summary`), in English. */
export function stationaritySummary(level: boolean, differences: boolean, constantVariance: boolean): string {
  const mean = level
    ? 'stationary in mean'
    : differences
      ? 'stationary in mean after differencing (it wanders, as a trending series does)'
      : 'not stationary in mean even after differencing';
  return `${mean}; ${constantVariance ? 'stationary in variance' : 'variance changes over time'}`;
}
