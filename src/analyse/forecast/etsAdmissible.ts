import {rootsWithinUnitCircle} from '../numeric/rootsWithinUnitCircle.js';
import type {EtsParams, EtsSpec} from './etsModel.js';

/**
 * Whether smoothing parameters give a forecastable (admissible) ETS model: the discount matrix has all
 * eigenvalues inside the unit circle, so old observations lose weight. Closed-form inequalities for the
 * non-seasonal models; for seasonal models three necessary inequalities, then the characteristic polynomial
 * φ(1−α−γ) + (α+β−αφ+γ−1)z + (α+β−αφ)(z² + … + z^{m−1}) + (α+β−φ)zᵐ + z^{m+1} must have its roots in |z| ≤ 1.
 *
 * Reference: R. J. Hyndman, M. Akram and B. C. Archibald (2008), The admissible parameter space for
 * exponential smoothing models, Annals of the Institute of Statistical Mathematics 60, 407–426;
 * the same tests as the reference implementation's `admissible`.
 *
 * Complexity: O(m²). NaN policy: NaN parameters are not admissible.
 */
let polyScratch = new Float64Array(0);

export function etsAdmissible(spec: EtsSpec, params: EtsParams): boolean {
  const {alpha} = params;
  const phi = spec.trend !== 'N' && spec.damped ? params.phi : 1;
  const hasTrend = spec.trend !== 'N';
  if (!(phi >= 0 && phi <= 1 + 1e-8)) return false;
  if (spec.season === 'N' || spec.period <= 1) {
    if (!(alpha >= 1 - 1 / phi && alpha <= 1 + 1 / phi)) return false;
    if (hasTrend && !(params.beta >= alpha * (phi - 1) && params.beta <= (1 + phi) * (2 - alpha))) return false;
    return true;
  }
  const m = spec.period;
  const beta = hasTrend ? params.beta : 0;
  const gamma = params.gamma;
  if (!(gamma >= Math.max(1 - 1 / phi - alpha, 0) && gamma <= 1 + 1 / phi - alpha)) return false;
  if (!(alpha >= 1 - 1 / phi - (gamma * (1 - m + phi + phi * m)) / (2 * phi * m))) return false;
  if (!(beta >= -(1 - phi) * (gamma / m + alpha))) return false;
  const poly = polyScratch.length === m + 2 ? polyScratch : (polyScratch = new Float64Array(m + 2));
  poly[0] = phi * (1 - alpha - gamma);
  poly[1] = alpha + beta - alpha * phi + gamma - 1;
  for (let k = 2; k < m; k++) poly[k] = alpha + beta - alpha * phi;
  poly[m] = alpha + beta - phi;
  poly[m + 1] = 1;
  return rootsWithinUnitCircle(poly);
}
