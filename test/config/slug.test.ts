import {expect, test} from 'vitest';
import {SLUG, slugify} from '../../src/config/slug.js';

test('slugify makes ids from names', () => {
  expect(slugify('Web visits (UK)')).toBe('web-visits-uk');
  expect(slugify('  Café Crème ')).toBe('cafe-creme');
  expect(slugify('Q3_2026')).toBe('q3-2026');
  expect(slugify('***')).toBe('item');
});

test('slugify output is always a valid id', () => {
  for (const s of ['A', 'a--b', '-x-', 'Ünïcode näme', '2026']) expect(SLUG.test(slugify(s))).toBe(true);
});
