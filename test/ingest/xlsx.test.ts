import {join} from 'node:path';
import ExcelJS from 'exceljs';
import {describe, expect, it} from 'vitest';
import {monthIndex} from '../../src/time/period.js';
import {sheetReference} from '../../src/ingest/places.js';
import {FIXTURES, fromSource, plan, problemsOf, readPack, scratch, series, source} from './plan.js';

const {dir: temp} = scratch('xlsx');

/**
 * Workbooks written by a second, independent writer: test/reference/xlsx.py (openpyxl, version in
 * test/fixtures/ingest/openpyxl.json) writes the same data as two workbooks (1900 and 1904 date systems) and as CSV.
 * Read through ingest and derive, the workbooks must give exactly the CSV's values.
 */
const wide = (file: string, more = {}) =>
  plan('monthly', [source('b', file, {dateColumn: 'Month', ...more})], [series('budget', 'b', {column: 'Budget'}), series('stock', 'b', {column: 'Stock', kind: 'stock'})]);
const long = (file: string, more = {}) =>
  plan('monthly', [source('l', file, {layout: 'long', dateColumn: 'at', keyColumn: 'shop', valueColumn: 'amount', ...more})], [], {
    fromSource: [fromSource('l', 0)],
  });
const values = (d: Awaited<ReturnType<typeof readPack>>) => d.series.map((s) => [s.id, s.start, [...s.values]]);

describe('XLSX sources written by openpyxl', () => {
  it.each(['openpyxl-1900.xlsx', 'openpyxl-1904.xlsx'])('%s, sheet Budget from header row 3, equals the CSV', async (name) => {
    const fromCsv = await readPack(wide('openpyxl.csv'));
    const fromXlsx = await readPack(wide(name, {sheet: 'Budget', headerRow: 3}));
    expect(fromXlsx.series[0].start).toBe(monthIndex(2024, 1));
    expect(values(fromXlsx)).toEqual(values(fromCsv));
    expect(fromXlsx.inputs[0]).toMatchObject({file: join(FIXTURES, name), rows: 30});
  });

  it('numbers typed as text with decimal commas read with `decimal: ","`; number cells read the same either way', async () => {
    const byDot = await readPack(wide('openpyxl-1900.xlsx', {sheet: 'Budget', headerRow: 3}));
    const byComma = await readPack(wide('openpyxl-1900.xlsx', {sheet: 'Budget', headerRow: 3, decimal: ','}));
    expect(values(byComma)).toEqual(values(byDot));
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Umsatz');
    ws.addRow(['Month', 'Budget', 'Stock']);
    ws.addRow(['2026-01', '1.234,50', 0.1 + 0.2]);
    ws.addRow(['2026-02', 1001.25, '-2,5']);
    const file = join(temp, 'text-numbers.xlsx');
    await wb.xlsx.writeFile(file);
    const d = await readPack(wide(file, {decimal: ','}));
    expect(values(d)).toEqual([
      ['budget', monthIndex(2026, 1), [1234.5, 1001.25]],
      ['stock', monthIndex(2026, 1), [0.1 + 0.2, -2.5]],
    ]);
    // Without the setting, the problem names it, as for a CSV.
    expect((await problemsOf(wide(file)))[0].message).toMatch(/"1\.234,50" .* set `decimal: ","` on the source$/);
  });

  it.each(['openpyxl-1900.xlsx', 'openpyxl-1904.xlsx'])('%s, long sheet of timestamps aggregated to months, equals the CSV', async (name) => {
    const fromCsv = await readPack(long('openpyxl-long.csv'));
    const fromXlsx = await readPack(long(name, {sheet: 'Long'}));
    expect(values(fromXlsx)).toEqual(values(fromCsv));
    // 75 days from 1 January 2024: January and February whole, March (to 15 March) left out.
    expect(fromXlsx.series.map((s) => s.values.length)).toEqual([2, 2]);
  });
});

