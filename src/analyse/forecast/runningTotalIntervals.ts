import type {RunningTotals} from './model.js';

/**
 * Intervals for running totals T_k = y_{n+1} + … + y_{n+k} (k = 1 … h) from simulated sample paths: the
 * (1 − level)/2 and (1 + level)/2 sample quantiles of T_k across paths, by linear interpolation between order
 * statistics (Hyndman & Fan 1996, definition 7).
 *
 * Why: a fiscal-year outturn adds up the remaining periods; its interval depends on how the errors of those
 * periods move together, which the paths carry and the per-period intervals do not.
 * Complexity: O(h·paths·log paths). NaN policy: NaN paths are skipped.
 */
export function runningTotalIntervals(paths: Float64Array, h: number, levels: number[]): RunningTotals {
  const count = paths.length / h;
  const totals: Float64Array[] = Array.from({length: h}, () => new Float64Array(count));
  for (let p = 0; p < count; p++) {
    let sum = 0;
    for (let t = 0; t < h; t++) {
      sum += paths[p * h + t];
      totals[t][p] = sum;
    }
  }
  const lower = new Map<number, Float64Array>();
  const upper = new Map<number, Float64Array>();
  for (const level of levels) {
    lower.set(level, new Float64Array(h));
    upper.set(level, new Float64Array(h));
  }
  for (let t = 0; t < h; t++) {
    const sorted = totals[t].filter((v) => !Number.isNaN(v)).sort();
    for (const level of levels) {
      lower.get(level)![t] = quantileSorted(sorted, (1 - level / 100) / 2);
      upper.get(level)![t] = quantileSorted(sorted, (1 + level / 100) / 2);
    }
  }
  return {lower, upper};
}

function quantileSorted(sorted: Float64Array, p: number): number {
  if (sorted.length === 0) return NaN;
  const pos = (sorted.length - 1) * p;
  const lo = Math.floor(pos);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (pos - lo) * (sorted[hi] - sorted[lo]);
}
