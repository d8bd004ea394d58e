import {describe, expect, it} from 'vitest';
import {narrateFormat} from '../../src/narrate/format.js';
import {monthIndex, quarterIndex, isoWeekIndex} from '../../src/time/period.js';

// Expected strings follow the CLDR data shipped with Node's ICU (en-GB: "," grouping, "." decimal; de-DE: "."
// grouping, "," decimal and a no-break space before "%").
describe('narrateFormat', () => {
  const en = narrateFormat('en-GB');
  const de = narrateFormat('de-DE');

  it('formats values with magnitude-based decimals and the unit', () => {
    expect(en.value(2025.04, 'EUR k')).toBe('2,025 EUR k');
    expect(en.value(47.33, 'EUR')).toBe('47.3 EUR');
    expect(en.value(5.18, null)).toBe('5.18');
    expect(en.value(5.18, '%')).toBe('5.2%');
    expect(de.value(2025.04, 'EUR k')).toBe('2.025 EUR k');
  });

  it('signs percentages, and states changes of rates in percentage points', () => {
    expect(en.percent(3.24)).toBe('+3.2%');
    expect(en.percent(-0.44)).toBe('-0.4%');
    expect(en.percent(0)).toBe('0.0%');
    expect(en.points(0.44)).toBe('+0.4 pp');
    expect(en.points(-1.25)).toBe('-1.3 pp');
    expect(de.percent(3.24)).toBe('+3,2\u00a0%');
    expect(de.points(0.44)).toBe('+0,4 pp');
    expect(en.size(-3.24)).toBe('3.2%');
    expect(en.signed(-340.2, 'EUR k')).toBe('-340 EUR k');
    expect(en.signed(0.35, '%')).toBe('+0.4 pp');
    expect(en.range(4.81, 5.8, '%')).toBe('4.8 to 5.8%');
    expect(en.range(47.6, 149.4, 'EUR')).toBe('48 to 149 EUR');
    expect(en.range(4.81, 5.8, null)).toBe('4.81 to 5.80');
  });

  it('names periods in the locale', () => {
    expect(en.period('monthly', monthIndex(2026, 10))).toBe('October 2026');
    expect(de.period('monthly', monthIndex(2026, 10))).toBe('Oktober 2026');
    expect(en.period('quarterly', quarterIndex(2026, 3))).toBe('Q3 2026');
    expect(en.period('weekly', isoWeekIndex(2026, 41))).toBe('week 41 of 2026');
    expect(en.dayMonth(2026, 4, 5)).toBe('5 April');
  });

  it('prints a dash for missing numbers and caches one formatter per locale', () => {
    expect(en.value(NaN, 'EUR k')).toBe('–');
    expect(en.percent(Infinity)).toBe('–');
    expect(narrateFormat('en-GB')).toBe(en);
  });
});
