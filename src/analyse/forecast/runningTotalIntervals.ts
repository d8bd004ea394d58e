import type {RunningTotals} from './model.js';

/**
 * Intervals for running totals T_k = y_{n+1} + … + y_{n+k} (k = 1 … h) from simulated sample paths: the
 * (1 − level)/2 and (1 + level)/2 sample quantiles of T_k across paths, by linear interpolation between order
 * statistics (Hyndman & Fan 1996, definition 7).
 *
 * Why: a fiscal-year outturn adds up the remaining periods; its interval depends on how the errors of those
 * periods move together, which the paths carry and the per-period intervals do not.
 * Complexity: O(h·paths·levels). NaN policy: NaN paths are skipped.
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
  const probabilities = levels.flatMap((level) => [(1 - level / 100) / 2, (1 + level / 100) / 2]);
  for (let t = 0; t < h; t++) {
    const values = totals[t].filter((v) => !Number.isNaN(v));
    const q = quantiles(values, probabilities);
    levels.forEach((level, i) => {
      lower.get(level)![t] = q[2 * i];
      upper.get(level)![t] = q[2 * i + 1];
    });
  }
  return {lower, upper};
}

/**
 * Definition-7 sample quantiles of `values` (reordered in place) at the probabilities `ps`: the order statistics
 * they need are found by selection (Hoare's FIND, smallest needed rank first, each search confined to the part
 * above the rank before), the same numbers a full sort would give at O(n) per rank instead of O(n log n).
 */
function quantiles(values: Float64Array, ps: number[]): number[] {
  const n = values.length;
  if (n === 0) return ps.map(() => NaN);
  const positions = ps.map((p) => (n - 1) * p);
  const ranks = [...new Set(positions.flatMap((pos) => [Math.floor(pos), Math.min(Math.floor(pos) + 1, n - 1)]))];
  ranks.sort((a, b) => a - b);
  let from = 0;
  for (const k of ranks) {
    select(values, k, from, n - 1);
    from = k + 1;
  }
  return positions.map((pos) => {
    const lo = Math.floor(pos);
    const hi = Math.min(lo + 1, n - 1);
    return values[lo] + (pos - lo) * (values[hi] - values[lo]);
  });
}

/** Puts the k-th smallest of a[left … right] at index k, smaller ones before it and larger ones after it. */
function select(a: Float64Array, k: number, left: number, right: number): void {
  while (right > left) {
    const pivot = a[(left + right) >> 1];
    let i = left;
    let j = right;
    while (i <= j) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i <= j) {
        const swap = a[i];
        a[i] = a[j];
        a[j] = swap;
        i++;
        j--;
      }
    }
    if (k <= j) right = j;
    else if (k >= i) left = i;
    else return;
  }
}
