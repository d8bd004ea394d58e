/** Actual against target for one period or span. */
export interface Variance {
  actual: number;
  target: number;
  /** actual − target. */
  difference: number;
  /** 100 · difference / |target| (NaN when the target is 0 or missing). */
  percent: number;
  /** Whether the difference goes the way that is better (`better: higher` → above target); true when on target. */
  favourable: boolean;
  /**
   * The part of the actual figure that the calendar explains (working days, Easter, holidays, as estimated by
   * the seasonal engine): actual minus the actual on an average calendar. 0 when no calendar effect was kept.
   * `difference − calendarPart` is the variance the calendar does not explain.
   */
  calendarPart: number;
}

/**
 * Variance against target from figures already aggregated over the period or span.
 *
 * Why: plans and budgets are read period by period; whether a variance is good depends on the series
 * (`better: lower` for costs). NaN policy: NaN in → NaN out (favourable is then false).
 */
export function variance(actual: number, target: number, calendarPart: number, better: 'higher' | 'lower'): Variance {
  const difference = actual - target;
  const percent = target === 0 ? NaN : (100 * difference) / Math.abs(target);
  const favourable = Number.isNaN(difference) ? false : better === 'higher' ? difference >= 0 : difference <= 0;
  return {actual, target, difference, percent, favourable, calendarPart};
}

/**
 * The calendar part of each period's value: xₜ − xₜ / cₜ for a multiplicative calendar factor cₜ, or cₜ for an
 * additive calendar difference; 0 where no calendar effect was kept (`effect` null).
 * NaN policy: NaN in → NaN out.
 */
export function calendarParts(
  values: Float64Array,
  effect: ArrayLike<number> | null,
  model: 'additive' | 'multiplicative',
): Float64Array {
  if (effect === null) return new Float64Array(values.length);
  return Float64Array.from(values, (x, t) => (model === 'multiplicative' ? x - x / effect[t] : effect[t]));
}

/** Σ values[from … to] (inclusive); NaN when the span leaves the array or any value is missing. */
export function spanSum(values: ArrayLike<number>, from: number, to: number): number {
  if (from < 0 || to >= values.length || to < from) return NaN;
  let s = 0;
  for (let i = from; i <= to; i++) s += values[i];
  return s;
}
