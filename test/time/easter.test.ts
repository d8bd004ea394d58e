import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {easterSunday} from '../../src/time/easter.js';
import {civilFromDays} from '../../src/time/period.js';

const iso = (days: number): string => {
  const {year, month, day} = civilFromDays(days);
  return `${year}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
};

// Source: python-dateutil easter(year, EASTER_WESTERN), written by test/reference/easter.py.
const reference = JSON.parse(readFileSync(new URL('../reference/easter.json', import.meta.url), 'utf8')) as {
  dates: Record<string, string>;
};

describe('easterSunday', () => {
  it('gives the published dates named in the brief (recalled from memory; also in the dateutil table)', () => {
    expect([2024, 2025, 2026, 2000, 2038].map((y) => iso(easterSunday(y)))).toEqual([
      '2024-03-31',
      '2025-04-20',
      '2026-04-05',
      '2000-04-23',
      '2038-04-25',
    ]);
  });
  it('agrees with python-dateutil for every year 1583–2299', () => {
    for (const [year, date] of Object.entries(reference.dates)) expect(iso(easterSunday(Number(year)))).toBe(date);
  });
  it('rejects years before the Gregorian calendar', () => {
    expect(() => easterSunday(1500)).toThrow(/invalid year/);
  });
});
