/**
 * The building blocks shared by the Bry-Boschan and Harding-Pagan dating rules: local extremes in a window,
 * alternation of peaks and troughs, end censoring, the end-value rule and minimum phase/cycle durations.
 *
 * Why: both published rules are the same sequence of censoring steps with different windows and durations;
 * keeping each step here lets {@link bryBoschan} and {@link hardingPagan} read as their papers' recipes.
 *
 * Reference: G. Bry and C. Boschan (1971), Cyclical Analysis of Time Series: Selected Procedures and Computer
 * Programs, NBER Technical Paper 20, ch. 2; D. Harding and A. Pagan (2002), Dissecting the cycle: a
 * methodological investigation, Journal of Monetary Economics 49:365–381.
 *
 * Complexity: each step is O(n·w) or O(m²) for m turns. NaN policy: NaN values are never turning points and are
 * ignored as neighbours. Every function returns a new array of turns sorted by index.
 */
export interface Turn {
  index: number;
  type: 'peak' | 'trough';
}

/**
 * Points that are the highest (peak) or lowest (trough) within ±`window` of themselves. Near the ends the
 * window is cut short, but a point needs at least one neighbour on each side. Ties go to the earliest point.
 */
export function localExtremes(x: Float64Array, window: number): Turn[] {
  const n = x.length;
  const turns: Turn[] = [];
  for (let t = 1; t < n - 1; t++) {
    const v = x[t];
    if (Number.isNaN(v)) continue;
    let peak = true;
    let trough = true;
    let left = 0;
    let right = 0;
    for (let s = Math.max(0, t - window); s <= Math.min(n - 1, t + window); s++) {
      const u = x[s];
      if (s === t || Number.isNaN(u)) continue;
      if (s < t) left++;
      else right++;
      if (s < t ? u >= v : u > v) peak = false;
      if (s < t ? u <= v : u < v) trough = false;
    }
    if (left === 0 || right === 0) continue;
    if (peak) turns.push({index: t, type: 'peak'});
    else if (trough) turns.push({index: t, type: 'trough'});
  }
  return turns;
}

/** Runs of peaks (troughs) with no trough (peak) between them keep only the highest (lowest); ties keep the first. */
export function alternate(turns: Turn[], x: Float64Array): Turn[] {
  const out: Turn[] = [];
  for (const turn of [...turns].sort((p, q) => p.index - q.index)) {
    const last = out[out.length - 1];
    if (last && last.index === turn.index) continue;
    if (last && last.type === turn.type) {
      const better = turn.type === 'peak' ? x[turn.index] > x[last.index] : x[turn.index] < x[last.index];
      if (better) out[out.length - 1] = turn;
    } else out.push(turn);
  }
  return out;
}

/** Drop turns within `periods` of either end (index < periods or index > n − 1 − periods). */
export function censorEnds(turns: Turn[], n: number, periods: number): Turn[] {
  return turns.filter((t) => t.index >= periods && t.index <= n - 1 - periods);
}

/**
 * The end-value rule: the first (last) peak must be higher than every value before (after) it, and the first
 * (last) trough lower, otherwise it is dropped. Applied until the first and last turns pass.
 */
export function endValueRule(turns: Turn[], x: Float64Array): Turn[] {
  const out = [...turns];
  const beats = (turn: Turn, from: number, to: number): boolean => {
    for (let s = from; s <= to; s++) {
      if (s === turn.index || Number.isNaN(x[s])) continue;
      if (turn.type === 'peak' ? x[s] > x[turn.index] : x[s] < x[turn.index]) return false;
    }
    return true;
  };
  while (out.length > 0 && !beats(out[0], 0, out[0].index)) out.shift();
  while (out.length > 0 && !beats(out[out.length - 1], out[out.length - 1].index, x.length - 1)) out.pop();
  return out;
}

/**
 * Minimum phase (turn to next turn) and minimum cycle (peak to peak, trough to trough) durations, in periods.
 * The offending phase with the smallest rise or fall goes first: an inner phase loses both its turns (which keeps
 * alternation), a phase at either end loses only its outer turn. For a short cycle, the smaller of its two
 * phases is removed the same way. Repeated until every phase and cycle is long enough.
 */
export function enforceDurations(
  turns: Turn[],
  x: Float64Array,
  {minPhase, minCycle}: {minPhase: number; minCycle: number},
): Turn[] {
  let out = alternate(turns, x);
  const swing = (i: number): number => Math.abs(x[out[i + 1].index] - x[out[i].index]);
  const removePhase = (i: number): void => {
    if (i === 0) out.splice(0, 1);
    else if (i + 1 === out.length - 1) out.splice(i + 1, 1);
    else out.splice(i, 2);
    out = alternate(out, x);
  };
  for (;;) {
    let worst = -1;
    for (let i = 0; i + 1 < out.length; i++) {
      if (out[i + 1].index - out[i].index < minPhase && (worst < 0 || swing(i) < swing(worst))) worst = i;
    }
    if (worst >= 0) {
      removePhase(worst);
      continue;
    }
    let cycle = -1;
    for (let i = 0; i + 2 < out.length; i++) {
      if (out[i + 2].index - out[i].index >= minCycle) continue;
      const phase = swing(i) <= swing(i + 1) ? i : i + 1;
      if (cycle < 0 || swing(phase) < swing(cycle)) cycle = phase;
    }
    if (cycle < 0) return out;
    removePhase(cycle);
  }
}

/**
 * Move each turn to the highest (peak) or lowest (trough) value of `curve` within ±`radius`, then restore
 * alternation. A turn whose neighbourhood is all NaN stays where it is.
 */
export function relocate(turns: Turn[], curve: Float64Array, radius: number): Turn[] {
  const moved = turns.map((turn) => {
    let best = -1;
    for (let s = Math.max(0, turn.index - radius); s <= Math.min(curve.length - 1, turn.index + radius); s++) {
      const v = curve[s];
      if (Number.isNaN(v)) continue;
      if (best < 0 || (turn.type === 'peak' ? v > curve[best] : v < curve[best])) best = s;
    }
    return {index: best < 0 ? turn.index : best, type: turn.type};
  });
  return alternate(moved, curve);
}
