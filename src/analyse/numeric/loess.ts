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
 * Complexity: O(n · span / jump) time; no allocation.
 *
 * NaN policy: rejects NaN by contract (the caller fills gaps first); a NaN input spreads to the fits that use it.
 */

/**
 * Local fit at the whole-number position `x` (1-based, may lie outside 1…n for extrapolation) from points
 * `left…right`.
 * `span` is the nominal window: the bandwidth is the larger distance from `x` to `left` or `right`, widened by
 * ⌊(span − n)/2⌋ when the span exceeds the series. `robustness` (robustness weights per point) may be null.
 * Returns NaN when every weight is zero (the caller falls back to the data value, as the paper does).
 *
 * One pass accumulates Σw, Σw·u, Σw·u², Σw·y and Σw·u·y with u = j − x (centred, so no cancellation), and the
 * local line is evaluated in closed form. This is the paper's fit rearranged: results agree with its
 * step-by-step arithmetic to rounding (about 1e−14 relative).
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
): number {
  let h = Math.max(x - left, right - x);
  if (span > n) h += Math.trunc((span - n) / 2);
  const kernel = tricubeTable(h);
  // A local line through a symmetric window with symmetric weights passes through the weighted mean at its
  // centre, so the slope terms are skipped there (and for local constants); the result differs only by rounding.
  // Two loops (left of x, then from x) so the distance |j − x| needs no branch; robust and plain fits apart.
  const split = Math.min(Math.max(x, left), right + 1);
  if (degree === 0 || h === 0 || (robustness === null && x - left === right - x)) {
    let sw = 0;
    let swy = 0;
    if (robustness === null) {
      for (let j = left; j < split; j++) {
        const w = kernel[x - j];
        sw += w;
        swy += w * y[j - 1];
      }
      for (let j = split; j <= right; j++) {
        const w = kernel[j - x];
        sw += w;
        swy += w * y[j - 1];
      }
    } else {
      for (let j = left; j < split; j++) {
        const w = kernel[x - j] * robustness[j - 1];
        sw += w;
        swy += w * y[j - 1];
      }
      for (let j = split; j <= right; j++) {
        const w = kernel[j - x] * robustness[j - 1];
        sw += w;
        swy += w * y[j - 1];
      }
    }
    return sw > 0 ? swy / sw : NaN;
  }
  let sw = 0;
  let swu = 0;
  let swuu = 0;
  let swy = 0;
  let swuy = 0;
  for (let j = left; j < split; j++) {
    const u = j - x;
    const w = robustness === null ? kernel[-u] : kernel[-u] * robustness[j - 1];
    const wy = w * y[j - 1];
    sw += w;
    swu += w * u;
    swuu += w * u * u;
    swy += wy;
    swuy += wy * u;
  }
  for (let j = split; j <= right; j++) {
    const u = j - x;
    const w = robustness === null ? kernel[u] : kernel[u] * robustness[j - 1];
    const wy = w * y[j - 1];
    sw += w;
    swu += w * u;
    swuu += w * u * u;
    swy += wy;
    swuy += wy * u;
  }
  if (sw <= 0) return NaN;
  const level = swy / sw;
  const meanU = swu / sw;
  const c = swuu / sw - meanU * meanU;
  if (!(Math.sqrt(c) > 0.001 * (n - 1))) return level;
  return level - (meanU / c) * (swuy / sw - meanU * level);
}

const tables: Float64Array[] = [];
/** Bandwidths up to this are kept for good; wider ones (STL's periodic windows) in a small set, cleared when full. */
const MAX_KEPT = 512;
const wide = new Map<number, Float64Array>();
const MAX_WIDE = 32;

/** Tricube weight (1 − (r/h)³)³ with the paper's cut-offs: 1 for r ≤ 0.001·h and 0 for r > 0.999·h. */
function tricube(r: number, h: number): number {
  if (r > 0.999 * h) return 0;
  if (r <= 0.001 * h) return 1;
  const q = r / h;
  const c = 1 - q * q * q;
  return c * c * c;
}

/**
 * Tricube weights for the integer distances r = 0…h. Positions and bandwidths are whole numbers in STL, so each
 * table is built once per bandwidth and reused.
 */
function tricubeTable(h: number): Float64Array {
  let table = h <= MAX_KEPT ? tables[h] : wide.get(h);
  if (table === undefined) {
    table = new Float64Array(h + 1);
    for (let r = 0; r <= h; r++) table[r] = tricube(r, h);
    if (h <= MAX_KEPT) tables[h] = table;
    else {
      if (wide.size >= MAX_WIDE) wide.clear();
      wide.set(h, table);
    }
  }
  return table;
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
): void {
  if (n < 2) {
    out[offset] = y[0];
    return;
  }
  const step = Math.min(jump, n - 1);
  const half = (span + 1) >> 1;
  let left = 1;
  let right = n;
  if (span >= n) {
    for (let i = 1; i <= n; i += step) fitInto(y, n, span, degree, i, left, right, robustness, out, offset);
  } else if (step === 1) {
    right = span;
    for (let i = 1; i <= n; i++) {
      if (i > half && right !== n) {
        left++;
        right++;
      }
      fitInto(y, n, span, degree, i, left, right, robustness, out, offset);
    }
    return;
  } else {
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
      fitInto(y, n, span, degree, i, left, right, robustness, out, offset);
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
    fitInto(y, n, span, degree, n, left, right, robustness, out, offset);
    if (k !== n - 1) {
      const base = out[offset + k - 1];
      const delta = (out[offset + n - 1] - base) / (n - k);
      for (let j = k + 1; j < n; j++) out[offset + j - 1] = base + delta * (j - k);
    }
  }
}

function fitInto(
  y: Float64Array,
  n: number,
  span: number,
  degree: number,
  i: number,
  left: number,
  right: number,
  robustness: Float64Array | null,
  out: Float64Array,
  offset: number,
): void {
  const v = loessAt(y, n, span, degree, i, left, right, robustness);
  out[offset + i - 1] = Number.isNaN(v) ? y[i - 1] : v;
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
  loessInto(values, n, span, degree, jump, weights, out, 0);
  return out;
}
