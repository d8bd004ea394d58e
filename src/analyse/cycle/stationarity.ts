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
 * Complexity: O(n·maxLag³). NaN policy: rejects NaN in `values` (fill first); skips NaN in `irregular`.
 * Returns null with a reason when a test cannot run (too short, constant).
 */
export function stationarity(
  values: Float64Array,
  irregular?: Float64Array,
): {ok: true; result: Stationarity} | {ok: false; reason: string} {
  const diff = values.slice(1).map((v, t) => v - values[t]);
  try {
    const level = augmentedDickeyFuller(values);
    const differences = augmentedDickeyFuller(diff);
    const kpssLevel = kpss(values);
    const kpssDifferences = kpss(diff);
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
      kpss: {
        level: {statistic: kpssLevel.statistic, pValue: kpssLevel.pValue, stationary: kpssLevel.statistic < 0.463},
        differences: {
          statistic: kpssDifferences.statistic,
          pValue: kpssDifferences.pValue,
          stationary: kpssDifferences.statistic < 0.463,
        },
      },
      summary: '',
    };
    result.summary = summarise(result);
    return {ok: true, result};
  } catch (error) {
    return {ok: false, reason: error instanceof Error ? error.message : String(error)};
  }
}

function summarise(s: Stationarity): string {
  const mean = s.level.stationary
    ? 'stationary in mean'
    : s.differences.stationary
      ? 'stationary in mean after differencing (it wanders, as a trending series does)'
      : 'not stationary in mean even after differencing';
  const variance = s.variance.constant ? 'stationary in variance' : 'variance changes over time';
  return `${mean}; ${variance}`;
}
