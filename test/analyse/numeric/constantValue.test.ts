import {describe, expect, it} from 'vitest';
import {constantValue} from '../../../src/analyse/numeric/constantValue.js';

describe('constantValue', () => {
  it('gives the shared value of the known values', () => {
    expect(constantValue(Float64Array.of(5, NaN, 5, 5))).toBe(5);
  });
  it('is null when two known values differ', () => {
    expect(constantValue(Float64Array.of(5, 5, 5.000001))).toBeNull();
  });
  it('asks for at least `minimum` known values (default 1)', () => {
    expect(constantValue(Float64Array.of(NaN, 7))).toBe(7);
    expect(constantValue(Float64Array.of(NaN, 7), 2)).toBeNull();
    expect(constantValue(new Float64Array(0))).toBeNull();
    expect(constantValue(Float64Array.of(NaN, NaN))).toBeNull();
  });
  it('leaves the input unchanged', () => {
    const values = Float64Array.of(1, NaN, 1);
    constantValue(values);
    expect(Array.from(values)).toEqual([1, NaN, 1]);
  });
});
