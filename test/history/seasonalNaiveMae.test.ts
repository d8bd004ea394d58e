import {describe, expect, it} from 'vitest';
import {readFileSync} from 'node:fs';
import {seasonalNaiveMae} from '../../src/history/seasonalNaiveMae.js';

type Ref = {values: number[]; lag: number; mae: number};
const reference: {UKgas: Ref; AirPassengers: Ref} = JSON.parse(
  readFileSync(new URL('../reference/archive/seasonal-naive-mae.json', import.meta.url), 'utf8'),
);

describe('seasonalNaiveMae', () => {
  it('averages |y[t] − y[t − lag]| (hand-checked)', () => {
    // lag 2: |4 − 1| = 3, |7 − 2| = 5 → 8 / 2 = 4
    expect(seasonalNaiveMae(Float64Array.of(1, 2, 4, 7), 2)).toBe(4);
  });

  it('matches R on the built-in UKgas and AirPassengers series', () => {
    // test/reference/archive/seasonal-naive-mae.json, from R's mean(abs(diff(as.numeric(x), lag = m))) (R 4.2.2).
    for (const ref of [reference.UKgas, reference.AirPassengers]) {
      const got = seasonalNaiveMae(Float64Array.from(ref.values), ref.lag);
      expect(Math.abs(got - ref.mae) / ref.mae).toBeLessThan(1e-12);
    }
  });

  it('skips pairs with a missing value and gives NaN when none is left', () => {
    // pairs (1,4) and (NaN,5) and (3,NaN): only |4 − 1| = 3 counts
    expect(seasonalNaiveMae(Float64Array.of(1, NaN, 3, 4, 5, NaN), 3)).toBe(3);
    expect(seasonalNaiveMae(Float64Array.of(1, 2), 2)).toBeNaN();
    expect(seasonalNaiveMae(new Float64Array(0), 1)).toBeNaN();
    expect(() => seasonalNaiveMae(Float64Array.of(1), 0)).toThrow(/invalid lag/);
  });
});
