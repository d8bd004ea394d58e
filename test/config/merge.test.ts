import {expect, test} from 'vitest';
import {mergeDefined} from '../../src/config/merge.js';

test('merges mappings key by key and lets the override win', () => {
  expect(mergeDefined({a: 1, b: {c: 2, d: 3}}, {b: {c: 5}})).toEqual({a: 1, b: {c: 5, d: 3}});
});

test('null and undefined in the override keep the base value', () => {
  expect(mergeDefined({a: 1, b: {c: 2}}, {a: null, b: {c: undefined}})).toEqual({a: 1, b: {c: 2}});
  expect(mergeDefined({a: 1}, null)).toEqual({a: 1});
});

test('lists are replaced, not joined', () => {
  expect(mergeDefined({levels: [80, 95]}, {levels: [90]})).toEqual({levels: [90]});
});

test('changes neither argument', () => {
  const base = {a: {b: 1}};
  const over = {a: {b: 2}};
  mergeDefined(base, over);
  expect(base).toEqual({a: {b: 1}});
  expect(over).toEqual({a: {b: 2}});
});
