import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {loess} from '../../../src/analyse/numeric/loess.js';
import {kernelHeap} from '../../../src/analyse/numeric/loessKernel.js';
// @ts-expect-error: a plain ES module script without type declarations.
import {kernelModuleText} from '../../../src/analyse/numeric/buildWasm.mjs';

describe('compiled LOESS kernel', () => {
  it('is the committed build of loessKernel.wat (run `npm run build:wasm` after editing it)', async () => {
    const committed = readFileSync(new URL('../../../src/analyse/numeric/loessKernelBinary.ts', import.meta.url), 'utf8');
    expect(await kernelModuleText()).toBe(committed);
  });
  it('gives the same fits after its memory grows', () => {
    const y = Float64Array.from({length: 50}, (_, i) => Math.sin(i / 3) + 0.1 * i);
    const before = loess(y, {span: 7, degree: 1, jump: 2});
    const long = Float64Array.from({length: 300_000}, (_, i) => i % 7);
    expect(kernelHeap(4 * long.length).length).toBeGreaterThanOrEqual(4 * long.length);
    expect(loess(long, {span: 7, degree: 0}).length).toBe(long.length);
    expect(Array.from(loess(y, {span: 7, degree: 1, jump: 2}))).toEqual(Array.from(before));
  });
  it('smooths with a bandwidth beyond its kept tables (span 2001 over 40 points) as with a narrow one', () => {
    // A local constant over every point with a bandwidth far wider than the data weighs all points almost alike:
    // tricube weights at distances up to 39 of bandwidth 39 + 980 lie within 0.2% of 1.
    const y = Float64Array.from({length: 40}, (_, i) => (i * 37) % 11);
    const mean = y.reduce((a, b) => a + b) / y.length;
    loess(y, {span: 2001, degree: 0}).forEach((v) => expect(Math.abs(v - mean)).toBeLessThan(0.05));
  });
});
