import type {SeasonalAdjustment} from './seasonalAdjustment.js';

/**
 * Put the in-sample seasonal figure back on values fitted to the adjusted series: × (yₜ / aₜ) when the adjustment
 * was multiplicative, + (yₜ − aₜ) when additive, unchanged when the series was not adjusted.
 *
 * Why: one-step in-sample forecasts of a model fitted to adjusted data, on the original scale (their errors feed
 * forecast reconciliation). Complexity O(n). NaN policy: NaN in → NaN out.
 */
export function inSampleSeasonal(
  fitted: Float64Array,
  values: Float64Array,
  adjustment: SeasonalAdjustment,
): Float64Array {
  const a = adjustment.adjusted;
  if (!adjustment.seasonal) return Float64Array.from(fitted);
  return fitted.map((f, t) => (adjustment.kind === 'multiplicative' ? (f * values[t]) / a[t] : f + values[t] - a[t]));
}
