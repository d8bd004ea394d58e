import {describe, expect, it} from 'vitest';
import {median} from '../../../src/analyse/numeric/median.js';

describe('median', () => {
  it('matches R median() (odd, even; na.rm = TRUE)', () => {
    expect(median(Float64Array.of(3, 1, 2))).toBe(2);
    expect(median(Float64Array.of(4, 1, 3, 2))).toBe(2.5);
    expect(median(Float64Array.of(3, NaN, 1, 2))).toBe(2);
  });
  it('is NaN for empty or all-NaN input and leaves the input unchanged', () => {
    expect(median(new Float64Array(0))).toBeNaN();
    expect(median(Float64Array.of(NaN))).toBeNaN();
    const x = Float64Array.of(3, 1, 2);
    median(x);
    expect(Array.from(x)).toEqual([3, 1, 2]);
  });
});
