import {leastSquares} from '../numeric/leastSquares.js';
import {classicalFigure} from '../decompose/classical.js';
import type {EtsSpec} from './etsModel.js';

/**
 * Heuristic start values of the free ETS states [l, b?, s₀ … s_{m−2}], later refined by maximum likelihood.
 * Seasonal states come from a classical decomposition (n ≥ 3m) or, for shorter series, from the deviations
 * around a line fitted with one Fourier pair; level and trend from the first max(10, 2m) seasonally adjusted
 * values (their mean, or a least-squares line).
 *
 * Why: the likelihood surface has local optima; starting where the reference implementation starts keeps the
 * selected models comparable with it.
 * Reference: Hyndman et al. (2002), §2.6.1 (initialisation); Hyndman et al. (2008), §5.2; the same steps as
 * the reference implementation's `initstate`.
 *
 * Complexity: O(n·m). NaN policy: rejects NaN. Needs n ≥ 4 for seasonal models.
 */
export function etsInitialStates(y: Float64Array, spec: EtsSpec): Float64Array {
  const n = y.length;
  const seasonal = spec.season !== 'N';
  const m = seasonal ? spec.period : 1;
  let adjusted = y;
  let initSeas: number[] = [];
  if (seasonal) {
    if (n < 4) throw new RangeError('seasonal start values need at least four values');
    const detrended = new Float64Array(n);
    if (n < 3 * m) {
      const ones = new Float64Array(n).fill(1);
      const t = Float64Array.from({length: n}, (_, i) => i + 1);
      const sin = t.map((v) => Math.sin((2 * Math.PI * v) / m));
      const cos = t.map((v) => Math.cos((2 * Math.PI * v) / m));
      const columns = m === 2 ? [ones, t, cos] : [ones, t, sin, cos];
      const [c0, c1] = leastSquares(y, columns).coefficients;
      for (let i = 0; i < n; i++) {
        const line = c0 + c1 * (i + 1);
        detrended[i] = spec.season === 'A' ? y[i] - line : y[i] / line;
      }
    } else {
      const figure = classicalFigure(y, m, spec.season === 'A' ? 'additive' : 'multiplicative');
      for (let i = 0; i < n; i++) detrended[i] = figure[i % m];
    }
    for (let i = m - 1; i >= 1; i--) initSeas.push(detrended[i]);
    adjusted = new Float64Array(n);
    if (spec.season === 'A') {
      for (let i = 0; i < n; i++) adjusted[i] = y[i] - detrended[i];
    } else {
      initSeas = initSeas.map((v) => Math.max(v, 0.01));
      const total = initSeas.reduce((a, b) => a + b, 0);
      if (total > m) initSeas = initSeas.map((v) => v / (total + 0.01 * initSeas.length));
      for (let i = 0; i < n; i++) adjusted[i] = y[i] / Math.max(detrended[i], 0.01);
    }
  }
  const maxn = Math.min(Math.max(10, 2 * m), n);
  const out: number[] = [];
  if (spec.trend === 'N') {
    let sum = 0;
    for (let i = 0; i < maxn; i++) sum += adjusted[i];
    out.push(sum / maxn);
  } else {
    // Least-squares line through (1, a₁) … (maxn, a_maxn).
    let mx = 0;
    let my = 0;
    for (let i = 0; i < maxn; i++) {
      mx += i + 1;
      my += adjusted[i];
    }
    mx /= maxn;
    my /= maxn;
    let sxy = 0;
    let sxx = 0;
    for (let i = 0; i < maxn; i++) {
      sxy += (i + 1 - mx) * (adjusted[i] - my);
      sxx += (i + 1 - mx) ** 2;
    }
    let b0 = sxx > 0 ? sxy / sxx : 0;
    let l0 = my - b0 * mx;
    if (Math.abs(l0 + b0) < 1e-8) {
      l0 *= 1 + 1e-3;
      b0 *= 1 - 1e-3;
    }
    out.push(l0, b0);
  }
  return Float64Array.from([...out, ...initSeas]);
}
