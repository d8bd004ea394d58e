import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {akaikeWeights} from '../../../src/analyse/forecast/akaikeWeights.js';
import {etsSearch, fitEts} from '../../../src/analyse/forecast/etsFit.js';
import {selectEtsScreened} from '../../../src/analyse/forecast/etsScreen.js';
import {etsCandidates, selectEts} from '../../../src/analyse/forecast/etsSelect.js';

// Real data: the seasonal series among R's datasets in test/reference/ets.json (written by test/reference/ets.R).
const ref = JSON.parse(readFileSync(new URL('../../reference/ets.json', import.meta.url), 'utf8'));
const seasonal = (ref.auto as {name: string; frequency: number; values: number[]}[]).filter((c) => c.frequency > 1);

/** Kept models with their weights (1% cut), as the `auto` forecast uses them. */
const weighted = (fits: {method: string; aicc: number; params: object}[]) => {
  const w = akaikeWeights(fits.map((f) => f.aicc), 0.01);
  return fits.flatMap((f, i) => (w[i] > 0 ? [{model: f.method, weight: w[i], params: f.params}] : []));
};

describe('selectEtsScreened', () => {
  for (const c of seasonal) {
    it(`${c.name}: the same models, weights and estimates as fitting every model`, () => {
      const y = Float64Array.from(c.values);
      const all = selectEts(y, {period: c.frequency})!.fits;
      const screened = selectEtsScreened(y, {period: c.frequency});
      expect(weighted(screened)).toEqual(weighted(all));
      // The models it fitted are fitted exactly as selectEts fits them, in the same order.
      for (const f of screened) expect(f).toEqual(all.find((g) => g.method === f.method));
    });
  }

  // `auto` selects with searches of at most 1,000 evaluations from a pool without the damped-trend models with
  // additive season: the screen must give what fitting every model of that pool with that budget gives.
  for (const c of seasonal) {
    it(`${c.name}, auto's pool and searches capped at 1,000 evaluations: the same as fitting every model so`, () => {
      const y = Float64Array.from(c.values);
      const pool = {period: c.frequency, dampedAdditiveSeason: false};
      const all = etsCandidates(y, pool).flatMap((spec) => {
        const fit = fitEts(y, spec, {maxEvaluations: 1000});
        return fit && Number.isFinite(fit.aicc) ? [fit] : [];
      });
      const screened = selectEtsScreened(y, {...pool, maxEvaluations: 1000});
      expect(weighted(screened)).toEqual(weighted(all));
      for (const f of screened) expect(f).toEqual(all.find((g) => g.method === f.method));
    });
  }
});

describe('etsCandidates', () => {
  it("auto's pool: the 15 models of the stable subset less ETS(A,Ad,A) and ETS(M,Ad,A), in the same order", () => {
    const y = Float64Array.from(seasonal[0].values);
    const name = (s: {error: string; trend: string; damped: boolean; season: string}) =>
      `${s.error}${s.trend}${s.damped ? 'd' : ''}${s.season}`;
    const every = etsCandidates(y, {period: 12}).map(name);
    // selectEts' order for positive data: errors A, M; trends N, A (damped first); seasons N, A, M.
    expect(every).toEqual('ANN ANA AAdN AAN AAdA AAA MNN MNA MNM MAdN MAN MAdA MAA MAdM MAM'.split(' '));
    const pool = etsCandidates(y, {period: 12, dampedAdditiveSeason: false}).map(name);
    expect(pool).toEqual(every.filter((m) => m !== 'AAdA' && m !== 'MAdA'));
  });
});

describe('etsSearch', () => {
  it('run in stages, finishes with what fitEts gives', () => {
    const c = seasonal[0];
    const y = Float64Array.from(c.values);
    const spec = {error: 'M', trend: 'A', damped: true, season: 'M', period: c.frequency} as const;
    const search = etsSearch(y, spec)!;
    for (const limit of [250, 500, 1000]) search.run(limit);
    expect(search.aicc()).toBeGreaterThanOrEqual(fitEts(y, spec)!.aicc - 1e-9);
    expect(search.finish()).toEqual(fitEts(y, spec));
    const capped = etsSearch(y, spec, 1000)!;
    capped.run(250);
    expect(capped.finish()).toEqual(fitEts(y, spec, {maxEvaluations: 1000}));
  });
});
