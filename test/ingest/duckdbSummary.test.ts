/**
 * A DuckDB query summed up by the engine (ingest/duckdbSummary.ts) reads exactly like the same rows read one by one.
 * The row path is forced by handing the dates over as text (`day::VARCHAR`), which only the rows can parse; both
 * read one seeded table of transactions in the real embedded engine (several rows per key and day, blanks, cents,
 * an incomplete first and last month), and every series value must be identical to the last bit.
 */
import {mkdtemp, rm} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {DuckDBInstance} from '@duckdb/node-api';
import fc from 'fast-check';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import type {Aggregate, SourcePlan} from '../../src/config/plan.js';
import {microUnits} from '../../src/ingest/decimalUnits.js';
import {PeriodStore} from '../../src/ingest/periodStore.js';
import type {Frequency} from '../../src/time/period.js';
import {fromSource, plan, readPack, source} from './plan.js';

let dir = '';

/** Seeded transactions: 7 accounts, 2022-01-17 to 2023-03-09, 0–3 rows a day each, cents, some NULL amounts. */
function transactions(): string {
  let seed = 20240601;
  const next = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
  const rows: string[] = [];
  const start = Date.UTC(2022, 0, 17);
  const end = Date.UTC(2023, 2, 9);
  for (let t = start; t <= end; t += 86_400_000) {
    const day = new Date(t).toISOString().slice(0, 10);
    for (let a = 0; a < 7; a++) {
      const n = Math.floor(next() * 4);
      for (let i = 0; i < n; i++) {
        const amount = next() < 0.05 ? 'NULL' : (Math.round((next() - 0.2) * 1e6) / 100).toFixed(2);
        const hour = String(Math.floor(next() * 24)).padStart(2, '0');
        rows.push(`(DATE '${day}', TIMESTAMP '${day} ${hour}:15:00', ' Account ${a}', ${amount})`);
      }
    }
  }
  return rows.join(',\n');
}

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'ebbflow-duckdb-summary-'));
  const db = await (await DuckDBInstance.create(':memory:')).connect();
  await db.run('CREATE TABLE tx (day DATE, stamp TIMESTAMP, account VARCHAR, amount DECIMAL(12,2))');
  await db.run(`INSERT INTO tx VALUES ${transactions()}`);
  await db.run(`COPY tx TO '${join(dir, 'tx.parquet')}' (FORMAT parquet)`);
  db.closeSync();
});

afterAll(async () => {
  await rm(dir, {recursive: true, force: true});
});

/** A long DuckDB source over the Parquet file with this query. */
function query(sql: string, more: Partial<SourcePlan> = {}): SourcePlan {
  return source('tx', join(dir, 'pack.yaml'), {
    layout: 'long',
    reader: 'duckdb',
    dateColumn: 'day',
    keyColumn: 'account',
    valueColumn: 'amount',
    query: sql,
    readFolders: [dir],
    ...more,
  });
}

async function read(sql: string, frequency: Frequency, aggregate: Aggregate, more: Partial<SourcePlan> = {}) {
  const from = fromSource('tx', 0);
  from.template = {...from.template, aggregate};
  return readPack(plan(frequency, [query(sql, more)], [], {fromSource: [from], packFile: join(dir, 'pack.yaml')}));
}

const SUMMED = "SELECT day, account, amount FROM read_parquet('tx.parquet')";
const AS_TEXT = "SELECT day::VARCHAR AS day, account, amount FROM read_parquet('tx.parquet')";

