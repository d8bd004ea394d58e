import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {classicalDecomposition} from '../../../src/analyse/decompose/classical.js';

interface DecomposeCase {
  name: string;
  call: string;
  frequency: number;
  type: 'additive' | 'multiplicative';
  data: number[];
  trend: (number | null)[];
  seasonal: number[];
  random: (number | null)[];
  figure: number[];
}

// Source: R's stats::decompose on R's built-in datasets (test/reference/stl.R writes decompose.json).
const reference = JSON.parse(readFileSync(new URL('../../reference/decompose.json', import.meta.url), 'utf8')) as {
  r: string;
  cases: DecomposeCase[];
};

function expectClose(actual: Float64Array, expected: (number | null)[]): void {
  expected.forEach((e, i) => {
    if (e === null) expect(actual[i]).toBeNaN();
    else expect(Math.abs(actual[i] - e) / Math.max(Math.abs(e), 1e-3)).toBeLessThan(1e-10);
  });
}

describe('classicalDecomposition against R stats::decompose', () => {
  for (const c of reference.cases) {
    it(c.call, () => {
      const fit = classicalDecomposition(Float64Array.from(c.data), {period: c.frequency, model: c.type});
      expectClose(fit.trend, c.trend);
      expectClose(fit.seasonal, c.seasonal);
      expectClose(fit.irregular, c.random);
      expectClose(fit.figure, c.figure);
    });
  }
  it('rejects short series and NaN', () => {
    expect(() => classicalDecomposition(new Float64Array(7), {period: 4})).toThrow(/two full periods/);
    expect(() => classicalDecomposition(Float64Array.of(1, 2, NaN, 4, 5, 6, 7, 8), {period: 4})).toThrow(/finite/);
  });
});
