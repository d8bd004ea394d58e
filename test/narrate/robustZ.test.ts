import {describe, expect, it} from 'vitest';
import {robustZ} from '../../src/narrate/robustZ.js';

describe('robustZ', () => {
  it('matches R: (10 - median(x)) / mad(x) for x = c(3, 1, 4, 1, 5, 9, 2, 6, NA)', () => {
    // Confirmed in R 4.2.2: x <- c(3, 1, 4, 1, 5, 9, 2, 6, NA); (10 - median(x, na.rm = TRUE)) / mad(x, na.rm = TRUE)
    // => 2.19209496829893
    expect(robustZ([3, 1, 4, 1, 5, 9, 2, 6, NaN], 10)).toBeCloseTo(2.19209496829893, 12);
  });

  it('is NaN for a missing value, too few values or no spread', () => {
    expect(robustZ([1, 2, 3, 4, 5], NaN)).toBeNaN();
    expect(robustZ([1, 2, 3], 4)).toBeNaN();
    expect(robustZ([2, 2, 2, 2, 2, 2], 3)).toBeNaN();
  });
});
