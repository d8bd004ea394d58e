import {afterEach, describe, expect, it, vi} from 'vitest';
import ExcelJS from 'exceljs';
import {parse} from 'csv-parse/sync';
import {buildTables, exportTables, neutralise} from '../../src/render/exports.js';
import {sheetNames} from '../../src/render/exportsXlsx.js';
import type {Report} from '../../src/render/types.js';
import type {History} from '../../src/results/index.js';
import {makeAdjustment, makeAnalysis, makeChanges, makePlan, makeSeriesPlan, OCT_2026} from '../narrate/fixtures.js';

const EVIL = '=HYPERLINK("http://x","y")';

function report(history: History | null = null): Report {
  const original = [10, -1.5, NaN, 12.25, 0.1 + 0.2, 11];
  const n = original.length;
  const analysis = makeAnalysis(original, {
    adjustment: makeAdjustment(n, {adjusted: original.map((v) => v * 0.5), trend: original.map(() => 9.75)}),
    changes: makeChanges({yearOnYear: -3.25, yearOnYearSeries: new Array<number>(n).fill(NaN)}),
    forecast: {
      method: 'Seasonal naive',
      startOffset: n,
      mean: [11, 12],
      levels: [80, 95],
      lower: {'80': [10, 10.5], '95': [9, 9.5]},
      upper: {'80': [12, 13.5], '95': [13, 14.5]},
      backtest: {
        origins: 6,
        horizon: 2,
        mase: 1.2,
        smape: 8.5,
        benchmarks: [{method: 'Naive', mase: 1.4, smape: 9}],
        points: [],
      },
      options: {},
      notes: [],
    },
  });
  const plan = makeSeriesPlan({id: 'net-sales', label: EVIL, unit: '@SUM(1)'});
  return {
    plan: makePlan(),
    period: OCT_2026,
    periodLabel: '2026-10',
    toolVersion: '0.1.0',
    series: [
      {
        plan,
        analysis,
        callouts: [
          {
            id: 'net-sales/year-on-year',
            seriesId: 'net-sales',
            rule: 'year-on-year',
            severity: 'info',
            rank: 120,
            text: `${EVIL} came to 11`,
            figures: {value: 11, change: NaN},
            chart: 'chart-net-sales-yoy',
          },
        ],
      },
      {plan: makeSeriesPlan({id: 'budget', hidden: true}), analysis: makeAnalysis([1, 2, 3]), callouts: []},
    ],
    callouts: [],
    inputs: [],
    notes: [],
    history,
  };
}

const history: History = {
  previousPeriod: '2026-09',
  revisions: [
    {
      seriesId: 'net-sales',
      period: '2026-09',
      kind: 'data',
      measure: 'original',
      previous: 10,
      current: 10.5,
      revisionPct: 5,
      large: true,
    },
  ],
  tracking: [
    {
      seriesId: 'net-sales',
      publishedIn: '2026-09',
      period: '2026-10',
      horizon: 1,
      forecast: 10.5,
      actual: 11,
      error: 0.5,
      inside: {'80': true, '95': true},
    },
  ],
  trackingSummary: [],
};

function csvOf(name: string, h: History | null = null): string {
  const file = exportTables(report(h)).csv.find((c) => c.name === name);
  if (!file) throw new Error(`no ${name}`);
  return file.content;
}

afterEach(() => {
  vi.useRealTimers();
});

describe('neutralise', () => {
  it('prefixes every formula trigger with a quote (OWASP CSV injection guidance, ASVS 1.2.10)', () => {
    for (const t of ['=1+1', '+1', '-2', '@SUM(1)', '\t=1', '\r=1', ' =1', '\uFF1D1']) expect(neutralise(t)).toBe(`'${t}`);
    for (const t of ['Net sales', '2026-10', "'already", '']) expect(neutralise(t)).toBe(t);
  });
});

