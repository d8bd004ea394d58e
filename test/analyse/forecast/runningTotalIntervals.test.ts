import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {runningTotalIntervals} from '../../../src/analyse/forecast/runningTotalIntervals.js';

/** R's quantile(x, p, type = 7) (Hyndman & Fan 1996, definition 7) from a full sort, NaN left out. */
function type7(values: number[], p: number): number {
  const sorted = values.filter((v) => !Number.isNaN(v)).sort((a, b) => a - b);
  if (sorted.length === 0) return NaN;
  const pos = (sorted.length - 1) * p;
  const lo = Math.floor(pos);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (pos - lo) * (sorted[hi] - sorted[lo]);
}

describe('runningTotalIntervals', () => {
  it('the bounds are the definition-7 quantiles of the running totals, as from a full sort (ties, NaN)', () => {
    fc.assert(
      fc.property(
        fc.integer({min: 1, max: 6}),
        fc.array(fc.oneof(fc.integer({min: -3, max: 3}), fc.double({min: -100, max: 100}), fc.constant(NaN)), {
          minLength: 1,
          maxLength: 400,
        }),
        (h, raw) => {
          const count = Math.max(1, Math.floor(raw.length / h));
          const paths = Float64Array.from({length: count * h}, (_, i) => raw[i % raw.length]);
          const levels = [50, 80, 95];
          const got = runningTotalIntervals(paths, h, levels);
          for (let t = 0; t < h; t++) {
            const sum = (p: number) => paths.subarray(p * h, p * h + t + 1).reduce((a, b) => a + b, 0);
            const totals = Array.from({length: count}, (_, p) => sum(p));
            for (const level of levels) {
              expect(got.lower.get(level)![t]).toBe(type7(totals, (1 - level / 100) / 2));
              expect(got.upper.get(level)![t]).toBe(type7(totals, (1 + level / 100) / 2));
            }
          }
        },
      ),
      {numRuns: 300, seed: 3},
    );
  });
});
