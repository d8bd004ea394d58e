import {fillGaps} from '../numeric/fillGaps.js';

/**
 * Make a series ready for the models: drop leading and trailing NaN, fill interior gaps by straight lines
 * between the neighbours, and say what was done.
 *
 * Why: state-space recursions and least-squares fits need consecutive values; a short interior gap filled by
 * a line changes little, while a gap at the end would invent data (so the end is trimmed, never filled).
 * Complexity: O(n). NaN policy: this is the routine that removes NaN. Returns `first` (index of the first
 * value kept) so callers can map back to the original positions.
 */
export function prepareSeries(values: Float64Array): {values: Float64Array; first: number; filled: number} {
  let first = 0;
  while (first < values.length && Number.isNaN(values[first])) first++;
  let last = values.length - 1;
  while (last >= first && Number.isNaN(values[last])) last--;
  if (last < first) return {values: new Float64Array(0), first, filled: 0};
  const {values: out, filled} = fillGaps(values.subarray(first, last + 1));
  return {values: out, first, filled};
}
