import {kernel, kernelHeap, slotAddress} from './loessKernel.js';

/**
 * LOESS with tricube weights on equally spaced points 1…n, as used by STL (Cleveland et al. 1990, §2–3): a local
 * constant (degree 0) or local line (degree 1) fitted at every `jump`-th point, the fits joined by straight lines.
 *
 * Why: STL and the weekly decomposition are built from it. The arithmetic runs in the compiled kernel
 * (loessKernel.wat, routines `est` and `ess` of the paper's published code), so results agree with R's
 * `stats::stl` to rounding.
 *
 * Reference: W. S. Cleveland (1979), Robust locally weighted regression and smoothing scatterplots, JASA 74:829–836;
 * R. B. Cleveland, W. S. Cleveland, J. E. McRae, I. Terpenning (1990), STL: a seasonal-trend decomposition
 * procedure based on loess, Journal of Official Statistics 6:3–73.
 *
 * Complexity: O(n · span / jump) time; O(n) memory.
 *
 * NaN policy: rejects NaN by contract (the caller fills gaps first); a NaN input spreads to the fits that use it.
 */

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
 * LOESS smooth of a whole series; returns a new array. The bandwidth of a fit is its larger distance to the window's
 * ends, widened by ⌊(span − n)/2⌋ when the span exceeds the series; the last point is always fitted; where every
 * weight of a fit is zero the data value is kept.
 * @example loess(Float64Array.of(1, 2, 3, 4, 5), {span: 3}) // => [1, 2, 3, 4, 5]
 */
export function loess(values: Float64Array, {span, degree = 1, jump = 1, weights = null}: LoessOptions): Float64Array {
  const n = values.length;
  if (n === 0) return new Float64Array(0);
  // Heap: values, weights (or ones), fits, and the wide-table area (distances −(n + 1) to n + 1).
  const heap = kernelHeap(5 * n + 3);
  heap.set(values, 0);
  if (weights === null) heap.fill(1, n, 2 * n);
  else heap.set(weights.subarray(0, n), n);
  kernel.setWideArea(slotAddress(3 * n), n + 1);
  kernel.loessInto(
    slotAddress(0), n, span, degree, jump, slotAddress(n), weights === null ? 1 : 0, slotAddress(2 * n),
  );
  return heap.slice(2 * n, 3 * n);
}
