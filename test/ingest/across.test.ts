import {join} from 'node:path';
import ExcelJS from 'exceljs';
import {describe, expect, it} from 'vitest';
import {monthIndex} from '../../src/time/period.js';
import {fromSource, plan, problemsOf, readPack, scratch, series, source} from './plan.js';
import {worded} from '../fixtures/notes.js';

const {dir: temp, write} = scratch('across');

/**
 * Layout across: a budget sheet, one row per series and the periods across the header. The same figures written as
 * a long CSV (the layout the other tests check against R and openpyxl) must read into the same series.
 */
const values = (d: Awaited<ReturnType<typeof readPack>>) => d.series.map((s) => [s.id, s.start, [...s.values]]);

const MONTHS = ['Jan 2026', 'Feb 2026', 'Mar 2026', 'Apr 2026'];
const ROWS: [string, number[]][] = [
  ['Net sales', [1000.5, 1100, 1250.25, 1300]],
  ['Payroll', [400, 410, 0, 430]],
];

describe('layout across', () => {
  it('reads a budget sheet as its long twin: title lines, a unit and a total column, a spacer row', async () => {
    const lines = [
      'Budget 2026',
      '',
      `Line item,Unit,${MONTHS.join(',')},Total`,
      ...ROWS.map(([k, v]) => `${k},EUR k,${v.join(',')},${v.reduce((a, b) => a + b, 0)}`),
      `,,${MONTHS.map(() => '').join(',')},`,
    ];
    const across = write('budget.csv', `${lines.join('\n')}\n`);
    const longText = ROWS.flatMap(([k, v]) => v.map((x, i) => `2026-${String(i + 1).padStart(2, '0')},${k},${x}`));
    const long = write('budget-long.csv', `month,item,amount\n${longText.join('\n')}\n`);
    const fromAcross = await readPack(
      plan('monthly', [source('b', across, {layout: 'across', keyColumn: 'Line item', headerRow: 3})], [], {
        fromSource: [fromSource('b', 0)],
      }),
    );
    const fromLong = await readPack(
      plan('monthly', [source('b', long, {layout: 'long', keyColumn: 'item', valueColumn: 'amount'})], [], {
        fromSource: [fromSource('b', 0)],
      }),
    );
    expect(values(fromAcross)).toEqual(values(fromLong));
    expect(fromAcross.plans.map((p) => [p.id, p.label])).toEqual([
      ['net-sales', 'Net sales'],
      ['payroll', 'Payroll'],
    ]);
    expect(fromAcross.series[0].start).toBe(monthIndex(2026, 1));
  });

  it('a row the pack names and the sheet lacks is a problem with the nearest name; a bad cell points at its column', async () => {
    const text = `item,${MONTHS.join(',')}\nNet sales,1,2,3,4\nPayroll,5,6,7x,8\n`;
    const file = write('names.csv', text);
    const src = source('b', file, {layout: 'across', keyColumn: 'item'});
    const problems = await problemsOf(
      plan('monthly', [src], [series('sales', 'b', {column: 'Net Sales'}), series('payroll', 'b', {column: 'Payroll'})]),
    );
    expect(problems.map((p) => [p.line, p.column, p.message])).toEqual([
      [3, 4, '"7x" in column "Mar 2026" is not a number: write a number such as 1234.5, or leave the cell blank or NA when the value is missing'],
      [expect.any(Number), null, expect.stringMatching(/"Net Sales".*did you mean "Net sales"/)],
    ]);
  });

  it('a header without periods, and a quarter over a monthly pack, are problems that say what to write', async () => {
    const none = write('none.csv', 'item,Unit,Total\nNet sales,EUR,10\n');
    const p1 = await problemsOf(plan('monthly', [source('b', none, {layout: 'across', keyColumn: 'item'})], [series('s', 'b', {column: 'Net sales'})]));
    expect(p1[0].message).toBe(
      'no column of the header names a period (it holds "item", "Unit", "Total"); with layout across, head each column of values with its period, such as 2026-10, Oct 2026 or a date cell',
    );
    const quarters = write('quarters.csv', 'item,2026-Q1,2026-Q2\nNet sales,10,11\n');
    const p2 = await problemsOf(plan('monthly', [source('b', quarters, {layout: 'across', keyColumn: 'item'})], [series('s', 'b', {column: 'Net sales'})]));
    expect(p2[0]).toMatchObject({line: 1});
    expect(p2[0].message).toMatch(/^the header holds quarterly periods \("2026-Q1"\) but the pack is monthly/);
    // Among months, a quarter's subtotal column is only a column not read, and a data note names it.
    const subtotals = write('subtotals.csv', 'item,Jan 2026,Feb 2026,Mar 2026,Q1 2026,Mrz 2026\nNet sales,1,2,3,6,3\n');
    const d = await readPack(plan('monthly', [source('b', subtotals, {layout: 'across', keyColumn: 'item'})], [series('s', 'b', {column: 'Net sales'})]));
    expect(values(d)).toEqual([['s', monthIndex(2026, 1), [1, 2, 3]]]);
    expect(d.notes.map((n) => worded(n))).toContain('2 columns of the header name no period and were not read: "Q1 2026", "Mrz 2026"');
  });

  it('slash dates across the header: the problem names the dateFormat, from a date that shows the order', async () => {
    const text = 'item,01/01/2026,01/02/2026,01/03/2026\nNet sales,1,2,3\n';
    const file = write('slashes.csv', text);
    const src = source('b', file, {layout: 'across', keyColumn: 'item'});
    const wanted = [series('s', 'b', {column: 'Net sales'})];
    expect((await problemsOf(plan('monthly', [src], wanted)))[0].message).toBe(
      'the header\'s periods are dates such as "01/01/2026", which could be day first or month first: add `dateFormat: DD/MM/YYYY` or `dateFormat: MM/DD/YYYY` to the source (whichever the export writes)',
    );
    const later = write('slashes-later.csv', text.replace('01/03/2026', '31/03/2026'));
    const withDay = plan('monthly', [source('b', later, {layout: 'across', keyColumn: 'item'})], wanted);
    expect((await problemsOf(withDay))[0].message).toBe(
      'the header\'s periods are day-first dates such as "31/03/2026": add `dateFormat: DD/MM/YYYY` to the source',
    );
    // With it, the last day of March names March.
    const read = await readPack(plan('monthly', [source('b', later, {layout: 'across', keyColumn: 'item', dateFormat: 'DD/MM/YYYY'})], wanted));
    expect(values(read)).toEqual([['s', monthIndex(2026, 1), [1, 2, 3]]]);
  });

  it('a workbook headed by date cells (first or last day of each month) names whole months', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Plan 2026');
    const firsts = [0, 1, 2].map((m) => new Date(Date.UTC(2026, m, 1)));
    const lasts = [0, 1, 2].map((m) => new Date(Date.UTC(2026, m + 1, 0)));
    ws.addRow(['Account', ...firsts, 'FY total']);
    ws.addRow(['Revenue', 10, 11, 12, 33]);
    const first = join(temp, 'firsts.xlsx');
    await wb.xlsx.writeFile(first);
    ws.getRow(1).values = ['Account', ...lasts, 'FY total'];
    const last = join(temp, 'lasts.xlsx');
    await wb.xlsx.writeFile(last);
    for (const file of [first, last]) {
      const d = await readPack(
        plan('monthly', [source('p', file, {layout: 'across', keyColumn: 'Account', sheet: 'Plan 2026'})], [series('revenue', 'p', {column: 'Revenue'})]),
      );
      // Whole months, none left out as incomplete.
      expect(values(d)).toEqual([['revenue', monthIndex(2026, 1), [10, 11, 12]]]);
      expect(d.inputs[0]).toMatchObject({sheet: 'Plan 2026', rows: 1});
    }
  });
});
