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
 * How far a search's end may lie below the AICc of the quick gradient fit of the same model (projected BFGS,
 * etsFit.ts), which mostly ends lower but can stop in another local optimum. Measured on the 1,200 fits of 80 M3
 * monthly series (15 models each): the gradient fit ended higher in 39 fits, by at most 11.5 (it ended lower in
 * 1,004, median 2.5 lower), on 15 other series once by 390 (a far-off local optimum, which the rule below catches:
 * it lay above the search so far); 30 leaves room. An empirical rule, like the margins above.
 */
const GRADIENT_MARGIN = 30;
const GRADIENT = {optimizer: 'gradient'} as const;

/**
 * The fits of automatic ETS (the models and order of selectEts) for Akaike weighting, screened: the
 * non-seasonal models, quick to fit, are fitted first; the seasonal models' searches then run in stages, the
 * most promising (lowest AICc so far) first, and a search is given up at a checkpoint when its AICc so far, less
 * the checkpoint's margin, is still more than 2·ln 100 ≈ 9.21 above the best AICc known (of a finished fit, or
 * of a search so far, which its end can only lower). Such a model would end with a weight under 1% (the cut of
 * akaikeWeights), so it is not needed; every model kept is fitted exactly as selectEts fits it (a search's path
 * does not depend on its stages). The fits come back in selectEts' order, without the models given up.
 *
 * A quick fit of each seasonal model by projected BFGS on the likelihood's gradient (about 40 evaluations, see
 * etsFit.ts) orders the searches and shortens them: the model with the lowest quick AICc is fitted first and to
 * the end, and a search is also given up when the quick fit's AICc, less GRADIENT_MARGIN, is more than the cut
 * above the best known, provided the quick fit is at or below the search's own AICc so far (otherwise it stopped
 * in a poor local optimum and is not believed).
 *
 * Why: a seasonal model's search takes 1,500–2,000 likelihood evaluations (against 150–500 for non-seasonal
 * ones) and most seasonal models end far outside the weights. The searches themselves stay: their results are
 * what the M3 figures of `auto` were measured with (the gradient fits' better likelihoods gave worse forecasts
 * there, monthly sMAPE 13.57 against 13.48, when they replaced the searches).
 * Reference: Burnham & Anderson (2002) for the weights; the margins are measured, see above.
 *
 * Complexity: at most the cost of selectEts. NaN policy: rejects NaN. Empty when no model fits.
 */
export function selectEtsScreened(
  y: Float64Array,
  {period, seasonal = true}: {period: number; seasonal?: boolean},
): EtsFit[] {
  const specs = etsCandidates(y, {period, seasonal});
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
    if (spec.season === 'N') keep(i, fitEts(y, spec));
  });
  // The quick gradient fit's AICc of each seasonal model, and the seasonal models from the most promising on.
  const quick = specs.map((spec) => (spec.season === 'N' ? Infinity : (fitEts(y, spec, GRADIENT)?.aicc ?? Infinity)));
  // A quick fit above the search's own AICc so far stopped in a poor local optimum and says nothing.
  const hopeless = (a: {i: number; search: EtsSearch}, known: number): boolean =>
    quick[a.i] <= a.search.aicc() && quick[a.i] - GRADIENT_MARGIN > known + CUT;
  const order = specs.flatMap((spec, i) => (spec.season === 'N' ? [] : [i])).sort((a, b) => quick[a] - quick[b]);
  order.forEach((i, rank) => {
    const spec = specs[i];
    if (rank === 0 && Number.isFinite(quick[i])) return keep(i, fitEts(y, spec));
    const search = etsSearch(y, spec);
    if (!search) return;
    search.run(CHECKPOINTS[0]);
    if (search.stopped) keep(i, search.finish());
    else active.push({i, search, stage: 0});
  });
  while (active.length > 0) {
    const known = Math.min(best, ...active.map((a) => a.search.aicc()));
    for (let j = active.length - 1; j >= 0; j--) {
      const a = active[j];
      if (a.search.aicc() - MARGINS[a.stage] > known + CUT || hopeless(a, known)) active.splice(j, 1);
    }
    if (active.length === 0) break;
    let next = 0;
    for (let j = 1; j < active.length; j++) if (active[j].search.aicc() < active[next].search.aicc()) next = j;
    const a = active[next];
    a.stage++;
    if (a.stage < CHECKPOINTS.length) a.search.run(CHECKPOINTS[a.stage]);
    if (a.stage >= CHECKPOINTS.length || a.search.stopped) {
      keep(a.i, a.search.finish());
      active.splice(next, 1);
    }
  }
  return fits.filter((f): f is EtsFit => f !== null);
}