describe('XLSX problems at file.xlsx:Sheet!B12', () => {
  it('a missing sheet lists the sheets; an empty header row names headerRow', async () => {
    const p1 = await problemsOf(wide('openpyxl-1900.xlsx', {sheet: 'budget'}));
    expect(p1[0].message).toBe('the workbook has no sheet "budget" (did you mean "Budget"?); the sheets are: "Budget", "Long"');
    const p2 = await problemsOf(wide('openpyxl-1900.xlsx', {sheet: 'Budget', headerRow: 40}));
    expect(p2[0].message).toMatch(/headerRow is 40 but the data has only 33 lines/);
  });

  it('formula cells through their cached results; one without a result is a problem at its cell', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Plan');
    ws.addRow(['Month', 'Budget']);
    ws.addRow([new Date(Date.UTC(2026, 0, 1)), 10]);
    ws.addRow([new Date(Date.UTC(2026, 1, 1)), {formula: 'B2*2', result: 20}]);
    ws.addRow([new Date(Date.UTC(2026, 2, 1)), {formula: 'B3+1', result: 21}]);
    const good = join(temp, 'formulas.xlsx');
    await wb.xlsx.writeFile(good);
    const d = await readPack(plan('monthly', [source('p', good, {dateColumn: 'Month'})], [series('budget', 'p', {column: 'Budget'})]));
    expect([...d.series[0].values]).toEqual([10, 20, 21]);
    ws.getCell('B4').value = {formula: 'B3+1'} as ExcelJS.CellFormulaValue;
    ws.getCell('B3').value = {error: '#DIV/0!'} as ExcelJS.CellErrorValue;
    const bad = join(temp, 'uncalculated.xlsx');
    await wb.xlsx.writeFile(bad);
    const problems = await problemsOf(plan('monthly', [source('p', bad, {dateColumn: 'Month'})], [series('budget', 'p', {column: 'Budget'})]));
    expect(problems.map((p) => [p.file.replace(temp, ''), p.line, p.message.slice(0, 40)])).toEqual([
      ['/uncalculated.xlsx:Plan!B3', null, 'the cell holds the error #DIV/0!; fix th'],
      ['/uncalculated.xlsx:Plan!B4', null, 'the formula =B3+1 has no stored result ('],
    ]);
  });

  it('unusable cells the pack does not read (a column no series uses, a totals row) are not problems', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Plan');
    ws.addRow(['Month', 'Budget', 'Ratio']);
    ws.addRow([new Date(Date.UTC(2026, 0, 1)), 10, {error: '#DIV/0!'}]);
    ws.addRow([new Date(Date.UTC(2026, 1, 1)), 20, 0.5]);
    ws.addRow(['Total', {formula: 'SUM(B2:B3)'}, {formula: 'B3/B2'}]);
    const file = join(temp, 'footer.xlsx');
    await wb.xlsx.writeFile(file);
    const d = await readPack(plan('monthly', [source('p', file, {dateColumn: 'Month'})], [series('budget', 'p', {column: 'Budget'})]));
    expect([...d.series[0].values]).toEqual([10, 20]);
    expect(d.notes.map((n) => [n.file, n.note?.code])).toContainEqual([`${file}:Plan!4:4`, 'footerIgnored']);
    // Read by a series, the error cell is a problem again; so is a date cell without a value.
    const ratio = await problemsOf(plan('monthly', [source('p', file, {dateColumn: 'Month'})], [series('ratio', 'p', {column: 'Ratio'})]));
    expect(ratio.map((p) => [p.file.replace(temp, ''), p.message.slice(0, 36)])).toEqual([
      ['/footer.xlsx:Plan!C2', 'the cell holds the error #DIV/0!; fi'],
    ]);
    ws.getCell('A3').value = {formula: 'A2+31'} as ExcelJS.CellFormulaValue;
    await wb.xlsx.writeFile(file);
    const date = await problemsOf(plan('monthly', [source('p', file, {dateColumn: 'Month'})], [series('budget', 'p', {column: 'Budget'})]));
    expect(date.map((p) => [p.file.replace(temp, ''), p.message.slice(0, 30)])).toContainEqual([
      '/footer.xlsx:Plan!A3',
      'the formula =A2+31 has no stor',
    ]);
  });

  it('title rows above the header: the problem names the row that holds the column', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Plan');
    ws.addRow(['Budget 2026, approved 3 November']);
    ws.addRow([]);
    ws.addRow(['Month', 'Budget']);
    ws.addRow(['2026-01', 10]);
    const file = join(temp, 'titled.xlsx');
    await wb.xlsx.writeFile(file);
    const problems = await problemsOf(plan('monthly', [source('p', file, {dateColumn: 'Month'})], [series('b', 'p', {column: 'Budget'})]));
    expect(problems.map((p) => p.message)).toEqual([
      'date column "Month" is not in the header, which holds only "Budget 2026, approved 3 November"; row 3 holds it: set `headerRow: 3` on the source',
      'column of series b "Budget" is not in the header, which holds only "Budget 2026, approved 3 November"; row 3 holds it: set `headerRow: 3` on the source',
    ]);
    const d = await readPack(plan('monthly', [source('p', file, {dateColumn: 'Month', headerRow: 3})], [series('b', 'p', {column: 'Budget'})]));
    expect([...d.series[0].values]).toEqual([10]);
  });

  it('sheet references: plain names as they are, others quoted with quotes doubled', () => {
    // The quoting of sheet names in cell references of spreadsheet formulas (ECMA-376 Part 1 formula grammar,
    // OpenFormula), recalled from memory: no reference library for it is on this machine.
    expect(['Budget', 'Plan_2026', 'FY.26', 'Plan 2026', "Tom's", '2026', 'Q1', 'Umsätze', 'Plan-B'].map(sheetReference)).toEqual([
      'Budget',
      'Plan_2026',
      'FY.26',
      "'Plan 2026'",
      "'Tom''s'",
      "'2026'",
      "'Q1'",
      'Umsätze',
      "'Plan-B'",
    ]);
  });

  it('a bad number points at its cell; a sheet name with a space is quoted there, as formulas write it', async () => {
    for (const [name, reference] of [
      ['Plan', 'Plan'],
      ['Plan 2026', "'Plan 2026'"],
    ]) {
      const wb = new ExcelJS.Workbook();
      const ws = wb.addWorksheet(name);
      ws.addRow(['Month', 'Budget']);
      ws.addRow(['2026-01', 'ten']);
      const file = join(temp, 'text.xlsx');
      await wb.xlsx.writeFile(file);
      const pack = plan('monthly', [source('p', file, {dateColumn: 'Month', sheet: name})], [series('budget', 'p', {column: 'Budget'})]);
      const problems = await problemsOf(pack);
      expect(problems[0].file).toBe(`${file}:${reference}!B2`);
      expect(problems[0].message).toMatch(/^"ten" in column "Budget" is not a number/);
    }
  });

  it('bad cells of one kind: three listed, the rest counted in one line at the sheet, by row', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Plan 2026');
    ws.addRow(['Month', 'Budget']);
    for (let m = 1; m <= 60; m++) ws.addRow([`${2021 + Math.floor((m - 1) / 12)}-${String(((m - 1) % 12) + 1).padStart(2, '0')}`, `${m} EUR`]);
    const file = join(temp, 'units.xlsx');
    await wb.xlsx.writeFile(file);
    const pack = plan('monthly', [source('p', file, {dateColumn: 'Month', sheet: 'Plan 2026'})], [series('budget', 'p', {column: 'Budget'})]);
    const problems = await problemsOf(pack);
    expect(problems.map((p) => p.file)).toEqual([2, 3, 4].map((r) => `${file}:'Plan 2026'!B${r}`).concat(`${file}:Plan 2026`));
    expect(problems[3]).toMatchObject({message: '57 more like the 3 above in column "Budget", the last on row 61', count: 57});
  });
});
