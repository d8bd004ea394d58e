import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {solveSymmetricPentadiagonal} from '../../../src/analyse/numeric/pentadiagonal.js';

/** A·x for the banded matrix, to check the residual of the solve. */
function multiply(d: Float64Array, e: Float64Array, f: Float64Array, x: Float64Array): Float64Array {
  return x.map((_, i) => {
    let s = d[i] * x[i];
    if (i >= 1) s += e[i - 1] * x[i - 1];
    if (i + 1 < x.length) s += e[i] * x[i + 1];
    if (i >= 2) s += f[i - 2] * x[i - 2];
    if (i + 2 < x.length) s += f[i] * x[i + 2];
    return s;
  });
}

describe('solveSymmetricPentadiagonal', () => {
  it('solves the documented 2 × 2 example', () => {
    const none = new Float64Array(0);
    const x = solveSymmetricPentadiagonal(Float64Array.of(2, 2), Float64Array.of(1), none, Float64Array.of(3, 3));
    expect(Array.from(x)).toEqual([1, 1]);
  });

  it('leaves a residual at rounding level for diagonally dominant systems', () => {
    fc.assert(
      fc.property(fc.integer({min: 1, max: 60}), fc.integer({min: 0, max: 1000}), (n, seed) => {
        let s = seed;
        const rand = (): number => ((s = (s * 1103515245 + 12345) % 2147483648) / 2147483648) * 2 - 1;
        const e = Float64Array.from({length: Math.max(0, n - 1)}, rand);
        const f = Float64Array.from({length: Math.max(0, n - 2)}, rand);
        const d = Float64Array.from({length: n}, () => 5 + Math.abs(rand()));
        const b = Float64Array.from({length: n}, rand);
        const x = solveSymmetricPentadiagonal(d, e, f, b);
        const r = multiply(d, e, f, x);
        for (let i = 0; i < n; i++) expect(Math.abs(r[i] - b[i])).toBeLessThan(1e-12);
      }),
    );
  });

  it('rejects bands of the wrong length by message', () => {
    const three = new Float64Array(3);
    const one = new Float64Array(1);
    expect(() => solveSymmetricPentadiagonal(three, one, one, three)).toThrow(/band lengths/);
  });
});
