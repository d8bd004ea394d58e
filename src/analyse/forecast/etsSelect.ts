import {fitEts, type EtsFit} from './etsFit.js';
import {etsName, type EtsSpec} from './etsModel.js';

/**
 * Automatic ETS: fit every model of the stable subset and keep the one with the smallest AICc.
 * The subset is error A/M × trend N/A/Ad × season N/A/M without additive error with multiplicative season,
 * without multiplicative errors for data that are not all positive, and without seasonal models when
 * m ≤ 1, m > 24 or n ≤ m. Models are tried in a fixed order (errors A, M; trends N, A with damped first;
 * seasons N, A, M) and ties keep the earlier model.
 *
 * Reference: Hyndman et al. (2002), §3 (automatic forecasting with an information criterion); the model
 * subset, order and criterion (AICc) of the reference implementation's defaults.
 *
 * Complexity: up to 15 fits of O(2000·n) each. NaN policy: rejects NaN. Returns null when no model fits.
 */
export interface EtsSelection {
  best: EtsFit;
  /** Every model that could be fitted, in the order tried. */
  fits: EtsFit[];
  /** AICc of every model tried, by name (Infinity when it could not be fitted). */
  candidates: {method: string; aicc: number}[];
}

export function selectEts(
  y: Float64Array,
  {period, seasonal = true}: {period: number; seasonal?: boolean},
): EtsSelection | null {
  let best: EtsFit | null = null;
  const fits: EtsFit[] = [];
  const candidates: {method: string; aicc: number}[] = [];
  for (const spec of etsCandidates(y, {period, seasonal})) {
    const fit = fitEts(y, spec);
    const aicc = fit && Number.isFinite(fit.aicc) ? fit.aicc : Infinity;
    candidates.push({method: etsName(spec), aicc});
    if (fit && Number.isFinite(aicc)) fits.push(fit);
    if (fit && aicc < (best?.aicc ?? Infinity)) best = fit;
  }
  return best ? {best, fits, candidates} : null;
}

/**
 * The models automatic ETS tries, in its fixed order (see {@link selectEts}); without the two damped-trend models
 * with additive season, ETS(A,Ad,A) and ETS(M,Ad,A), when `dampedAdditiveSeason` is false (the pool of `auto`,
 * see methods.ts).
 */
export function etsCandidates(
  y: Float64Array,
  {
    period,
    seasonal = true,
    dampedAdditiveSeason = true,
  }: {period: number; seasonal?: boolean; dampedAdditiveSeason?: boolean},
): EtsSpec[] {
  const n = y.length;
  let positive = true;
  for (const v of y) if (!(v > 0)) positive = false;
  const allowSeason = seasonal && period > 1 && period <= 24 && n > period;
  const seasons: EtsSpec['season'][] = allowSeason ? ['N', 'A', 'M'] : ['N'];
  const specs: EtsSpec[] = [];
  for (const error of ['A', 'M'] as const) {
    if (error === 'M' && !positive) continue;
    for (const trend of ['N', 'A'] as const) {
      for (const season of seasons) {
        for (const damped of [true, false]) {
          if (trend === 'N' && damped) continue;
          if (error === 'A' && season === 'M') continue;
          if (!dampedAdditiveSeason && damped && season === 'A') continue;
          specs.push({error, trend, damped, season, period: season === 'N' ? 1 : period});
        }
      }
    }
  }
  return specs;
}
