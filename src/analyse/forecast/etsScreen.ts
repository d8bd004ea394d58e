import {etsSearch, fitEts, type EtsFit, type EtsSearch} from './etsFit.js';
import {etsCandidates} from './etsSelect.js';

/** AICc distance beyond which a model's Akaike weight is below 1%: exp(−Δ/2) < 0.01 ⇔ Δ > 2·ln 100. */
const CUT = 2 * Math.log(100);
/**
 * Evaluations after which a search may be given up, and how much its AICc may still fall from there (its
 * margin). Measured on the seasonal fits of 100 M3 monthly series and 60 series of the scale benchmark
 * (test/bench/scale.ts data): the largest fall from 250, 500, 750, 1000 and 1500 evaluations to the end of
 * the search was 284 / 126 / 100 / 82 / 36 (M3) and 113 / 64 / 58 / 51 / 30 (scale); the 99th percentiles
 * 187 / 67 / 38 / 22 / 8 (M3). The margins are those falls with room to spare: an empirical rule, not a bound.
 * With them the screened selection kept the same models with the same weights as the full one on 159 M3 monthly
 * series, 60 scale-benchmark series and the seasonal series of test/reference/ets.json (etsScreen.test.ts), and
 * the M3 figures of `auto` did not move (npm run bench:m3).
 */
const CHECKPOINTS = [250, 500, 750, 1000, 1500];
const MARGINS = [350, 180, 120, 100, 50];

/**
 * The fits of automatic ETS (the models and order of selectEts, or the pool of `dampedAdditiveSeason`, see
 * etsCandidates) for Akaike weighting, screened: the non-seasonal models, quick to fit, are fitted first; the
 * seasonal models' searches then run in stages, the most promising (lowest AICc so far) first, and a search is
 * given up at a checkpoint when its AICc so far, less the checkpoint's margin, is still more than
 * 2·ln 100 ≈ 9.21 above the best AICc known (of a finished fit, or of a search so far, which its end can only
 * lower). Such a model would end with a weight under 1% (the cut of akaikeWeights), so it is not needed; every
 * model kept is fitted exactly as selectEts fits it (a search's path does not depend on its stages). The fits come back in selectEts' order, without the models given up. With
 * `maxEvaluations` below 2,000 every fit and search stops there (the margins, measured to 2,000, then have room
 * to spare), and the screen keeps what fitting every model with that budget keeps (etsScreen.test.ts).
 *
 * Why: a seasonal model's search takes 1,500–2,000 likelihood evaluations (against 150–500 for non-seasonal
 * ones) and most seasonal models end far outside the weights.
 * Reference: Burnham & Anderson (2002) for the weights; the margins are measured, see above.
 *
 * Complexity: at most the cost of selectEts. NaN policy: rejects NaN. Empty when no model fits.
 */
export function selectEtsScreened(
  y: Float64Array,
  {
    period,
    seasonal = true,
    maxEvaluations = 2000,
    dampedAdditiveSeason = true,
  }: {period: number; seasonal?: boolean; maxEvaluations?: number; dampedAdditiveSeason?: boolean},
): EtsFit[] {
  const specs = etsCandidates(y, {period, seasonal, dampedAdditiveSeason});
  const fits: (EtsFit | null)[] = specs.map(() => null);
  let best = Infinity;
  const keep = (i: number, fit: EtsFit | null): void => {
    if (fit && Number.isFinite(fit.aicc)) {
      fits[i] = fit;
      best = Math.min(best, fit.aicc);
    }
  };
  const active: {i: number; search: EtsSearch; stage: number}[] = [];
  specs.forEach((spec, i) => {
    if (spec.season === 'N') keep(i, fitEts(y, spec, {maxEvaluations}));
  });
  specs.forEach((spec, i) => {
    if (spec.season === 'N') return;
    const search = etsSearch(y, spec, maxEvaluations);
    if (!search) return;
    search.run(CHECKPOINTS[0]);
    if (search.stopped) keep(i, search.finish());
    else active.push({i, search, stage: 0});
  });
  while (active.length > 0) {
    const known = Math.min(best, ...active.map((a) => a.search.aicc()));
    for (let j = active.length - 1; j >= 0; j--) {
      const a = active[j];
      if (a.search.aicc() - MARGINS[a.stage] > known + CUT) active.splice(j, 1);
    }
    if (active.length === 0) break;
    let next = 0;
    for (let j = 1; j < active.length; j++) if (active[j].search.aicc() < active[next].search.aicc()) next = j;
    const a = active[next];
    a.stage++;
    const last = a.stage >= CHECKPOINTS.length || CHECKPOINTS[a.stage] >= maxEvaluations;
    if (!last) a.search.run(CHECKPOINTS[a.stage]);
    if (last || a.search.stopped) {
      keep(a.i, a.search.finish());
      active.splice(next, 1);
    }
  }
  return fits.filter((f): f is EtsFit => f !== null);
}
