import {expect, test} from 'vitest';
import {SLUG, slugify} from '../../src/config/slug.js';

test('slugify makes ids from names', () => {
  expect(slugify('Web visits (UK)')).toBe('web-visits-uk');
  expect(slugify('  Café Crème ')).toBe('cafe-creme');
  expect(slugify('Q3_2026')).toBe('q3-2026');
  expect(slugify('   ')).toBe('item');
});

test('names in other scripts are transliterated instead of all becoming one id', () => {
  // Romanisations as the `transliteration` package (Unidecode's tables) gives them; checked by reading, e.g.
  // Москва is "Moskva" in the common scientific and passport romanisations.
  expect(slugify('Москва')).toBe('moskva');
  expect(slugify('Санкт-Петербург')).toBe('sankt-peterburg');
  expect(slugify('Αθήνα')).toBe('athina');
  expect(slugify('Θεσσαλονίκη')).toBe('thessaloniki');
  expect(slugify('北京')).toBe('bei-jing');
  expect(slugify('上海')).toBe('shang-hai');
  expect(slugify('서울')).toBe('seoul');
  // Nothing to spell: the code points.
  expect(slugify('🙂')).toBe('u1f642');
  expect(slugify('***')).toBe('u2a-u2a-u2a');
  const keys = ['Москва', 'Казань', 'Αθήνα', 'Πάτρα', '北京', '上海', '广州', '🙂', '🙃'];
  expect(new Set(keys.map(slugify)).size).toBe(keys.length);
});

test('slugify output is always a valid id', () => {
  for (const s of ['A', 'a--b', '-x-', 'Ünïcode näme', '2026', 'Новосибирск', '東京', '★']) {
    expect(SLUG.test(slugify(s))).toBe(true);
  }
});
