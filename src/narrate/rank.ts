import type {Callout} from './types.js';

const SEVERITY_POINTS = {info: 100, watch: 200, alert: 300} as const;

/**
 * Deterministic rank of a callout: severity first, then size, then recency.
 *
 *   rank = severity points (info 100, watch 200, alert 300)
 *        + 5 × min(magnitude, 10)                      (size relative to usual variability, ≤ 50)
 *        + 20 × max(0, 1 − periodsAgo ÷ (2 × periods per year))   (recency, ≤ 20)
 *
 * so any alert outranks any watch and any watch any info. Rounded to 6 decimals so that floating-point noise
 * cannot reorder ties across platforms; ties are broken by the caller in a fixed order.
 */
export function rankOf(
  severity: Callout['severity'],
  magnitude: number,
  periodsAgo: number,
  periodsPerYear: number,
): number {
  const size = 5 * Math.min(Number.isFinite(magnitude) ? Math.abs(magnitude) : 0, 10);
  const recency = 20 * Math.max(0, 1 - Math.max(0, periodsAgo) / (2 * periodsPerYear));
  return Math.round((SEVERITY_POINTS[severity] + size + recency) * 1e6) / 1e6;
}
