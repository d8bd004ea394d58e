import {describe, expect, it} from 'vitest';
import {fillGaps} from '../../../src/analyse/numeric/fillGaps.js';

describe('fillGaps', () => {
  it('draws straight lines inside and carries the nearest value at the ends', () => {
    const r = fillGaps(Float64Array.of(NaN, 1, NaN, NaN, 4, NaN));
    expect(Array.from(r.values)).toEqual([1, 1, 2, 3, 4, 4]);
    expect(r.filled).toBe(4);
  });

  it('leaves complete, empty and all-NaN input alone and does not change its input', () => {
    const input = Float64Array.of(1, NaN, 3);
    expect(Array.from(fillGaps(input).values)).toEqual([1, 2, 3]);
    expect(Number.isNaN(input[1])).toBe(true);
    expect(fillGaps(new Float64Array(0))).toEqual({values: new Float64Array(0), filled: 0});
    const allMissing = fillGaps(Float64Array.of(NaN, NaN));
    expect(allMissing.filled).toBe(0);
    expect(allMissing.values.every(Number.isNaN)).toBe(true);
  });
});
