import type {Callout} from './types.js';

/**
 * Severity from how unusual a move is, in robust sigmas: |z| ≥ 3 → alert, |z| ≥ 2 → watch, else info.
 *
 * Why these thresholds: they are the 2σ "warning" and 3σ "action" limits of control charts, common practice
 * in management reporting; a series without enough history to judge (z = NaN) is info.
 */
export const WATCH_SIGMA = 2;
export const ALERT_SIGMA = 3;

export function severityFromZ(z: number): Callout['severity'] {
  const a = Math.abs(z);
  return a >= ALERT_SIGMA ? 'alert' : a >= WATCH_SIGMA ? 'watch' : 'info';
}

