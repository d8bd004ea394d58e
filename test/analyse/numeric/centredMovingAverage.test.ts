import {describe, expect, it} from 'vitest';
import {centredMovingAverage} from '../../../src/analyse/numeric/centredMovingAverage.js';

describe('centredMovingAverage', () => {
  it('2×4 average for an even period (R: filter(1:8, c(0.5, 1, 1, 1, 0.5)/4) = NA NA 3 4 5 6 NA NA)', () => {
    const out = Array.from(centredMovingAverage(Float64Array.of(1, 2, 3, 4, 5, 6, 7, 8), 4));
    expect(out.slice(2, 6)).toEqual([3, 4, 5, 6]);
    expect([out[0], out[1], out[6], out[7]].every(Number.isNaN)).toBe(true);
  });
  it('plain centred mean for an odd period', () => {
    const out = centredMovingAverage(Float64Array.of(1, 2, 6, 4, 5), 3);
    [3, 4, 5].forEach((v, i) => expect(out[i + 1]).toBeCloseTo(v, 14));
  });
  it('rejects bad periods and keeps short input all NaN', () => {
    expect(() => centredMovingAverage(Float64Array.of(1, 2), 0)).toThrow(/invalid period/);
    expect(Array.from(centredMovingAverage(Float64Array.of(1, 2), 4)).every(Number.isNaN)).toBe(true);
  });
});
