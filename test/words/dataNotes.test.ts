import {describe, expect, it} from 'vitest';
import {completePeriods} from '../../src/derive/completeness.js';
import {placeSeries} from '../../src/derive/placeSeries.js';
import {daysFromCivil, monthIndex, quarterIndex} from '../../src/time/period.js';
import {wordDataNote, wordNote, wordsFor, type Note} from '../../src/words/index.js';

/**
 * The data notes of ingest and derive are coded and worded in the report's language: exact sentences in English,
 * German and French, singular and plural, both ends of a cut period, lists that end in "n more".
 */
const en = wordsFor('en-GB');
const de = wordsFor('de-DE');
const fr = wordsFor('fr-FR');
const all = (note: Note) => [en, de, fr].map((w) => wordNote(w, note));

describe('data notes in three languages', () => {
  it('a period cut at either end of daily data', () => {
    // Daily rows from 20 January to 12 April 2026: January has 12 of 31 days, April 12 of 30.
    const c = completePeriods(
      {from: daysFromCivil(2026, 1, 20), to: daysFromCivil(2026, 4, 12)},
      {first: monthIndex(2026, 1), last: monthIndex(2026, 4)},
      'monthly',
    );
    expect([c.first, c.last]).toEqual([monthIndex(2026, 2), monthIndex(2026, 3)]);
    expect(all(c.notes[0])).toEqual([
      'January 2026 has data for 12 of 31 days (the data start inside it) and is left out',
      'Januar 2026 enthält Daten für 12 von 31 Tagen (die Daten beginnen innerhalb der Periode) und bleibt unberücksichtigt',
      'janvier 2026 : données pour 12 jours sur 31 seulement (les données commencent en cours de période) ; la période est écartée',
    ]);
    expect(all(c.notes[1])[1]).toBe(
      'April 2026 enthält Daten für 12 von 30 Tagen (die Daten enden innerhalb der Periode) und bleibt unberücksichtigt',
    );
  });

  it('gaps: one missing quarter, and many months listed up to twelve', () => {
    const one = placeSeries('s', (p) => (p === quarterIndex(2025, 2) ? NaN : 1), {first: quarterIndex(2025, 1), last: quarterIndex(2025, 4)}, quarterIndex(2025, 4), 'quarterly');
    if (!one.ok) throw new Error(one.problem);
    expect(all(one.notes[0])).toEqual([
      '1 missing quarter: Q2 2025',
      '1 Quartal fehlt: Q2 2025',
      '1 trimestre manquant : T2 2025',
    ]);
    const start = monthIndex(2024, 1);
    const many = placeSeries('s', (p) => (p < start + 14 && p > start ? NaN : 1), {first: start, last: start + 23}, start + 23, 'monthly');
    if (!many.ok) throw new Error(many.problem);
    const [english] = all(many.notes[0]);
    expect(english).toBe(
      '13 missing months: February 2024, March 2024, April 2024, May 2024, June 2024, July 2024, August 2024, ' +
        'September 2024, October 2024, November 2024, December 2024 and 2 more',
    );
  });

  it('data ending before the review period, and data after it in a back-filled pack', () => {
    const q = (y: number, k: number) => quarterIndex(y, k);
    const before = placeSeries('s', (p) => (p <= q(2024, 2) ? 1 : NaN), {first: q(2024, 1), last: q(2024, 2)}, q(2024, 4), 'quarterly');
    if (!before.ok) throw new Error(before.problem);
    expect(all(before.notes[0])).toEqual([
      'data end at Q2 2024: the 2 quarters up to the review period Q4 2024 are missing',
      'Daten enden mit Q2 2024: 2 Quartale bis zum Berichtszeitraum Q4 2024 fehlen',
      'les données s’arrêtent à T2 2024 : 2 trimestres manquent jusqu’à la période sous revue T4 2024',
    ]);
    const after: Note = {code: 'truncated', values: {n: 3}, periods: {frequency: 'quarterly', named: {period: q(2024, 4), last: q(2025, 2)}}};
    expect(all(after)).toEqual([
      'data after the review period Q4 2024 ignored in 3 series (up to Q2 2025): a pack for an earlier period sees only the data up to it',
      'Daten nach dem Berichtszeitraum Q4 2024 in 3 Reihen nicht berücksichtigt (bis Q2 2025): Ein Paket für einen früheren Zeitraum sieht nur die Daten bis zu diesem',
      'données postérieures à la période sous revue T4 2024 ignorées dans 3 séries (jusqu’à T2 2025) : un dossier établi pour une période antérieure ne voit que les données jusqu’à celle-ci',
    ]);
  });

  it('footer rows, rows combined into periods, and the place of a query note', () => {
    const footer: Note = {code: 'footerIgnored', values: {rows: 3, column: 'Datum', text: 'Summe', blank: 'no', last: '44'}};
    expect(all(footer)).toEqual([
      '3 rows after the data ignored ("Summe" to line 44): not a date, so taken as a footer',
      '3 Zeilen nach den Daten nicht berücksichtigt („Summe“ bis Zeile 44): kein Datum, daher als Fußzeile gewertet',
      '3 lignes ignorées après les données (« Summe » jusqu’à la ligne 44) : ce ne sont pas des dates, elles sont donc lues comme un pied de tableau',
    ]);
    const blank: Note = {code: 'footerIgnored', values: {rows: 1, column: 'date', text: '', blank: 'yes', last: '9'}};
    expect(wordNote(en, blank)).toBe('1 row after the data ignored (blank "date"): not a date, so taken as a footer');
    const combined: Note = {code: 'combined', values: {grain: 'day', frequency: 'monthly'}};
    expect(all(combined)[0]).toBe('rows on days combined into months: by each series’ aggregate (default sum for flows, last for stocks)');
    const note = {series: null, note: combined, query: {source: 'tills', row: null}};
    expect(wordDataNote(de, note)).toMatch(/^Quelle tills: Zeilen auf Tagesebene zu Monaten zusammengefasst/);
    const row = {series: null, note: {code: 'outOfOrder', values: {line: '12'}} as Note, query: {source: 'tills', row: 12}};
    expect(wordDataNote(fr, row)).toBe('source tills, ligne 12 de la requête : lignes hors de l’ordre chronologique (dès la ligne 12) ; elles ont été triées');
  });

  it('numbers in a note follow the report’s number format and rounding rule', () => {
    const gap: Note = {
      code: 'partsGap',
      values: {group: 'regions', total: 'sales', periods: 2},
      periods: {frequency: 'monthly', named: {period: monthIndex(2026, 3)}},
      figures: {gap: 1234.5, percent: 2.5},
    };
    expect(all(gap)).toEqual([
      'group regions: the parts do not add up to sales in 2 periods; the largest gap is 1,235 (2.50%) in March 2026',
      'Gruppe regions: Die Teile ergeben in 2 Perioden nicht sales; die größte Abweichung beträgt 1.235 (2,50 %) für März 2026',
      'groupe regions : les parties ne font pas sales sur 2 périodes ; le plus grand écart est de 1\u202f235 (2,50 %) pour mars 2026',
    ]);
  });
});
