import type {Frequency} from '../../time/period.js';
import {bryBoschan} from './bryBoschan.js';
import {hardingPagan} from './hardingPagan.js';
import type {TurningPoint} from './types.js';

/**
 * Turning points of a complete series by the rule that suits its frequency, each flagged provisional when it lies
 * within `provisionalSpan` periods of the end (a later turn or revised data may still move or remove it).
 *
 * - quarterly: Harding-Pagan, ±2 quarters, phase ≥ 2, cycle ≥ 5 (their published values); provisional span 4.
 * - monthly: Bry-Boschan, ±5 months, phase ≥ 6, cycle ≥ 15, none within 6 months of the ends; span 10.
 * - weekly: Bry-Boschan with every duration scaled by 52/12 weeks per month and rounded (our choice; no
 *   published weekly rule): 52-week long average, ±22 weeks, 13-week short average, final radius 17,
 *   phase ≥ 26, cycle ≥ 65, end censoring 26; span 44.
 * The provisional span is max(2·window, minimum phase): our rule, so a turn counts as settled once both its
 * window and one full minimum phase after it are observed.
 *
 * Complexity: that of the rule. NaN policy: rejects NaN (fill gaps first).
 */
export function turningPoints(values: Float64Array, frequency: Frequency): {turns: TurningPoint[]; rule: DatingRule} {
  const rule = datingRule(frequency);
  const raw = rule.name === 'harding-pagan' ? hardingPagan(values, rule.options) : bryBoschan(values, rule.options);
  const n = values.length;
  const turns = raw.map((t) => ({...t, provisional: n - 1 - t.index < rule.provisionalSpan}));
  return {turns, rule};
}

export interface DatingRule {
  name: 'harding-pagan' | 'bry-boschan';
  options: Record<string, number>;
  provisionalSpan: number;
}

export function datingRule(frequency: Frequency): DatingRule {
  if (frequency === 'quarterly') {
    return {name: 'harding-pagan', options: {window: 2, minPhase: 2, minCycle: 5, censor: 1}, provisionalSpan: 4};
  }
  const monthly = {longSpan: 12, window: 5, shortSpan: 3, finalRadius: 4, minPhase: 6, minCycle: 15, censor: 6};
  const scale = frequency === 'weekly' ? 52 / 12 : 1;
  const options = Object.fromEntries(Object.entries(monthly).map(([k, v]) => [k, Math.round(v * scale)]));
  if (options.shortSpan % 2 === 0) options.shortSpan += 1;
  return {name: 'bry-boschan', options, provisionalSpan: Math.max(2 * options.window, options.minPhase)};
}
