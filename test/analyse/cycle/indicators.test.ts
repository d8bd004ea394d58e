import {describe, expect, it} from 'vitest';
import {amplitudeRatio} from '../../../src/analyse/cycle/amplitude.js';
import {gapPercent} from '../../../src/analyse/cycle/gap.js';
import {gapPhase} from '../../../src/analyse/cycle/phase.js';

describe('gapPercent', () => {
  it('is the percent deviation from trend for positive series', () => {
    const r = gapPercent(Float64Array.of(110, 90, NaN), Float64Array.of(100, 100, 100));
    expect(r.scale).toBe('trend');
    expect(Array.from(r.gap.subarray(0, 2))).toEqual([10, -10]);
    expect(r.gap[2]).toBeNaN();
  });

  it('scales by the mean absolute value when the series reaches zero or below', () => {
    const r = gapPercent(Float64Array.of(-2, 2, 6), Float64Array.of(0, 2, 4));
    expect(r.scale).toBe('mean-absolute');
    expect(Array.from(r.gap)).toEqual([-100 * (2 / (10 / 3)), 0, 100 * (2 / (10 / 3))]);
    expect(r.meanAbsolute).toBeCloseTo(10 / 3, 14);
    expect(Array.from(gapPercent(new Float64Array(3), new Float64Array(3)).gap)).toEqual([0, 0, 0]);
  });
});

describe('gapPhase', () => {
  it('combines the sign of the gap with its direction over the span', () => {
    const up = gapPhase(Float64Array.of(-2, -1, 1, 2), 1);
    expect(up).toEqual({direction: 'rising', phase: 'rising-above', moving: true});
    expect(gapPhase(Float64Array.of(3, 2, 1), 1)).toEqual({direction: 'falling', phase: 'falling-above', moving: true});
    expect(gapPhase(Float64Array.of(0, -1, -2), 2).phase).toBe('falling-below');
    expect(gapPhase(Float64Array.of(-5, -3, -2), 1).phase).toBe('rising-below');
  });

  it('looks further back when the latest move is flat, and says when the gap never moves', () => {
    expect(gapPhase(Float64Array.of(1, 2, 2), 1)).toEqual({direction: 'flat', phase: 'rising-above', moving: true});
    expect(gapPhase(Float64Array.of(0, 0, 0), 1)).toEqual({direction: 'flat', phase: 'falling-above', moving: false});
  });
});

describe('amplitudeRatio', () => {
  it('compares the swing since the last turn with the mean past swing', () => {
    const gap = Float64Array.of(0, 4, 0, 2);
    expect(amplitudeRatio(gap, [{index: 1, type: 'peak'}, {index: 2, type: 'trough'}])).toBe(0.5);
    expect(amplitudeRatio(gap, [{index: 1, type: 'peak'}])).toBeNull();
  });
});
