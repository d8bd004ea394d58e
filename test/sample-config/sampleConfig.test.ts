import {describe, expect, it} from 'vitest';
import {execFileSync} from 'node:child_process';
import {mkdtempSync, readFileSync, rmSync} from 'node:fs';
import {DuckDBInstance} from '@duckdb/node-api';
import ExcelJS from 'exceljs';
import {tmpdir} from 'node:os';
import {join, resolve} from 'node:path';
import {parse} from 'csv-parse/sync';
import {loadPlan} from '../../src/config/index.js';
import {readPack} from '../ingest/plan.js';

const dir = resolve(import.meta.dirname, '../../sample-config');
const read = (name: string) => readFileSync(join(dir, 'data', name), 'utf8');

describe('sample-config generator', () => {
  it('is deterministic and the committed CSVs, Parquet file and workbook cells are its output', async () => {
    const tmp = mkdtempSync(join(tmpdir(), 'ebbflow-sample-'));
    try {
      execFileSync(process.execPath, [join(dir, 'generate.mjs'), join(tmp, 'data')]);
      for (const name of ['trading.csv', 'web.csv', 'quarterly.csv']) {
        expect(readFileSync(join(tmp, 'data', name), 'utf8'), name).toBe(read(name));
      }
      expect(readFileSync(join(tmp, 'data', 'repairs.parquet')).equals(readFileSync(join(dir, 'data', 'repairs.parquet')))).toBe(true);
      // exceljs stamps zip entries with the time of writing: compare the cells, not the bytes.
      const cells = async (file: string) => {
        const book = new ExcelJS.Workbook();
        await book.xlsx.readFile(file);
        return book.worksheets.map((w) => w.getSheetValues());
      };
      expect(await cells(join(tmp, 'data', 'budget.xlsx'))).toEqual(await cells(join(dir, 'data', 'budget.xlsx')));
    } finally {
      rmSync(tmp, {recursive: true, force: true});
    }
  });

  it('writes the budget workbook with the CSV budget column, and the repair job log as Parquet', async () => {
    const book = new ExcelJS.Workbook();
    await book.xlsx.readFile(join(dir, 'data', 'budget.xlsx'));
    const sheet = book.getWorksheet('Budget')!;
    expect(sheet.getRow(3).values).toEqual([undefined, 'Month', 'Sales budget']);
    const rows = parse(read('trading.csv'), {columns: true}) as Record<string, string>[];
    const budget = rows.map((r, i) => [sheet.getCell(4 + i, 1).value, sheet.getCell(4 + i, 2).value]);
    expect(budget.map(([d]) => (d as Date).toISOString().slice(0, 7))).toEqual(rows.map((r) => r.month));
    expect(budget.map(([, v]) => v)).toEqual(rows.map((r) => Number(r.sales_budget)));
    const db = await (await DuckDBInstance.create(':memory:')).connect();
    const file = join(dir, 'data', 'repairs.parquet').replace(/'/g, "''");
    const reader = await db.runAndReadAll(`SELECT min(done_at)::VARCHAR, max(done_at)::VARCHAR, count(*)::INTEGER FROM read_parquet('${file}')`);
    const [[first, last, count]] = reader.getRows();
    db.closeSync();
    expect([first, last]).toEqual([expect.stringMatching(/^2017-12-01 /), expect.stringMatching(/^2026-10-31 /)]);
    expect(count).toBeGreaterThan(30_000);
  });

  it('writes monthly trading data Jan 2018 – Oct 2026, the budget to Mar 2027, and the planted gaps', () => {
    const rows = parse(read('trading.csv'), {columns: true}) as Record<string, string>[];
    expect(rows[0].month).toBe('2018-01');
    expect(rows.filter((r) => r.net_sales !== '').at(-1)!.month).toBe('2026-10');
    expect(rows.at(-1)).toMatchObject({month: '2027-03', net_sales: ''});
    expect(rows.filter((r) => r.net_sales !== '' && r.footfall === '').map((r) => r.month)).toEqual(['2019-08', '2023-02', '2023-03']);
    expect(Object.keys(rows[0])).toEqual([
      'month', 'net_sales', 'sales_north', 'sales_lakes', 'sales_coast', 'web_sales', 'cogs', 'transactions', 'footfall',
      'avg_basket', 'returns_rate', 'payroll', 'inventory', 'marketing', 'sales_budget', 'payroll_budget',
      'marketing_budget',
    ]);
    expect(rows.at(-1)!.payroll_budget).toMatch(/^\d/);
  });

  it('writes regions and web sales that add up to net sales exactly (to the 0.1 written)', () => {
    const rows = parse(read('trading.csv'), {columns: true}) as Record<string, string>[];
    for (const r of rows.filter((x) => x.net_sales !== '')) {
      const parts = ['sales_north', 'sales_lakes', 'sales_coast', 'web_sales'].reduce((a, c) => a + Number(r[c]), 0);
      expect(Math.abs(Number(r.net_sales) - parts)).toBeLessThan(1e-9);
    }
  });

  it('writes the web file long, with dates like "Oct 2026"', () => {
    const rows = parse(read('web.csv'), {columns: true}) as {date: string; series: string; value: string}[];
    expect(rows).toHaveLength(2 * 106);
    expect(rows.at(-1)).toMatchObject({date: 'Oct 2026', series: 'Web orders'});
    expect([...new Set(rows.map((r) => r.series))]).toEqual(['Web sessions', 'Web orders']);
  });

  it('writes the quarterly file with ";" and decimal commas, 2016-Q1 to 2026-Q3', () => {
    const rows = parse(read('quarterly.csv'), {columns: true, delimiter: ';'}) as Record<string, string>[];
    expect(rows).toHaveLength(43);
    expect([rows[0].quarter, rows.at(-1)!.quarter]).toEqual(['2016-Q1', '2026-Q3']);
    expect(rows[0].sales_north).toMatch(/^\d+,\d$/);
  });

  it('plants the flash sale (2023-11) and the stock-count correction (2024-03) as one-off spikes', () => {
    const rows = parse(read('trading.csv'), {columns: true}) as Record<string, string>[];
    const at = (m: string, c: string) => Number(rows.find((r) => r.month === m)![c]);
    // Against the average of the neighbours a year either side (same season): ≥ 8% above.
    const spike = (m: string, c: string, before: string, after: string) => at(m, c) / ((at(before, c) + at(after, c)) / 2);
    expect(spike('2023-11', 'net_sales', '2022-11', '2024-11')).toBeGreaterThan(1.08);
    expect(spike('2024-03', 'inventory', '2023-03', '2025-03')).toBeGreaterThan(1.08);
  });
});

describe('sample packs', () => {
  it('monthly pack loads: every series resolved, budget hidden, web series taken from the long file', async () => {
    const plan = await loadPlan(join(dir, 'monthly-pack.yaml'));
    expect(plan.id).toBe('tarnwick-monthly');
    expect(plan.fiscalYearStart).toBe(4);
    expect(plan.series.map((s) => s.id)).toEqual([
      'net-sales', 'sales-north', 'sales-lakes', 'sales-coast', 'shop-sales', 'web-sales', 'cogs', 'gross-margin',
      'transactions', 'footfall', 'avg-basket', 'returns-rate', 'payroll', 'inventory', 'marketing', 'sales-budget',
      'payroll-budget', 'marketing-budget', 'repair-income', 'repair-jobs',
    ]);
    expect(plan.series.find((s) => s.id === 'gross-margin')!.formula!.text).toBe('100 * (net-sales - cogs) / net-sales');
    expect(plan.groups.filter((g) => g.total !== null).map((g) => [g.id, g.total, g.adjustTotal])).toEqual([
      ['channels', 'net-sales', 'direct'],
      ['regions', 'shop-sales', 'indirect'],
    ]);
    expect(plan.series.find((s) => s.id === 'payroll')).toMatchObject({target: 'payroll-budget', better: 'lower'});
    // The budgets come from the workbook (the cost plan with the months across), the repairs from the Parquet job
    // log through DuckDB.
    expect(plan.sources.map((s) => [s.id, s.reader, s.layout])).toEqual([
      ['trading', 'csv', 'wide'], ['web', 'csv', 'long'], ['budget', 'xlsx', 'wide'], ['cost-plan', 'xlsx', 'across'],
      ['repairs', 'duckdb', 'wide'],
    ]);
    expect(plan.series.filter((s) => s.source === 'cost-plan').map((s) => [s.id, s.column])).toEqual([
      ['payroll-budget', 'Payroll'], ['marketing-budget', 'Marketing'],
    ]);
    // The plan sheet holds the trading file's budget columns, month for month: read either way, the same series.
    const fromCsv = {
      ...plan,
      series: plan.series.map((s) =>
        s.source === 'cost-plan' ? {...s, source: 'trading', column: s.id.replace('-', '_')} : s,
      ),
    };
    const [across, wide] = [await readPack(plan), await readPack(fromCsv)];
    for (const id of ['payroll-budget', 'marketing-budget']) {
      const [a, w] = [across, wide].map((d) => d.series[d.plans.findIndex((s) => s.id === id)]);
      expect([a.start, [...a.values], [...a.ahead]]).toEqual([w.start, [...w.values], [...w.ahead]]);
    }
    expect(plan.series.filter((s) => s.source === 'repairs').map((s) => s.aggregate)).toEqual(['sum', 'count']);
    // The `fromSource: web` entry is expanded by ingest into web-sessions and web-orders.
    expect((plan as unknown as {fromSource: {source: string}[]}).fromSource.map((f) => f.source)).toEqual(['web']);
    expect(plan.series.find((s) => s.id === 'sales-budget')!.hidden).toBe(true);
    expect(plan.series.find((s) => s.id === 'net-sales')!.target).toBe('sales-budget');
    expect(plan.branding.logo).toBe(join(dir, 'logo.svg'));
  });

  it('quarterly pack loads', async () => {
    const plan = await loadPlan(join(dir, 'quarterly-pack.yaml'));
    expect(plan.frequency).toBe('quarterly');
    expect(plan.series).toHaveLength(7);
    expect(plan.sources[0]).toMatchObject({delimiter: ';', decimal: ','});
  });
});
