import {describe, expect, it} from 'vitest';
import {movingAverage} from '../../../src/analyse/numeric/movingAverage.js';

describe('movingAverage', () => {
  it('averages trailing windows (R: stats::filter(1:6, rep(1/3, 3), sides = 1)[3:6] = 2 3 4 5)', () => {
    expect(Array.from(movingAverage(Float64Array.of(1, 2, 3, 4, 5, 6), 3))).toEqual([2, 3, 4, 5]);
  });
  it('handles short input and rejects bad windows', () => {
    expect(movingAverage(Float64Array.of(1), 3).length).toBe(0);
    expect(() => movingAverage(Float64Array.of(1), 0)).toThrow(/invalid window/);
  });
  it('spreads NaN to the windows that hold it', () => {
    expect(Array.from(movingAverage(Float64Array.of(1, NaN, 3, 4), 2)).map(Number.isNaN)).toEqual([true, true, true]);
  });
});
