import {describe, expect, it} from 'vitest';
import {count, list, periods} from '../../src/narrate/wording.js';

describe('wording helpers', () => {
  it('uses the singular for exactly one', () => {
    expect(count(1, 'value')).toBe('1 value');
    expect(count(0, 'value')).toBe('0 values');
    expect(count(3, 'value')).toBe('3 values');
    expect(periods('monthly', 1)).toBe('1 month');
    expect(periods('monthly', 14)).toBe('14 months');
    expect(periods('quarterly', 2)).toBe('2 quarters');
    expect(periods('weekly', 1)).toBe('1 week');
  });

  it('joins lists with "and" and shortens long ones', () => {
    expect(list(['a'])).toBe('a');
    expect(list(['a', 'b'])).toBe('a and b');
    expect(list(['a', 'b', 'c'])).toBe('a, b and c');
    expect(list(['a', 'b', 'c', 'd', 'e', 'f'])).toBe('a, b, c and 3 more');
  });
});
