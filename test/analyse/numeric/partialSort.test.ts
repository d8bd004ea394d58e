import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {kernel, kernelHeap, slotAddress} from '../../../src/analyse/numeric/loessKernel.js';

/** The kernel's partial sort (STL's routine psort) on a copy of `values`, for the 1-based `ranks`. */
function partialSort(values: Float64Array, ranks: number[]): Float64Array {
  const n = values.length;
  const heap = kernelHeap(n + ranks.length);
  heap.set(values, 0);
  new Int32Array(heap.buffer, slotAddress(n), ranks.length).set(ranks);
  kernel.partialSort(slotAddress(0), n, slotAddress(n), ranks.length);
  return heap.slice(0, n);
}

describe('partial sort of the compiled kernel', () => {
  it('places exact order statistics for small arrays (insertion-sort path)', () => {
    expect(partialSort(Float64Array.of(5, 3, 9, 1, 7), [3, 3])[2]).toBe(5);
  });
  it('keeps the multiset of values and is exact for a single requested rank (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({min: 0, max: 1e3, noNaN: true}), {minLength: 2, maxLength: 300}), (raw) => {
        const rank = (raw.length >> 1) + 1;
        const a = partialSort(Float64Array.from(raw), [rank]);
        const sorted = Array.from(raw).sort((x, y) => x - y);
        expect(Array.from(a).sort((x, y) => x - y)).toEqual(sorted);
        expect(a[rank - 1]).toBe(sorted[rank - 1]);
      }),
      {numRuns: 200, seed: 5},
    );
  });
  it('does nothing for fewer than two values', () => {
    expect(Array.from(partialSort(Float64Array.of(4), [1]))).toEqual([4]);
  });
});
