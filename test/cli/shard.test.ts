import path from 'node:path';
import {InvalidArgumentError} from 'commander';
import fc from 'fast-check';
import {describe, expect, test} from 'vitest';
import {parseShard, selectShard} from '../../src/cli/shard.js';

describe('parseShard', () => {
  test('i/n with 1 ≤ i ≤ n', () => {
    expect(parseShard('3/8')).toEqual({index: 3, count: 8});
    expect(parseShard('1/1')).toEqual({index: 1, count: 1});
    expect(parseShard(' 8 / 8 ')).toEqual({index: 8, count: 8});
  });

  test.each([
    ['0/8', 'the part i must be from 1 to 8 (parts count from 1)'],
    ['9/8', 'the part i must be from 1 to 8 (parts count from 1)'],
    ['1/0', 'the number of parts n must be from 1 to 10000'],
    ['3', 'write it as i/n, e.g. 3/8 for the third of eight parts'],
    ['-1/8', 'write it as i/n, e.g. 3/8 for the third of eight parts'],
    ['1.5/8', 'write it as i/n, e.g. 3/8 for the third of eight parts'],
    ['a/b', 'write it as i/n, e.g. 3/8 for the third of eight parts'],
  ])('%s is a usage error', (value, message) => {
    expect(() => parseShard(value)).toThrow(new InvalidArgumentError(message));
  });
});

describe('selectShard', () => {
  const packs = ['packs/e.yaml', 'packs/a.yaml', 'packs/d.yaml', 'packs/b.yaml', 'packs/c.yaml'];

  test('every n-th pack of the sorted list, from the i-th', () => {
    expect(selectShard(packs, {index: 1, count: 2})).toEqual(['packs/a.yaml', 'packs/c.yaml', 'packs/e.yaml']);
    expect(selectShard(packs, {index: 2, count: 2})).toEqual(['packs/b.yaml', 'packs/d.yaml']);
    expect(selectShard(packs, {index: 1, count: 1})).toEqual([...packs].sort());
    expect(selectShard(packs, {index: 7, count: 8})).toEqual([]);
  });

  test('the same pack written two ways counts once', () => {
    const twice = ['packs/a.yaml', path.resolve('packs/a.yaml'), './packs/b.yaml'];
    expect(selectShard(twice, {index: 1, count: 1})).toEqual(['packs/a.yaml', './packs/b.yaml']);
  });

  test('parts are disjoint, cover the batch, differ in size by at most one, and ignore the input order', () => {
    const name = fc.stringMatching(/^[a-z0-9-]{1,8}\.yaml$/);
    fc.assert(
      fc.property(fc.uniqueArray(name, {maxLength: 40}), fc.integer({min: 1, max: 12}), fc.nat(), (list, n, seed) => {
        const cut = seed % Math.max(1, list.length);
        const shuffled = [...list.slice(cut), ...list.slice(0, cut)].reverse();
        const parts = Array.from({length: n}, (_, i) => selectShard(list, {index: i + 1, count: n}));
        const again = Array.from({length: n}, (_, i) => selectShard(shuffled, {index: i + 1, count: n}));
        expect(again).toEqual(parts);
        const all = parts.flat();
        expect(new Set(all).size).toBe(all.length);
        expect([...all].sort()).toEqual([...list].sort());
        const sizes = parts.map((p) => p.length);
        expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
      }),
    );
  });
});
