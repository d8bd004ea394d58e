import {describe, expect, it} from 'vitest';
import {languageOf, shortMethod, wordsFor} from '../../src/words/index.js';
import {isoWeekIndex, monthIndex, quarterIndex} from '../../src/time/period.js';

// Expected strings follow the CLDR data shipped with Node's ICU (en-GB: "," grouping, "." decimal; de-DE: "."
// grouping, "," decimal and a no-break space before "%"; fr-FR: narrow no-break space grouping, "," decimal).
describe('one formatter with one rounding rule', () => {
  const en = wordsFor('en-GB');
  const de = wordsFor('de-DE');
  const fr = wordsFor('fr-FR');

  it('gives values magnitude-based decimals: ≥ 1 000 → 0, ≥ 10 → 1, else 2, in tables and sentences alike', () => {
    expect(en.number(12345.678)).toBe('12,346');
    expect(en.number(250.44)).toBe('250.4');
    expect(en.value(250.44, 'EUR k')).toBe('250.4 EUR k');
    expect(en.number(12.345)).toBe('12.3');
    expect(en.number(1.2345)).toBe('1.23');
    expect(en.value(2025.04, 'EUR k')).toBe('2,025 EUR k');
    expect(en.value(5.18, '%')).toBe('5.2%');
    expect(de.value(2025.04, 'EUR k')).toBe('2.025 EUR k');
    expect(de.number(12345.6, 1)).toBe('12.345,6');
    expect(wordsFor('en-IN').number(1234567.8)).toBe('12,34,568');
  });

  it('signs percentages and states changes of rates in percentage points', () => {
    expect(en.percent(3.24)).toBe('+3.2%');
    expect(en.percent(-0.44)).toBe('-0.4%');
    expect(en.percent(0)).toBe('0.0%');
    expect(en.points(0.44)).toBe('+0.4 pp');
    expect(en.points(0.04)).toBe('+0.04 pp');
    expect(de.percent(3.24)).toBe('+3,2\u00a0%');
    expect(de.points(0.44)).toBe('+0,4 Pp.');
    expect(fr.points(0.44)).toBe('+0,4 pt');
    expect(en.share(-3.24)).toBe('3.2%');
    expect(en.signed(-340.2, 'EUR k')).toBe('-340.2 EUR k');
    expect(en.range(4.81, 5.8, '%')).toBe('4.8 to 5.8%');
    expect(en.range(47.6, 149.4, 'EUR')).toBe('47.6 to 149.4 EUR');
    expect(de.range(47.6, 149.4, 'EUR')).toBe('47,6 bis 149,4 EUR');
    expect(en.pValue(0.0004)).toBe('p < 0.001');
  });

  it('names months through Intl and quarters and weeks through the catalogue, one form in tables and sentences', () => {
    expect(en.periodLong('monthly', monthIndex(2026, 10))).toBe('October 2026');
    expect(en.period('monthly', monthIndex(2026, 10))).toBe('Oct 2026');
    expect(de.periodLong('monthly', monthIndex(2026, 10))).toBe('Oktober 2026');
    expect(fr.periodLong('monthly', monthIndex(2026, 3))).toBe('mars 2026');
    expect(en.period('quarterly', quarterIndex(2026, 3))).toBe('Q3 2026');
    expect(fr.periodLong('quarterly', quarterIndex(2026, 3))).toBe('T3 2026');
    expect(en.period('weekly', isoWeekIndex(2026, 41))).toBe('W41 2026');
    expect(en.periodLong('weekly', isoWeekIndex(2026, 41))).toBe('W41 2026');
    expect(de.period('weekly', isoWeekIndex(2026, 41))).toBe('KW 41/2026');
    expect(fr.period('weekly', isoWeekIndex(2026, 41))).toBe('S41 2026');
    expect(de.season('quarterly', 0)).toBe('Q1');
    expect(en.dayMonth(2026, 4, 5)).toBe('5 April');
    expect(de.dayMonth(2026, 4, 5)).toBe('5. April');
  });

  it('counts with CLDR plurals and joins lists the way each language does', () => {
    expect(en.periods('monthly', 1)).toBe('1 month');
    expect(en.periods('monthly', 14)).toBe('14 months');
    expect(de.periods('quarterly', 2)).toBe('2 Quartale');
    expect(fr.periods('weekly', 1)).toBe('1 semaine');
    expect(en.list(['a', 'b', 'c'])).toBe('a, b and c');
    expect(de.list(['a', 'b', 'c'])).toBe('a, b und c');
    expect(fr.list(['a', 'b', 'c'])).toBe('a, b et c');
    expect(en.list(['a', 'b', 'c', 'd', 'e', 'f'])).toBe('a, b, c and 3 more');
  });

  it('prints a dash for missing numbers, caches per locale, and fails on a missing value', () => {
    expect(en.value(NaN, 'EUR k')).toBe('–');
    expect(en.percent(null)).toBe('–');
    expect(wordsFor('en-GB')).toBe(en);
    expect(() => en.t('callout.latestMissing', {label: 'x'})).toThrow(/period/);
  });

  it('falls back to English words with the locale’s numbers, and to en-GB for an unknown tag', () => {
    const nl = wordsFor('nl-NL');
    expect(languageOf('nl-NL')).toEqual({code: 'en', locale: 'nl-NL', fallback: true});
    expect(nl.t('section.summary')).toBe('At a glance');
    expect(nl.number(12345.6, 1)).toBe('12.345,6');
    expect(languageOf('de-AT')).toEqual({code: 'de', locale: 'de-AT', fallback: false});
    expect(languageOf('zz-@@')).toEqual({code: 'en', locale: 'en-GB', fallback: false});
  });
});

describe('shortMethod', () => {
  it('names a combination by its members’ families and keeps other names', () => {
    const en = wordsFor('en-GB');
    expect(shortMethod(en, 'Combination (ETS(M,Ad,M), Theta on STL-adjusted data, ARIMA(1,1,2) with drift)')).toBe(
      'a combination of ETS, Theta and ARIMA',
    );
    expect(shortMethod(en, 'Combination (ETS(M,Ad,M), Theta, Damped)')).toBe('a combination of ETS, Theta and damped trend');
    expect(shortMethod(wordsFor('de-DE'), 'Combination (ETS(M,Ad,M), Theta)')).toBe('eine Kombination aus ETS und Theta');
    expect(shortMethod(en, 'ETS(M,Ad,M)')).toBe('ETS(M,Ad,M)');
  });
});
