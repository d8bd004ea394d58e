import {mkdtempSync, rmSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import fc from 'fast-check';
import {afterAll, describe, expect, it} from 'vitest';
import {InputError} from '../../src/errors.js';

import type {Dataset} from '../../src/ingest/index.js';
import type {Frequency} from '../../src/time/period.js';
import {plan, readPack, series, source} from './plan.js';

const temp = mkdtempSync(join(tmpdir(), 'ebbflow-ingest-prop-'));
afterAll(() => rmSync(temp, {recursive: true, force: true}));

/** Cells that look like data some of the time and like anything at other times. */
const cell = fc.oneof(
  fc.constantFrom('', 'NA', '-', '1,234.5', '1 234,5', '12', '-3.5', '€5', '5%', '"q,uoted"', '"', '2024-01'),
  fc.double({noNaN: true}).map(String),
  fc.string({maxLength: 8}),
  fc.string({unit: 'binary', maxLength: 6}),
);
const date = fc.oneof(
  fc
    .tuple(fc.integer({min: 1990, max: 2030}), fc.integer({min: 0, max: 13}))
    .map(([y, m]) => `${y}-${String(m).padStart(2, '0')}`),
  fc.constantFrom('2024-Q1', '2024-W53', '2026-W53', 'Oct 2026', '10/2026', '2024-02-30', ''),
  fc.string({maxLength: 10}),
);
const row = fc.tuple(date, fc.array(cell, {minLength: 0, maxLength: 4}));
const sep = fc.constantFrom(',', ';', '\t');

describe('ingest on random wide CSV text', () => {
  it('returns a dataset or throws InputError, nothing else', async () => {
    let n = 0;
    await fc.assert(
      fc.asyncProperty(
        sep,
        fc.array(row, {maxLength: 30}),
        fc.constantFrom<Frequency>('monthly', 'quarterly', 'weekly'),
        fc.constantFrom<'.' | ','>('.', ','),
        fc.constantFrom<'utf-8' | 'windows-1252'>('utf-8', 'windows-1252'),
        fc.option(fc.integer({min: 1990 * 12, max: 2031 * 12}), {nil: null}),
        async (d, rows, frequency, decimal, encoding, period) => {
          const lines = [`month${d}a${d}b`, ...rows.map(([dt, cells]) => [dt, ...cells].join(d))];
          const text = lines.join(n % 2 ? '\r\n' : '\n');
          const file = join(temp, `p${n++}.csv`);
          writeFileSync(file, text);
          const src = source('s', file, {decimal, encoding});
          const list = [series('a', 's'), series('b', 's')];
          const p = plan(frequency, [src], list, {period: frequency === 'monthly' ? period : null});
          const outcome: Dataset | Error = await readPack(p).catch((e: Error) => e);
          if (outcome instanceof Error) expect(outcome).toBeInstanceOf(InputError);
          else for (const s of outcome.series) expect(s.start + s.values.length - 1).toBe(outcome.period);
        },
      ),
      {numRuns: 300},
    );
  });
});
