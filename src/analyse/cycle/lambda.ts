import type {Frequency} from '../../time/period.js';
import {periodsPerYear} from '../../time/period.js';

/**
 * Default Hodrick-Prescott smoothing parameter for a frequency: λ = 1600 · (s / 4)⁴ with s observations per year.
 *
 * Quarterly 1600 (Hodrick & Prescott 1997); monthly 1600 · 3⁴ = 129 600, the fourth-power rule of Ravn & Uhlig,
 * which keeps the filter's gain at a given cycle length the same across frequencies. Weekly applies the same
 * rule with 52 weeks a year: 1600 · 13⁴ = 45 697 600.
 *
 * Reference: M. O. Ravn and H. Uhlig (2002), On adjusting the Hodrick-Prescott filter for the frequency of
 * observations, Review of Economics and Statistics 84(2):371–376.
 *
 * @example defaultHpLambda('monthly') // => 129600
 */
export function defaultHpLambda(frequency: Frequency): number {
  return 1600 * (periodsPerYear[frequency] / 4) ** 4;
}
