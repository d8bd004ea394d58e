import fc from 'fast-check';
import {describe, expect, test} from 'vitest';
import {didYouMean, editDistance, hint} from '../../src/config/suggest.js';

describe('editDistance', () => {
  // Without adjacent swaps the distance equals Levenshtein's; confirmed in R 4.2.2 with utils::adist,
  // e.g. adist("kitten", "sitting") = 3, adist("flaw", "lawn") = 2, adist("sources", "sorces") = 1,
  // adist("", "abc") = 3.
  test.each([
    ['kitten', 'sitting', 3],
    ['flaw', 'lawn', 2],
    ['sources', 'sorces', 1],
    ['', 'abc', 3],
    ['kind', 'kind', 0],
  ])('%s → %s = %d (R adist)', (a, b, d) => {
    expect(editDistance(a, b)).toBe(d);
  });

  test('an adjacent swap costs one edit where Levenshtein needs two', () => {
    // R 4.2.2: adist("kidn", "kind") = 2 (no transpositions); here one swap.
    expect(editDistance('kidn', 'kind')).toBe(1);
    expect(editDistance('fromSoruce', 'fromSource')).toBe(1);
  });

  test('the optimal-string-alignment variant edits each substring once', () => {
    // d("CA", "ABC") = 3 for this variant, 2 for the unrestricted Damerau distance
    // (worked example of the Damerau–Levenshtein distance; value recalled from memory). R adist also gives 3.
    expect(editDistance('CA', 'ABC')).toBe(3);
  });

  test('is symmetric, zero only for equal strings, and bounded by the lengths', () => {
    fc.assert(
      fc.property(fc.string({maxLength: 12}), fc.string({maxLength: 12}), (a, b) => {
        const d = editDistance(a, b);
        expect(editDistance(b, a)).toBe(d);
        expect(d === 0).toBe(a === b);
        expect(d).toBeGreaterThanOrEqual(Math.abs(a.length - b.length));
        expect(d).toBeLessThanOrEqual(Math.max(a.length, b.length));
      }),
    );
  });

  test('one edit away is distance one', () => {
    fc.assert(
      fc.property(
        fc.string({minLength: 1, maxLength: 12}),
        fc.nat(),
        fc.string({minLength: 1, maxLength: 1}),
        (s, at, c) => {
          const i = at % s.length;
          const deleted = s.slice(0, i) + s.slice(i + 1);
          const inserted = s.slice(0, i) + c + s.slice(i);
          expect(editDistance(s, deleted)).toBe(1);
          expect(editDistance(s, inserted)).toBe(1);
        },
      ),
    );
  });
});

describe('didYouMean', () => {
  const keys = ['decomposition', 'calendar', 'outliers', 'forecast', 'cycle'];

  test('finds the closest key within two edits, ignoring case', () => {
    expect(didYouMean('forcast', keys)).toBe('forecast');
    expect(didYouMean('Cycel', keys)).toBe('cycle');
  });

  test('falls back to a shared prefix', () => {
    expect(didYouMean('decomp', keys)).toBe('decomposition');
    expect(didYouMean('calendarSettings', keys)).toBe('calendar');
  });

  test('gives nothing when no key is close', () => {
    expect(didYouMean('colour', keys)).toBeUndefined();
    expect(didYouMean('de', keys)).toBeUndefined();
    expect(hint('colour', keys)).toBe('');
    expect(hint('outlier', keys)).toBe('; did you mean outliers?');
  });
});
