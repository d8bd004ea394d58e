import {classicalFigure} from '../decompose/classical.js';
import {seasonalityTest} from './seasonalityTest.js';

/**
 * Classical seasonal adjustment used by the benchmark methods and Theta: when the 90% seasonality test says
 * seasonal (and n ≥ 2m), remove the classical seasonal figure — multiplicatively (divide) for positive data,
 * additively (subtract) otherwise; leave the series alone when it is not seasonal. `restore` puts the
 * seasonal pattern back on forecasts (the last m figures of the sample, repeated).
 *
 * Reference: Makridakis & Hibon (2000) (benchmark deseasonalisation); R's forecast::thetaf (multiplicative case,
 * all factors away from zero). The additive branch for series with zero or negative values is ours.
 * Complexity: O(n·m). NaN policy: rejects NaN.
 */
export interface SeasonalAdjustment {
  seasonal: boolean;
  kind: 'multiplicative' | 'additive' | 'none';
  adjusted: Float64Array;
  /** Seasonal figure for forecast steps 0 … h − 1 (factors, or differences when additive). */
  ahead: (h: number) => Float64Array;
  /** Put the seasonal pattern back on a forecast path (point or interval bound). */
  restore: (path: Float64Array) => Float64Array;
}

export function seasonalAdjustment(values: Float64Array, period: number): SeasonalAdjustment {
  const n = values.length;
  if (!Number.isInteger(period) || period <= 1 || n < 2 * period || !seasonalityTest(values, period)) {
    return noSeasonalAdjustment(values);
  }
  const positive = values.every((v) => v > 0);
  const kind = positive ? 'multiplicative' : 'additive';
  const figure = classicalFigure(values, period, kind);
  if (positive && figure.some((f) => !(Math.abs(f) >= 1e-10))) return noSeasonalAdjustment(values);
  const adjusted = values.map((v, t) => (positive ? v / figure[t % period] : v - figure[t % period]));
  const nextYear = Float64Array.from({length: period}, (_, i) => figure[(n - period + i) % period]);
  return seasonalAdjustmentOf(kind, adjusted, nextYear);
}

/** The adjustment of a series found not seasonal: the series itself, factors of 1. */
export function noSeasonalAdjustment(values: Float64Array): SeasonalAdjustment {
  return {
    seasonal: false,
    kind: 'none',
    adjusted: values,
    ahead: (h) => new Float64Array(h).fill(1),
    restore: (path) => Float64Array.from(path),
  };
}

/**
 * A seasonal adjustment from the adjusted series and the seasonal figure of the next `nextYear.length` periods
 * (factors when multiplicative, differences when additive), repeated for longer horizons.
 */
export function seasonalAdjustmentOf(
  kind: 'multiplicative' | 'additive',
  adjusted: Float64Array,
  nextYear: Float64Array,
): SeasonalAdjustment {
  const ahead = (h: number): Float64Array => Float64Array.from({length: h}, (_, i) => nextYear[i % nextYear.length]);
  const restore = (path: Float64Array): Float64Array => {
    const f = ahead(path.length);
    return path.map((v, i) => (kind === 'multiplicative' ? v * f[i] : v + f[i]));
  };
  return {seasonal: true, kind, adjusted, ahead, restore};
}
