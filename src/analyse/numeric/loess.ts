/**
 * LOESS with tricube weights on equally spaced points 1…n, as used by STL (Cleveland et al. 1990, §2–3).
 *
 * `loessAt` fits a local constant (degree 0) or local line (degree 1) at one position `x` from the points
 * `left…right` (1-based, inclusive); `loessInto` smooths a whole series, fitting every `jump`-th point and
 * joining the fits by straight lines, which is how STL saves time on long windows.
 *
 * Why: STL is built from these two routines; their arithmetic follows the published Fortran of the paper
 * (routines `est` and `ess`), so results agree with R's `stats::stl` to rounding.
 *
 * Reference: W. S. Cleveland (1979), Robust locally weighted regression and smoothing scatterplots, JASA 74:829–836;
 * R. B. Cleveland, W. S. Cleveland, J. E. McRae, I. Terpenning (1990), STL: a seasonal-trend decomposition
 * procedure based on loess, Journal of Official Statistics 6:3–73.
 *
 * Complexity: O(n · span / jump) time; no allocation (the caller passes a scratch array of length ≥ n).
 *
 * NaN policy: rejects NaN by contract (the caller fills gaps first); a NaN input spreads to the fits that use it.
 */

/**
 * Local fit at position `x` (1-based, may lie outside 1…n for extrapolation) from points `left…right`.
 * `span` is the nominal window: the bandwidth is the larger distance from `x` to `left` or `right`, widened by
 * ⌊(span − n)/2⌋ when the span exceeds the series. `robustness` (robustness weights per point) may be null.
 * Returns NaN when every weight is zero (the caller falls back to the data value, as the paper does).
 * `scratch` receives the local weights at indices `left−1 … right−1`.
 */
export function loessAt(
  y: Float64Array,
  n: number,
  span: number,
  degree: number,
  x: number,
  left: number,
  right: number,
  robustness: Float64Array | null,
  scratch: Float64Array,
): number {
  const range = n - 1;
  let h = Math.max(x - left, right - x);
  if (span > n) h += Math.trunc((span - n) / 2);
  const h9 = 0.999 * h;
  const h1 = 0.001 * h;
  let a = 0;
  for (let j = left; j <= right; j++) {
    let w = 0;
    const r = Math.abs(j - x);
    if (r <= h9) {
      if (r <= h1) w = 1;
      else {
        const q = r / h;
        const c = 1 - q * q * q;
        w = c * c * c;
      }
      if (robustness !== null) w *= robustness[j - 1];
      a += w;
    }
    scratch[j - 1] = w;
  }
  if (a <= 0) return NaN;
  for (let j = left; j <= right; j++) scratch[j - 1] /= a;
  if (h > 0 && degree > 0) {
    let mean = 0;
    for (let j = left; j <= right; j++) mean += scratch[j - 1] * j;
    let b = x - mean;
    let c = 0;
    for (let j = left; j <= right; j++) c += scratch[j - 1] * (j - mean) * (j - mean);
    if (Math.sqrt(c) > 0.001 * range) {
      b /= c;
      for (let j = left; j <= right; j++) scratch[j - 1] *= b * (j - mean) + 1;
    }
  }
  let fit = 0;
  for (let j = left; j <= right; j++) fit += scratch[j - 1] * y[j - 1];
  return fit;
}

/**
 * Smooth `y[0…n−1]` into `out[offset…offset+n−1]` (in place in `out`): LOESS of window `span` (odd) and `degree`,
 * evaluated at every `jump`-th point and linearly interpolated between them; the last point is always fitted.
 * Where a fit is undefined (all weights zero) the data value is used.
 */
export function loessInto(
  y: Float64Array,
  n: number,
  span: number,
  degree: number,
  jump: number,
  robustness: Float64Array | null,
  out: Float64Array,
  offset: number,
  scratch: Float64Array,
): void {
  if (n < 2) {
    out[offset] = y[0];
    return;
  }
  const step = Math.min(jump, n - 1);
  let left = 1;
  let right = n;
  const fitAt = (i: number): void => {
    const v = loessAt(y, n, span, degree, i, left, right, robustness, scratch);
    out[offset + i - 1] = Number.isNaN(v) ? y[i - 1] : v;
  };
  if (span >= n) {
    for (let i = 1; i <= n; i += step) fitAt(i);
  } else if (step === 1) {
    const half = (span + 1) >> 1;
    right = span;
    for (let i = 1; i <= n; i++) {
      if (i > half && right !== n) {
        left++;
        right++;
      }
      fitAt(i);
    }
  } else {
    const half = (span + 1) >> 1;
    for (let i = 1; i <= n; i += step) {
      if (i < half) {
        left = 1;
        right = span;
      } else if (i >= n - half + 1) {
        left = n - span + 1;
        right = n;
      } else {
        left = i - half + 1;
        right = span + i - half;
      }
      fitAt(i);
    }
  }
  if (step === 1) return;
  for (let i = 1; i <= n - step; i += step) {
    const base = out[offset + i - 1];
    const delta = (out[offset + i + step - 1] - base) / step;
    for (let j = i + 1; j < i + step; j++) out[offset + j - 1] = base + delta * (j - i);
  }
  const k = Math.trunc((n - 1) / step) * step + 1;
  if (k !== n) {
    // The paper's code fits the last point with the window of the last fitted point; kept for exact agreement.
    fitAt(n);
    if (k !== n - 1) {
      const base = out[offset + k - 1];
      const delta = (out[offset + n - 1] - base) / (n - k);
      for (let j = k + 1; j < n; j++) out[offset + j - 1] = base + delta * (j - k);
    }
  }
}

/** Options of {@link loess}. */
export interface LoessOptions {
  /** Window in points (odd). */
  span: number;
  /** Local polynomial degree, 0 or 1. Default: 1. */
  degree?: 0 | 1;
  /** Fit every `jump`-th point and interpolate. Default: 1. */
  jump?: number;
  /** Robustness weights per point, or null. Default: null. */
  weights?: Float64Array | null;
}

/**
 * LOESS smooth of a whole series (see {@link loessInto}); returns a new array.
 * @example loess(Float64Array.of(1, 2, 3, 4, 5), {span: 3}) // => [1, 2, 3, 4, 5]
 */
export function loess(values: Float64Array, {span, degree = 1, jump = 1, weights = null}: LoessOptions): Float64Array {
  const n = values.length;
  const out = new Float64Array(n);
  if (n === 0) return out;
  loessInto(values, n, span, degree, jump, weights, out, 0, new Float64Array(n));
  return out;
}
