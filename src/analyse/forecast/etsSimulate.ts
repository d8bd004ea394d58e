import {mulberry32} from '../numeric/mulberry32.js';
import {standardNormalSampler} from '../numeric/standardNormalSampler.js';
import type {EtsFit} from './etsFit.js';

/**
 * Sample paths of a fitted ETS model h periods ahead: from the final states, draw εₜ ~ N(0, σ²), form
 * yₜ = μₜ + εₜ (additive error) or μₜ(1 + εₜ) (multiplicative error), and update the states with yₜ by the same
 * recursions as the fit. Seeded, so the same fit gives the same paths.
 *
 * Why: quantities without a closed-form distribution — here the running totals of the forecasts, whose errors
 * are correlated across horizons — are read off simulated paths (Hyndman et al. 2008, §6.1).
 * Reference: Hyndman et al. (2008), Forecasting with Exponential Smoothing, §6.1 (simulated prediction
 * distributions).
 *
 * Options: `h` periods; `paths` (Default: 2000); `seed` of the mulberry32 generator (Default: 20260101).
 * Complexity: O(paths·h). NaN policy: NaN in the fit → NaN paths. Returns paths × h values, row-major.
 */
export function simulateEts(
  fit: EtsFit,
  {h, paths = 2000, seed = 20260101}: {h: number; paths?: number; seed?: number},
): Float64Array {
  const {spec, params, finalStates: x} = fit;
  const sigma = Math.sqrt(Math.max(fit.sigma2, 0));
  const normal = standardNormalSampler(mulberry32(seed));
  const hasTrend = spec.trend !== 'N';
  const m = spec.season === 'N' ? 1 : spec.period;
  const first = hasTrend ? 2 : 1;
  const phi = hasTrend && spec.damped ? params.phi : 1;
  const out = new Float64Array(paths * h);
  const s = new Float64Array(m);
  for (let p = 0; p < paths; p++) {
    let l = x[0];
    let b = hasTrend ? x[1] : 0;
    if (spec.season !== 'N') for (let j = 0; j < m; j++) s[j] = x[first + j];
    let head = 0;
    for (let t = 0; t < h; t++) {
      const phib = phi * b;
      const q = l + phib;
      const oldIdx = (head + m - 1) % m;
      const old = spec.season === 'N' ? 0 : s[oldIdx];
      const mu = spec.season === 'N' ? q : spec.season === 'A' ? q + old : q * old;
      const e = sigma * normal();
      const y = spec.error === 'A' ? mu + e : mu * (1 + e);
      out[p * h + t] = y;
      const level = spec.season === 'N' ? y : spec.season === 'A' ? y - old : y / old;
      const lNew = q + params.alpha * (level - q);
      if (hasTrend) b = phib + (params.beta / params.alpha) * (lNew - l - phib);
      if (spec.season !== 'N') {
        const target = spec.season === 'A' ? y - q : y / q;
        head = oldIdx;
        s[head] = old + params.gamma * (target - old);
      }
      l = lNew;
    }
  }
  return out;
}
