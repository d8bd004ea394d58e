import {describe, expect, it} from 'vitest';
import {easterSunday} from '../../src/narrate/easterSunday.js';

// Reference: python-dateutil 2.9.0 `dateutil.easter.easter(year)` (Western method), run by hand:
// python3 -c "from dateutil.easter import easter; print([str(easter(y)) for y in (1583, 1818, 2008, ...)])"
const REFERENCE: [number, number, number][] = [
  [1583, 4, 10],
  [1818, 3, 22],
  [2008, 3, 23],
  [2018, 4, 1],
  [2019, 4, 21],
  [2024, 3, 31],
  [2025, 4, 20],
  [2026, 4, 5],
  [2038, 4, 25],
  [2285, 3, 22],
];

describe('easterSunday', () => {
  it.each(REFERENCE)('Easter %i is on %i/%i as python-dateutil gives', (year, month, day) => {
    expect(easterSunday(year)).toEqual({month, day});
  });
});
