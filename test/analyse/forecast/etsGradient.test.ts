import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {etsRecurse} from '../../../src/analyse/forecast/etsFilter.js';
import {etsLikelihoodGradient} from '../../../src/analyse/forecast/etsGradient.js';
import type {EtsParams, EtsSpec} from '../../../src/analyse/forecast/etsModel.js';
import {mulberry32} from '../../../src/analyse/numeric/mulberry32.js';

const SPECS: EtsSpec[] = (['A', 'M'] as const).flatMap((error) =>
  (['N', 'A', 'Ad'] as const).flatMap((trend) =>
    (['N', 'A', 'M'] as const).map((season) => ({
      error,
      trend: trend === 'N' ? 'N' : 'A',
      damped: trend === 'Ad',
      season,
      period: season === 'N' ? 1 : 4,
    })),
  ),
);

/** A positive seasonal series with trend and noise from a seed, and states and parameters near it. */
function case_(seed: number, spec: EtsSpec) {
  const rng = mulberry32(seed);
  const n = 16 + Math.floor(rng() * 30);
  const y = Float64Array.from({length: n}, (_, t) => 100 + 2 * t + 15 * Math.sin((t * Math.PI) / 2) + 5 * rng());
  const m = spec.season === 'N' ? 0 : spec.period;
  const first = spec.trend === 'N' ? 1 : 2;
  const states = new Float64Array(first + m);
  states[0] = 90 + 20 * rng();
  if (first === 2) states[1] = 4 * rng() - 1;
  for (let j = 0; j < m; j++) states[first + j] = spec.season === 'M' ? 0.8 + 0.4 * rng() : 30 * rng() - 15;
  const alpha = 0.05 + 0.9 * rng();
  const params: EtsParams = {alpha, beta: alpha * rng(), gamma: (1 - alpha) * rng(), phi: 0.8 + 0.18 * rng()};
  return {y, states, params};
}

describe('etsLikelihoodGradient', () => {
  it('the criterion is etsRecurse’s, the gradient agrees with central finite differences (every model)', () => {
    fc.assert(
      fc.property(fc.integer({min: 1, max: 1e6}), fc.constantFrom(...SPECS), (seed, spec) => {
        const {y, states, params} = case_(seed, spec);
        const gp = new Float64Array(4);
        const gs = new Float64Array(states.length);
        const lik = etsLikelihoodGradient(y, spec)(params, states, gp, gs);
        expect(lik).toBeCloseTo(etsRecurse(y, spec, params, states).lik, 9);
        const at = (p: EtsParams, s: Float64Array) => etsRecurse(y, spec, p, s).lik;
        const close = (analytic: number, numeric: number) =>
          expect(Math.abs(analytic - numeric)).toBeLessThan(1e-4 * (1 + Math.abs(numeric)));
        const used = {alpha: true, beta: spec.trend !== 'N', gamma: spec.season !== 'N', phi: spec.damped};
        (['alpha', 'beta', 'gamma', 'phi'] as const).forEach((k, i) => {
          if (!used[k]) return expect(gp[i]).toBe(0);
          const h = 1e-6;
          const [up, down] = [{...params, [k]: params[k] + h}, {...params, [k]: params[k] - h}];
          close(gp[i], (at(up, states) - at(down, states)) / (2 * h));
        });
        for (let i = 0; i < states.length; i++) {
          const h = 1e-6 * Math.max(1, Math.abs(states[i]));
          const [up, down] = [Float64Array.from(states), Float64Array.from(states)];
          up[i] += h;
          down[i] -= h;
          close(gs[i], (at(params, up) - at(params, down)) / (2 * h));
        }
      }),
      {numRuns: 200, seed: 20},
    );
  });
});
