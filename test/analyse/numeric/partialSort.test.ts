import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {partialSortInPlace} from '../../../src/analyse/numeric/partialSort.js';

describe('partialSortInPlace', () => {
  it('places exact order statistics for small arrays (insertion-sort path)', () => {
    const a = Float64Array.of(5, 3, 9, 1, 7);
    partialSortInPlace(a, [3, 3]);
    expect(a[2]).toBe(5);
  });
  it('keeps the multiset of values and is exact for a single requested rank (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({min: 0, max: 1e3, noNaN: true}), {minLength: 2, maxLength: 300}), (raw) => {
        const a = Float64Array.from(raw);
        const rank = (raw.length >> 1) + 1;
        partialSortInPlace(a, [rank]);
        expect(Array.from(a).sort((x, y) => x - y)).toEqual(Array.from(raw).sort((x, y) => x - y));
        expect(a[rank - 1]).toBe(Array.from(raw).sort((x, y) => x - y)[rank - 1]);
      }),
      {numRuns: 200, seed: 5},
    );
  });
  it('does nothing for fewer than two values', () => {
    const a = Float64Array.of(4);
    partialSortInPlace(a, [1]);
    expect(a[0]).toBe(4);
  });
});
