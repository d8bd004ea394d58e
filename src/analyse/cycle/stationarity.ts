import {stationaritySummary} from './labels.js';
import type {Stationarity} from './types.js';
import {augmentedDickeyFuller} from './augmentedDickeyFuller.js';
import {kpss} from './kpss.js';
import {varianceRatio} from './varianceRatio.js';

/**
 * Stationarity of a series: in mean by the augmented Dickey-Fuller test (constant, lag by AIC) on the level and
 * on first differences, cross-checked by KPSS; in variance by the split-sample variance ratio of the irregular
 * (or, without one, of the first differences). Decisions at the 5 % level: ADF stationary when p < 0.05 (unit
 * root rejected); KPSS stationary when its statistic is below 0.463 (stationarity not rejected); variance constant
 * when the ratio's p ≥ 0.05.
 *
 * Why: a trend/cycle reading assumes the gap is stationary; a series that is not even stationary after
 * differencing, or whose noise grows, deserves a caution in the review.
 *
 * Reference: see {@link augmentedDickeyFuller}, {@link kpss}, {@link varianceRatio}.
 *
 * Complexity: O(n·maxLag²). NaN policy: rejects NaN in `values` (fill first); skips NaN in `irregular`.
 * Returns `{ok: false, reason}` when ADF or the variance test cannot run (too short, constant); KPSS is left out
 * when it alone cannot run.
 */
export function stationarity(
  values: Float64Array,
  irregular?: Float64Array,
): {ok: true; result: Stationarity} | {ok: false; reason: string} {
  const diff = values.slice(1).map((v, t) => v - values[t]);
  try {
    const level = augmentedDickeyFuller(values);
    const differences = augmentedDickeyFuller(diff);
    const ratio = varianceRatio(irregular ?? diff);
    const result: Stationarity = {
      test: 'augmented Dickey-Fuller, constant, lag by AIC',
      level: {statistic: level.statistic, pValue: level.pValue, stationary: level.pValue < 0.05},
      differences: {
        statistic: differences.statistic,
        pValue: differences.pValue,
        stationary: differences.pValue < 0.05,
      },
      variance: {
        test: `variance ratio of last to first third (${irregular ? 'irregular' : 'first differences'})`,
        statistic: ratio.statistic,
        pValue: ratio.pValue,
        constant: ratio.pValue >= 0.05,
      },
      lags: {level: level.lags, differences: differences.lags},
      kpss: kpssBoth(values, diff),
      summary: '',
    };
    result.summary = stationaritySummary(
      result.level.stationary,
      result.differences.stationary,
      result.variance.constant,
    );
    return {ok: true, result};
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    return {ok: false, reason: error.message};
  }
}

/** KPSS on level and differences, left out when either cannot run (a constant series or differences). */
function kpssBoth(values: Float64Array, diff: Float64Array): Stationarity['kpss'] {
  try {
    const [level, differences] = [kpss(values), kpss(diff)];
    return {
      level: {statistic: level.statistic, pValue: level.pValue, stationary: level.statistic < 0.463},
      differences: {
        statistic: differences.statistic,
        pValue: differences.pValue,
        stationary: differences.statistic < 0.463,
      },
    };
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    return undefined;
  }
}