describe('a DuckDB query summed up by the engine', () => {
  for (const frequency of ['monthly', 'quarterly', 'weekly'] as const) {
    for (const aggregate of ['sum', 'mean', 'count', 'min', 'max'] as const) {
      it(`${frequency} ${aggregate}: the same series, notes and row count as the rows read one by one`, async () => {
        const summed = await read(SUMMED, frequency, aggregate);
        const rows = await read(AS_TEXT, frequency, aggregate);
        expect(summed.inputs[0].query?.summarised).toBe(true);
        expect(rows.inputs[0].query?.summarised).toBeUndefined();
        expect(summed.inputs[0].rows).toBe(rows.inputs[0].rows);
        expect(summed.series.map((s) => s.id)).toEqual(rows.series.map((s) => s.id));
        expect(summed.series.length).toBe(7);
        for (let i = 0; i < rows.series.length; i++) {
          expect(summed.series[i].start).toBe(rows.series[i].start);
          // Bit for bit: Object.is on every value (NaN equal to NaN, 0 and -0 told apart).
          expect([...summed.series[i].values].every((v, j) => Object.is(v, rows.series[i].values[j]))).toBe(true);
        }
        expect(summed.notes).toEqual(rows.notes);
        expect(summed.period).toBe(rows.period);
      });
    }
  }

  it('empty days as zero and TIMESTAMP dates read the same way', async () => {
    const zero = {emptyMeans: 'zero' as const};
    const a = await read(SUMMED, 'weekly', 'count', zero);
    const b = await read(AS_TEXT, 'weekly', 'count', zero);
    expect(a.series.map((s) => [...s.values])).toEqual(b.series.map((s) => [...s.values]));
    const at = {dateColumn: 'stamp'};
    const c = await read("SELECT stamp, account, amount FROM read_parquet('tx.parquet')", 'monthly', 'sum', at);
    const d = await read("SELECT stamp::VARCHAR AS stamp, account, amount FROM read_parquet('tx.parquet')", 'monthly', 'sum', at);
    expect(c.inputs[0].query?.summarised).toBe(true);
    expect(c.series.map((s) => [...s.values])).toEqual(d.series.map((s) => [...s.values]));
  });

  it('reads the rows instead when only they can say: first or last, a NaN, a value of no exact millionths', async () => {
    const last = await read(SUMMED, 'monthly', 'last');
    expect(last.inputs[0].query?.summarised).toBeUndefined();
    for (const odd of ["'NaN'::DOUBLE", '1 / 3']) {
      const sql = `SELECT day, account, amount::DOUBLE AS amount FROM read_parquet('tx.parquet') UNION ALL SELECT DATE '2022-05-05', ' Account 1', ${odd}`;
      const text = sql.replace('SELECT day,', 'SELECT day::VARCHAR AS day,').replace("SELECT DATE '2022-05-05'", "SELECT '2022-05-05'");
      const a = await read(sql, 'monthly', 'sum');
      const b = await read(text, 'monthly', 'sum');
      expect(a.inputs[0].query?.summarised, odd).toBeUndefined();
      expect(a.series.map((s) => [...s.values])).toEqual(b.series.map((s) => [...s.values]));
    }
  });

  it('reads the rows instead when a row has no date, and notes it the same way', async () => {
    const a = await read(`${SUMMED} UNION ALL SELECT NULL::DATE, ' Account 1', 1.00`, 'monthly', 'sum');
    const b = await read(`${AS_TEXT} UNION ALL SELECT NULL, ' Account 1', 1.00`, 'monthly', 'sum');
    expect(a.inputs[0].query?.summarised).toBeUndefined();
    expect(a.series.map((x) => [...x.values])).toEqual(b.series.map((x) => [...x.values]));
    expect(a.notes).toEqual(b.notes);
    expect(a.notes.length).toBeGreaterThan(0);
  });

  it('query rows have no order of their own: keys in text order, no note about date order, on both paths', async () => {
    const backwards = `${AS_TEXT} ORDER BY day DESC, account DESC`;
    const rows = await read(backwards, 'monthly', 'sum');
    const summed = await read(`${SUMMED} ORDER BY day DESC, account DESC`, 'monthly', 'sum');
    expect(summed.inputs[0].query?.summarised).toBe(true);
    const ids = rows.series.map((x) => x.id);
    expect(ids).toEqual([...ids].sort());
    expect(summed.series.map((x) => x.id)).toEqual(ids);
    expect(rows.notes.some((n) => n.note?.code === 'outOfOrder')).toBe(false);
    expect(summed.notes).toEqual(rows.notes);
  });

  it('sums beyond 2^53 millionths and keys of any case or script come out the same on both paths', async () => {
    // Two 5·10^9 amounts in one month pass 2^53 millionths (about 9.007·10^9): the engine hands that sum over as text.
    const extra = [
      "SELECT DATE '2022-05-05' AS day, ' Account 1' AS account, 5000000000.25::DECIMAL(12,2) AS amount",
      "SELECT DATE '2022-05-06', ' Account 1', 4999999999.99",
      "SELECT day, 'bravo', amount FROM read_parquet('tx.parquet') WHERE account = ' Account 2'",
      "SELECT day, 'Élan', amount FROM read_parquet('tx.parquet') WHERE account = ' Account 3'",
      "SELECT day, 'Zoo', CASE WHEN day < DATE '2022-06-01' THEN NULL ELSE amount END FROM read_parquet('tx.parquet') WHERE account = ' Account 4'",
    ];
    const sql = [SUMMED, ...extra].join(' UNION ALL ');
    const asText = (e: string) => e.replace(/^SELECT DATE ('[^']+')/, 'SELECT $1').replace(/^SELECT day,/, 'SELECT day::VARCHAR,');
    const text = [AS_TEXT, ...extra.map(asText)].join(' UNION ALL ');
    for (const aggregate of ['sum', 'mean'] as const) {
      const a = await read(sql, 'monthly', aggregate);
      const b = await read(text, 'monthly', aggregate);
      expect(a.inputs[0].query?.summarised).toBe(true);
      expect(b.inputs[0].query?.summarised).toBeUndefined();
      expect(a.series.map((x) => x.id)).toEqual(b.series.map((x) => x.id));
      expect(a.series.map((x) => x.id).slice(-4)).toEqual(['account-6', 'zoo', 'bravo', 'elan']);
      for (let i = 0; i < b.series.length; i++) {
        expect([...a.series[i].values].every((v, j) => Object.is(v, b.series[i].values[j]))).toBe(true);
      }
    }
    const sums = await read(sql, 'monthly', 'sum');
    const base = await read(SUMMED, 'monthly', 'sum');
    const may = 2022 * 12 + 4 - sums.series[1].start;
    // 10,000,000,000.24 added to what Account 1 had in May 2022, exact in cents.
    expect(sums.series[1].values[may] - base.series[1].values[may]).toBeCloseTo(10_000_000_000.24, 3);
  });

  it('the manifest hash follows the summaries: a changed amount changes it, the same table keeps it', async () => {
    const a = await read(SUMMED, 'monthly', 'sum');
    const b = await read(SUMMED, 'monthly', 'sum');
    expect(b.inputs[0].sha256).toBe(a.inputs[0].sha256);
    const changed = await read(
      "SELECT day, account, CASE WHEN day = DATE '2022-06-01' THEN amount + 0.01 ELSE amount END AS amount FROM read_parquet('tx.parquet')",
      'monthly',
      'sum',
    );
    expect(changed.inputs[0].sha256).not.toBe(a.inputs[0].sha256);
  });
});

describe("the engine's millionths agree with microUnits", () => {
  it('on awkward doubles: where DuckDB finds them exact, so does microUnits, with the same units', async () => {
    const values = [0.1, 0.2, 0.3, 1e-7, 2.675, -2.675, 0.5e-6, 1.5e-6, -0.0000005, 8999999999.999999, 123456.789012];
    fc.assert(
      fc.property(fc.double({min: -9e9, max: 9e9, noNaN: true}), (v) => {
        values.push(v);
      }),
      {seed: 7, numRuns: 500},
    );
    for (let i = 0; i < 300; i++) values.push(Math.round((i * 7919.123) % 1e6) / 100, ((i * 104729) % 1e7) / 1e6);
    const db = await (await DuckDBInstance.create(':memory:')).connect();
    const list = values.map((v) => `(${v === 0 ? '0' : v.toPrecision(17)}::DOUBLE)`).join(',');
    const reader = await db.runAndReadAll(
      `SELECT v, round(v * 1000000) / 1000000 = v AND abs(v) <= 9e9 AS exact, round(v * 1000000)::BIGINT AS u FROM (VALUES ${list}) t(v)`,
    );
    const [vs, exact, units] = reader.getColumns() as [number[], boolean[], bigint[]];
    let agreed = 0;
    for (let i = 0; i < vs.length; i++) {
      if (!exact[i]) continue;
      expect(microUnits(vs[i]), String(vs[i])).toBe(Number(units[i]));
      agreed++;
    }
    expect(agreed).toBeGreaterThan(600);
    db.closeSync();
  });
});

describe('PeriodStore exact sums', () => {
  const stamp = (period: number, at: number) => ({period, at, from: 0, to: 0, grain: 'day' as const});

  it('sum cents to the same bits in any order (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({min: -1e9, max: 1e9}), {minLength: 1, maxLength: 60}), fc.integer(), (cents, seed) => {
        const values = cents.map((c) => c / 100);
        const shuffled = [...values].sort((a, b) => ((a * 31 + seed) % 7) - ((b * 31 + seed) % 7));
        const one = new PeriodStore();
        const two = new PeriodStore();
        values.forEach((v, i) => one.add(stamp(5, i), v, i + 1));
        shuffled.forEach((v, i) => two.add(stamp(5, i), v, i + 1));
        expect(Object.is(one.at(5).sum, two.at(5).sum)).toBe(true);
        // The double nearest to the exact sum of the cents.
        expect(one.at(5).sum).toBe(cents.reduce((a, b) => a + b, 0) / 100);
      }),
      {seed: 11, numRuns: 300},
    );
  });

  it('goes on exactly past 2^53 millionths, and sums other values as doubles in row order', () => {
    const s = new PeriodStore();
    for (let i = 0; i < 4; i++) s.add(stamp(1, i), 8e9, i + 1);
    s.add(stamp(1, 9), 0.000001, 9);
    expect(s.at(1).sum).toBe(Number(32_000_000_000_000_001n) / 1e6);
    const t = new PeriodStore();
    [0.1, 1 / 3, 0.2].forEach((v, i) => t.add(stamp(2, i), v, i + 1));
    expect(t.at(2).sum).toBe(0.1 + 1 / 3 + 0.2);
  });
});
