/**
 * Plain-words texts of the cycle engine, kept in one place (names of our own).
 */
export type Phase = 'rising-above' | 'falling-above' | 'falling-below' | 'rising-below';

export const phaseLabels: Record<Phase, string> = {
  'rising-above': 'above trend and rising',
  'falling-above': 'above trend, easing',
  'falling-below': 'below trend and falling',
  'rising-below': 'below trend, recovering',
};

export const onTrendLabel = 'on trend, no cycle to speak of';

export function endPointCaution(periods: number): string {
  return (
    `The trend over the latest ${periods} periods is provisional: a two-sided filter sees no data beyond the end, ` +
    'so these values and the gap will be revised as new data arrive.'
  );
}

export function filledNote(count: number): string {
  const what = count === 1 ? 'value was' : 'values were';
  return `${count} missing ${what} filled by straight-line interpolation before filtering.`;
}

export function untestedNote(reason: string): string {
  return `Stationarity not tested: ${reason}.`;
}

export function stationaritySummary(level: boolean, differences: boolean, constantVariance: boolean): string {
  const mean = level
    ? 'stationary in mean'
    : differences
      ? 'stationary in mean after differencing (it wanders, as a trending series does)'
      : 'not stationary in mean even after differencing';
  return `${mean}; ${constantVariance ? 'stationary in variance' : 'variance changes over time'}`;
}
