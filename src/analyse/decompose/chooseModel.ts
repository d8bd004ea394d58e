import {centredMovingAverage} from '../numeric/centredMovingAverage.js';

/** Outcome of {@link chooseModel}: the model and one plain sentence saying why. */
export interface ModelChoice {
  model: 'additive' | 'multiplicative';
  reason: string;
}

/** Smallest ratio of highest to lowest yearly level for the `auto` rule to judge the seasonal amplitude. */
const MIN_LEVEL_RATIO = 1.1;
/** Elasticity of the yearly range to the yearly level above which the seasonal is taken as proportional. */
const MIN_ELASTICITY = 0.5;

/**
 * Choose between additive and multiplicative decomposition.
 *
 * - `additive` / `multiplicative` as asked, except that a multiplicative model needs strictly positive data:
 *   with zeros or negatives it falls back to additive and says so.
 * - `auto` (our rule, documented here): split the series into consecutive years of `period` observations from
 *   the start; for each year fully covered by the centred moving average m (one cycle, as in classical
 *   decomposition) take the mean of m (level) and the range max − min of values − m (seasonal swing). When all
 *   values are positive, the highest yearly level is at least 10% above the lowest, and the least-squares slope
 *   of log(range) on log(level) — the elasticity of the seasonal swing to the level — exceeds 0.5, the swing
 *   grows with the level and the model is multiplicative; otherwise additive.
 *
 * Why: a multiplicative series decomposed additively leaves seasonality in the adjusted series at high
 * levels (and vice versa); the log-log slope is 1 for a proportional swing and 0 for a constant one.
 *
 * Complexity: O(n · period). NaN policy: skips NaN (a year with a NaN, or at the ends, is not used).
 */
export function chooseModel(
  values: Float64Array,
  period: number,
  requested: 'additive' | 'multiplicative' | 'auto',
): ModelChoice {
  let positive = true;
  for (const v of values) if (v <= 0) positive = false;
  if (requested === 'additive') return {model: 'additive', reason: 'Additive model, as set in the pack.'};
  if (requested === 'multiplicative') {
    return positive
      ? {model: 'multiplicative', reason: 'Multiplicative model, as set in the pack.'}
      : {
          model: 'additive',
          reason: 'Additive model: the pack asks for multiplicative, but the series has zero or negative values.',
        };
  }
  if (!positive) return {model: 'additive', reason: 'Additive model: the series has zero or negative values.'};
  const logLevel: number[] = [];
  const logRange: number[] = [];
  const years = Math.floor(values.length / period);
  const level = centredMovingAverage(values, period);
  for (let y = 0; y < years; y++) {
    let sum = 0;
    let min = Infinity;
    let max = -Infinity;
    for (let i = y * period; i < (y + 1) * period; i++) {
      sum += level[i];
      min = Math.min(min, values[i] - level[i]);
      max = Math.max(max, values[i] - level[i]);
    }
    if (Number.isNaN(sum) || max <= min) continue;
    logLevel.push(Math.log(sum / period));
    logRange.push(Math.log(max - min));
  }
  if (logLevel.length < 3 || Math.max(...logLevel) - Math.min(...logLevel) < Math.log(MIN_LEVEL_RATIO)) {
    return {
      model: 'additive',
      reason: 'Additive model: the level changes too little between years to tell whether the seasonal swing grows with it.',
    };
  }
  const slope = olsSlope(logLevel, logRange);
  const elasticity = slope.toFixed(2);
  return slope > MIN_ELASTICITY
    ? {
        model: 'multiplicative',
        reason: `Multiplicative model: the seasonal swing grows with the level (elasticity ${elasticity} > ${MIN_ELASTICITY}).`,
      }
    : {
        model: 'additive',
        reason: `Additive model: the seasonal swing does not grow with the level (elasticity ${elasticity} ≤ ${MIN_ELASTICITY}).`,
      };
}

function olsSlope(x: number[], y: number[]): number {
  const n = x.length;
  const mx = x.reduce((a, b) => a + b, 0) / n;
  const my = y.reduce((a, b) => a + b, 0) / n;
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < n; i++) {
    sxy += (x[i] - mx) * (y[i] - my);
    sxx += (x[i] - mx) * (x[i] - mx);
  }
  return sxy / sxx;
}
