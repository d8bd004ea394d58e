import {describe, expect, it} from 'vitest';
import {studentTTwoSided} from '../../../src/analyse/numeric/studentT.js';

describe('studentTTwoSided', () => {
  it('matches R 2 * pt(-abs(t), df) (R 4.2.2, run by hand)', () => {
    // R: qt(0.975, 10) = 2.228138851986274; 2 * pt(-1, 5) = 0.3632174676; 2 * pt(-3, 30) = 0.005389964066
    expect(studentTTwoSided(2.228138851986274, 10)).toBeCloseTo(0.05, 12);
    expect(studentTTwoSided(-1, 5)).toBeCloseTo(0.3632174676, 9);
    expect(studentTTwoSided(3, 30)).toBeCloseTo(0.005389964066, 11);
  });
  it('handles edge cases', () => {
    expect(studentTTwoSided(0, 4)).toBe(1);
    expect(studentTTwoSided(Infinity, 4)).toBe(0);
    expect(studentTTwoSided(NaN, 4)).toBeNaN();
    expect(studentTTwoSided(1, 0)).toBeNaN();
  });
});
