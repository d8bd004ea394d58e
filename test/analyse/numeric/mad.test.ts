import {describe, expect, it} from 'vitest';
import {mad} from '../../../src/analyse/numeric/mad.js';

describe('mad', () => {
  it('matches R mad() with the default constant 1.4826', () => {
    // R: mad(c(1, 2, 3, 4, 100)) = 1.4826; mad(c(2, 4, 6, 8)) = 2.9652
    expect(mad(Float64Array.of(1, 2, 3, 4, 100))).toBeCloseTo(1.4826, 12);
    expect(mad(Float64Array.of(2, 4, 6, 8))).toBeCloseTo(2.9652, 12);
  });
  it('skips NaN and gives NaN for no values', () => {
    expect(mad(Float64Array.of(1, NaN, 2, 3, 4, 100))).toBeCloseTo(1.4826, 12);
    expect(mad(new Float64Array(0))).toBeNaN();
  });
});
