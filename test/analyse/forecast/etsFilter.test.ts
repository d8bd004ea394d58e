import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {etsFilter} from '../../../src/analyse/forecast/etsFilter.js';
import {completeStates, type EtsSpec} from '../../../src/analyse/forecast/etsModel.js';

// Fixtures: test/reference/ets.json, written by test/reference/ets.R (R's forecast::ets and stats::HoltWinters on
// R's built-in datasets; versions inside the JSON).
const ref = JSON.parse(readFileSync(new URL('../../reference/ets.json', import.meta.url), 'utf8'));

interface Case {
  name: string;
  call: string;
  frequency: number;
  values: number[];
  components: string[];
  par: Record<string, number>;
  initstate: number[];
  lik: number;
  fitted: number[];
}

export function specOf(c: Case): EtsSpec {
  const [error, trend, season, damped] = c.components;
  return {
    error: error as 'A' | 'M',
    trend: trend as 'N' | 'A',
    season: season as 'N' | 'A' | 'M',
    damped: damped === 'TRUE',
    period: season === 'N' ? 1 : c.frequency,
  };
}

function relErr(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(1, Math.abs(b));
}

describe('etsFilter against forecast::ets with the fitted parameters and initial states', () => {
  for (const c of [...ref.fixed, ...ref.auto] as Case[]) {
    it(`${c.name} ${c.components.join('')}: likelihood and fitted values within 1e-6`, () => {
      const spec = specOf(c);
      const params = {alpha: c.par.alpha, beta: c.par.beta ?? 0, gamma: c.par.gamma ?? 0, phi: c.par.phi ?? 1};
      // initstate holds l, b?, s1 … sm (R's full state vector at time 0; a bare number when it is only l).
      const states = Float64Array.from(([] as number[]).concat(c.initstate));
      const run = etsFilter(Float64Array.from(c.values), spec, params, states);
      expect(relErr(run.lik, c.lik)).toBeLessThan(1e-6);
      let worst = 0;
      c.fitted.forEach((f, i) => (worst = Math.max(worst, relErr(run.fitted[i], f))));
      expect(worst).toBeLessThan(1e-6);
    });
  }
});

describe('ETS(A,A,A) recursions equal stats::HoltWinters for given smoothing parameters', () => {
  for (const c of ref.holtWinters) {
    it(`${c.name}: ${c.call}`, () => {
      // HoltWinters' β* and γ* relate to ETS's by β = αβ*, γ = (1 − α)γ* (Hyndman et al. 2008, §2.5).
      const m = c.frequency;
      const spec: EtsSpec = {error: 'A', trend: 'A', damped: false, season: 'A', period: m};
      const params = {alpha: c.alpha, beta: c.alpha * c.beta, gamma: (1 - c.alpha) * c.gamma, phi: 1};
      // HoltWinters fits from observation m + 1 with the first-cycle seasonal figures as s_{t−m}.
      const states = Float64Array.from([c.lStart, c.bStart, ...[...c.sStart].reverse()]);
      const y = Float64Array.from(c.values.slice(c.startTime - 1));
      const run = etsFilter(y, spec, params, states);
      let sse = 0;
      for (const e of run.residuals) sse += e * e;
      expect(relErr(sse, c.SSE)).toBeLessThan(1e-9);
      run.fitted.forEach((f, i) => expect(relErr(f, c.xhat[i])).toBeLessThan(1e-9));
      // coefficients: a, b, s1 … sm where s1 is the seasonal state for the next period (oldest in ETS order).
      expect(relErr(run.finalStates[0], c.coefficients[0])).toBeLessThan(1e-9);
      expect(relErr(run.finalStates[1], c.coefficients[1])).toBeLessThan(1e-9);
      for (let j = 0; j < m; j++) {
        expect(relErr(run.finalStates[2 + j], c.coefficients[2 + m - 1 - j])).toBeLessThan(1e-9);
      }
    });
  }
});

describe('completeStates', () => {
  it('adds the implied last seasonal state (sum m for multiplicative, 0 for additive)', () => {
    const spec: EtsSpec = {error: 'M', trend: 'N', damped: false, season: 'M', period: 4};
    expect([...completeStates(spec, [10, 1.1, 0.9, 1.2])]).toEqual([10, 1.1, 0.9, 1.2, 4 - 3.2]);
    expect([...completeStates({...spec, season: 'A'}, [10, 1, 2, 3])]).toEqual([10, 1, 2, 3, -6]);
  });
});
