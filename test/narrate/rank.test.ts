import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {rankOf} from '../../src/narrate/rank.js';

describe('rankOf', () => {
  it('adds severity, size and recency', () => {
    expect(rankOf('info', 0, 0, 12)).toBe(120);
    expect(rankOf('watch', 2, 12, 12)).toBe(200 + 10 + 10);
    expect(rankOf('alert', 40, 100, 12)).toBe(350);
  });

  it('always puts a more severe callout first, whatever its size and age', () => {
    const sev = fc.constantFrom<'info' | 'watch' | 'alert'>('info', 'watch', 'alert');
    const order = {info: 0, watch: 1, alert: 2};
    const size = fc.double({min: 0, max: 1e6, noNaN: true});
    fc.assert(
      fc.property(sev, sev, size, size, fc.nat(500), fc.nat(500), (s1, s2, m1, m2, a1, a2) => {
        if (order[s1] > order[s2]) expect(rankOf(s1, m1, a1, 12)).toBeGreaterThan(rankOf(s2, m2, a2, 12));
      }),
    );
  });

  it('treats NaN magnitudes as zero', () => {
    expect(rankOf('watch', NaN, 0, 4)).toBe(220);
  });
});
