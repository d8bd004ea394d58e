/**
 * Clean long CSV lines are read in place (readLong.ts `line`), every other line is cut into fields. A quoted field
 * always takes the field path, so the same rows with every key quoted read the slow way: both must give the same
 * series, notes and problems, on seeded rows that mix clean lines with blanks, spaces, signs, exponents, missing
 * markers, grouped numbers, bad cells and dates out of order.
 */
import {mkdtemp, rm, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import fc from 'fast-check';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {InputError} from '../../src/errors.js';
import {fromSource, plan, readPack, source} from './plan.js';

let dir = '';
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'ebbflow-in-place-'));
});
afterAll(async () => {
  await rm(dir, {recursive: true, force: true});
});

const VALUES = ['12.5', '-3', '.25', '7.', '1e3', ' 4.5', 'NA', '', '1,234.5', '(12)', '2x', '0.000001', '-0'];
const KEYS = ['North', 'South', ' East', 'West '];

async function readBoth(lines: string[], quoted: string[]): Promise<[unknown, unknown]> {
  const result = async (name: string, body: string[]) => {
    const file = join(dir, name);
    await writeFile(file, ['day,region,amount', ...body].join('\n') + '\n');
    const src = source('tx', file, {layout: 'long', dateColumn: 'day', keyColumn: 'region', valueColumn: 'amount'});
    try {
      const data = await readPack(plan('monthly', [src], [], {fromSource: [fromSource('tx', 0)]}));
      return {series: data.series.map((s) => [s.id, s.start, [...s.values]]), notes: JSON.stringify(data.notes).replaceAll(name, 'FILE')};
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      return {problems: e.problems.map((p) => `${p.line}:${p.column}: ${p.message.replaceAll(name, 'FILE')}`)};
    }
  };
  return [await result('plain.csv', lines), await result('quoted.csv', quoted)];
}

describe('long CSV lines read in place', () => {
  it('read like the same lines cut into fields (fast-check)', async () => {
    const row = fc.record({
      day: fc.integer({min: 0, max: 120}),
      key: fc.integer({min: 0, max: KEYS.length - 1}),
      value: fc.oneof(fc.integer({min: 0, max: VALUES.length - 1}), fc.integer({min: -99999, max: 99999})),
      back: fc.boolean(),
    });
    await fc.assert(
      fc.asyncProperty(fc.array(row, {minLength: 1, maxLength: 80}), async (rows) => {
        let day = 0;
        const cells = rows.map((r) => {
          day = r.back ? Math.max(0, day - 3) : day + (r.day % 3);
          const date = new Date(Date.UTC(2024, 0, 1 + day)).toISOString().slice(0, 10);
          const value = r.value >= 0 && r.value < VALUES.length ? VALUES[r.value] : (r.value / 100).toFixed(2);
          return [date, KEYS[r.key], value.includes(',') ? `"${value}"` : value];
        });
        const plain = cells.map((c) => c.join(','));
        const quoted = cells.map(([d, k, v]) => `${d},"${k}",${v}`);
        const [a, b] = await readBoth(plain, quoted);
        expect(a).toEqual(b);
      }),
      {seed: 5, numRuns: 60},
    );
  });
});
