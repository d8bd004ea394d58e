import {describe, expect, it} from 'vitest';
import {detectOutliers} from '../../../src/analyse/decompose/outliers.js';
import {mulberry32} from '../../../src/analyse/numeric/mulberry32.js';

// Behaviour checks on constructed series (invented data, exact expectations worked out by construction).
function gaussian(rng: () => number): number {
  return Math.sqrt(-2 * Math.log(1 - rng())) * Math.cos(2 * Math.PI * rng());
}

describe('detectOutliers', () => {
  it('does not flag ordinary movement of a steadily trending series as level shifts', () => {
    const rng = mulberry32(7);
    const adjusted = Float64Array.from({length: 120}, (_, t) => 100 + 2 * t + 0.2 * gaussian(rng));
    const irregular = Float64Array.from(adjusted, (v, t) => v - (100 + 2 * t));
    expect(detectOutliers(irregular, adjusted, 3, 0.1)).toEqual([]);
  });

  it('finds a planted level shift and a planted spike, and nothing else', () => {
    const rng = mulberry32(11);
    const noise = Float64Array.from({length: 96}, () => gaussian(rng));
    const adjusted = Float64Array.from(noise, (e, t) => 100 + 0.5 * t + (t >= 60 ? 20 : 0) + e + (t === 30 ? 15 : 0));
    const irregular = Float64Array.from(noise, (e, t) => e + (t === 30 ? 15 : 0));
    const found = detectOutliers(irregular, adjusted, 3.5, 0.1);
    expect(found.map((o) => [o.index, o.kind])).toEqual([
      [30, 'additive'],
      [60, 'level-shift'],
    ]);
  });

  it('does not flag rounding noise when most of the irregular is exactly zero', () => {
    // A short-window trend hugging rounded data: 80% zeros, the rest ±0.05 (half a rounding step).
    const irregular = Float64Array.from({length: 48}, (_, t) => (t % 5 === 0 ? (t % 10 === 0 ? 0.05 : -0.05) : 0));
    const adjusted = Float64Array.from(irregular, (e) => 40 + e);
    expect(detectOutliers(irregular, adjusted, 3, 1e-3 * 40)).toEqual([]);
  });
});