describe('exportTables: CSV', () => {
  it('writes a BOM, CRLF rows and the expected files', () => {
    const names = exportTables(report(history)).csv.map((c) => c.name);
    expect(names).toEqual(['summary.csv', 'series-net-sales.csv', 'forecasts.csv', 'backtest.csv', 'callouts.csv', 'revisions.csv', 'tracking.csv']);
    const csv = csvOf('series-net-sales.csv');
    expect(csv.startsWith('\uFEFFperiod,original,adjusted,trend,seasonal,irregular,calendar,cycle_gap_pct,year_on_year_pct\r\n')).toBe(true);
  });

  it('keeps numbers as numbers at full precision, empty where missing', () => {
    const lines = csvOf('series-net-sales.csv').split('\r\n');
    expect(lines[2]).toBe('2026-06,-1.5,-0.75,9.75,1,1,,,');
    expect(lines[3]).toBe('2026-07,,,9.75,1,1,,,');
    expect(lines[5]).toBe('2026-09,0.30000000000000004,0.15000000000000002,9.75,1,1,,,');
  });

  it('neutralises user text and the text of callouts', () => {
    const rows = parse(csvOf('summary.csv'), {bom: true}) as string[][];
    expect(rows[1][1]).toBe(`'${EVIL}`);
    expect(rows[1][2]).toBe("'@SUM(1)");
    expect(rows[1][7]).toBe('-3.25'); // a number, unquoted and unprefixed
    expect(csvOf('summary.csv')).toContain(',-3.25,');
    const callouts = parse(csvOf('callouts.csv'), {bom: true}) as string[][];
    expect(callouts[1][5]).toBe(`'${EVIL} came to 11`);
    expect(callouts[1][7]).toBe('{"value":11,"change":null}');
  });

  it('lists forecasts with bounds per level, and leaves hidden series out', () => {
    const rows = parse(csvOf('forecasts.csv'), {bom: true}) as string[][];
    expect(rows).toEqual([
      ['series', 'period', 'horizon', 'mean', 'lower_80', 'upper_80', 'lower_95', 'upper_95'],
      ['net-sales', '2026-11', '1', '11', '10', '12', '9', '13'],
      ['net-sales', '2026-12', '2', '12', '10.5', '13.5', '9.5', '14.5'],
    ]);
    expect(exportTables(report()).csv.map((c) => c.name)).not.toContain('series-budget.csv');
  });
});

describe('exportTables: XLSX', () => {
  async function load(bytes: Uint8Array) {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(Buffer.from(bytes) as unknown as ArrayBuffer);
    return wb;
  }

  it('neutralises user text, keeps numbers numeric and freezes the header', async () => {
    const wb = await load(await exportTables(report(history)).xlsx());
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Summary', 'net-sales', 'Forecasts', 'Back-test', 'Callouts', 'Revisions', 'Tracking']);
    const summary = wb.getWorksheet('Summary')!;
    expect(summary.getCell('B2').value).toBe(`'${EVIL}`);
    expect(summary.getCell('B2').type).toBe(ExcelJS.ValueType.String);
    expect(summary.getCell('C2').value).toBe("'@SUM(1)");
    expect(summary.getCell('H2').value).toBe(-3.25);
    const series = wb.getWorksheet('net-sales')!;
    expect(series.getCell('B3').value).toBe(-1.5);
    expect(series.getCell('B3').type).toBe(ExcelJS.ValueType.Number);
    expect(series.getCell('B4').value).toBe(null);
    expect(series.getCell('B3').numFmt).toBe('#,##0.00');
    expect(series.views[0]).toMatchObject({state: 'frozen', ySplit: 1});
    expect(wb.getWorksheet('Callouts')!.getCell('F2').value).toBe(`'${EVIL} came to 11`);
    let formulas = 0;
    wb.eachSheet((ws) => ws.eachRow((row) => row.eachCell((c) => (formulas += c.type === ExcelJS.ValueType.Formula ? 1 : 0))));
    expect(formulas).toBe(0);
  });

  it('gives the same bytes whatever the clock says, dated by the review period', async () => {
    vi.useFakeTimers({toFake: ['Date']});
    vi.setSystemTime(new Date('2030-01-01T10:00:00Z'));
    const a = await exportTables(report()).xlsx();
    vi.setSystemTime(new Date('2031-06-15T17:33:21Z'));
    const b = await exportTables(report()).xlsx();
    vi.useRealTimers();
    expect(Buffer.from(a).equals(Buffer.from(b))).toBe(true);
    const wb = await load(a);
    expect(wb.created.toISOString()).toBe('2026-11-01T00:00:00.000Z');
  });
});

describe('sheetNames', () => {
  it('makes names valid (≤ 31 characters, no []:*?/\\) and unique ignoring case', () => {
    const names = sheetNames(['Summary', 'summary', 'a/b:c', 'x'.repeat(40), 'x'.repeat(40), "'quoted'", '']);
    expect(names).toEqual(['Summary', 'summary~2', 'a_b_c', 'x'.repeat(31), `${'x'.repeat(29)}~2`, 'quoted', 'Sheet']);
    for (const n of names) expect(n.length).toBeLessThanOrEqual(31);
  });

  it('keeps series sheets apart from the fixed sheets', () => {
    const r = report();
    r.series[0].plan = makeSeriesPlan({id: 'summary'});
    expect(sheetNames(buildTables(r).map((t) => t.sheet))).toEqual(['Summary', 'summary~2', 'Forecasts', 'Back-test', 'Callouts']);
  });
});
