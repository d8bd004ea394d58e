import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {packNumberArrays} from '../../src/analyse/packNumberArrays.js';

describe('packNumberArrays', () => {
  it('keeps every value, NaN and −0 included, and leaves typed arrays and mixed arrays alone', () => {
    const typed = Float64Array.of(1, 2);
    const input = {a: [1.5, NaN, -0, 3], b: {c: [[1, 2], ['x', 2]], typed}, d: null, e: 'text', f: []};
    const out = packNumberArrays(input);
    expect(out).toEqual(input);
    expect(Object.is(out.a[2], -0)).toBe(true);
    expect(out.b.typed).toBe(typed);
    expect(out.a).not.toBe(input.a);
  });

  it('keeps a key named __proto__ as an own property', () => {
    const input = JSON.parse('{"__proto__": [1, 2], "x": 1}');
    const out = packNumberArrays(input);
    expect(Object.keys(out)).toEqual(['__proto__', 'x']);
    expect(Object.getPrototypeOf(out)).toBe(Object.prototype);
  });

  it('returns a structurally equal copy of any JSON-like value (property)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        expect(packNumberArrays(v)).toEqual(v);
      }),
    );
  });
});
