import {stringify} from 'csv-stringify/sync';
import type {SeriesAnalysis} from '../analyse/types.js';
import {formatPeriod} from '../time/period.js';
import type {Report} from './types.js';
import type {Cell, Column, ColumnFormat, Table} from './table.js';


/**
 * The numbers behind every table and chart of the report, as CSV files and one XLSX workbook.
 *
 * Tables: `summary`, one `series-<id>` per visible series (period, original, adjusted, trend, seasonal,
 * irregular, cycle gap, year-on-year %), `forecasts` (mean and lower/upper per level), `backtest`,
 * `callouts`, and when an earlier pack exists `revisions` and `tracking`.
 *
 * Safety (OWASP CSV injection guidance; ASVS 1.2.10): every text cell whose first non-blank character is
 * `=`, `+`, `-`, `@`, tab, CR, LF or NUL (or a full-width `＝＋－＠`) gets a leading single quote, in CSV and
 * XLSX alike; csv-stringify's `escape_formulas` is on as well. Numbers are written as numbers, never as
 * text, so `-1.5` stays a number and is not quoted. Missing values (NaN) are empty cells.
 *
 * CSV: RFC 4180 quoting, CRLF line ends, UTF-8 with a byte-order mark (spreadsheet programs need it to read UTF-8).
 * XLSX: see {@link writeXlsx}; deterministic bytes for the same report.
 */
export function exportTables(report: Report): {
  csv: {name: string; content: string}[];
  xlsx: () => Promise<Uint8Array>;
} {
  const tables = buildTables(report);
  return {
    csv: tables.map((t) => ({name: `${t.name}.csv`, content: toCsv(t)})),
    // The workbook library is loaded only when a workbook is asked for (it adds about 0.4 s to start-up).
    xlsx: async () => (await import('./exportsXlsx.js')).writeXlsx(tables, report),
  };
}

/** Triggers of formula evaluation in spreadsheet programs, as the first non-blank character of a cell. */
const FORMULA_START = /^[\s\u0000]*[=+\-@\t\r\n\u0000\uFF1D\uFF0B\uFF0D\uFF20]/;

/** A text cell made inert for spreadsheets: a leading `'` when it could start a formula (see exportTables). */
export function neutralise(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

/** Non-finite numbers become empty cells; text is neutralised. */
export function cell(value: string | number | null | undefined): Cell {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number') return Number.isFinite(value) ? value : null;
  return neutralise(value);
}

export function toCsv(table: Table): string {
  return stringify([table.columns.map((c) => c.header), ...table.rows], {
    bom: true,
    escape_formulas: true,
    record_delimiter: '\r\n',
    cast: {number: (n) => String(n)},
  });
}

/** Every table of the report, in workbook order. */
export function buildTables(report: Report): Table[] {
  const visible = report.series.filter((s) => !s.plan.hidden);
  const tables: Table[] = [summaryTable(report)];
  for (const s of visible) tables.push(seriesTable(s.plan.id, s.analysis));
  tables.push(forecastTable(report), backtestTable(report), calloutTable(report));
  if (report.history) tables.push(revisionTable(report), trackingTable(report));
  return tables;
}

const text = (header: string): Column => ({header, format: 'text'});
const num = (header: string): Column => ({header, format: 'number'});
const pct = (header: string): Column => ({header, format: 'percent'});

function seriesTable(id: string, a: SeriesAnalysis): Table {
  const adj = a.adjustment;
  const rows = a.original.map((original, i) => [
    formatPeriod(a.frequency, a.start + i),
    cell(original),
    cell(adj?.adjusted[i]),
    cell(adj?.trend[i] ?? a.cycle?.trend[i]),
    cell(adj?.seasonal[i]),
    cell(adj?.irregular[i]),
    cell(adj?.calendar?.effect[i]),
    cell(a.cycle?.gap[i]),
    cell(a.changes.yearOnYearSeries[i]),
  ]);
  const componentFormat: ColumnFormat = adj?.model === 'multiplicative' ? 'factor' : 'number';
  return {
    name: `series-${id}`,
    sheet: id,
    columns: [
      text('period'),
      num('original'),
      num('adjusted'),
      num('trend'),
      {header: 'seasonal', format: componentFormat},
      {header: 'irregular', format: componentFormat},
      {header: 'calendar', format: componentFormat},
      pct('cycle_gap_pct'),
      pct('year_on_year_pct'),
    ],
    rows,
  };
}

function forecastTable(report: Report): Table {
  const levels = [...new Set(report.series.flatMap((s) => s.analysis.forecast?.levels ?? []))].sort((x, y) => x - y);
  const rows: Cell[][] = [];
  for (const s of report.series) {
    const f = s.analysis.forecast;
    if (s.plan.hidden || !f) continue;
    f.mean.forEach((mean, i) => {
      const bounds = levels.flatMap((l) => [cell(f.lower[String(l)]?.[i]), cell(f.upper[String(l)]?.[i])]);
      const period = formatPeriod(s.analysis.frequency, s.analysis.start + f.startOffset + i);
      rows.push([cell(s.plan.id), period, cell(i + 1), cell(mean), ...bounds]);
    });
  }
  return {
    name: 'forecasts',
    sheet: 'Forecasts',
    columns: [
      text('series'),
      text('period'),
      {header: 'horizon', format: 'integer'},
      num('mean'),
      ...levels.flatMap((l) => [num(`lower_${l}`), num(`upper_${l}`)]),
    ],
    rows,
  };
}

function summaryTable(report: Report): Table {
  const rows = report.series
    .filter((s) => !s.plan.hidden)
    .map(({plan: p, analysis: a}) => {
      const last = a.end - a.start;
      const b = a.forecast?.backtest ?? null;
      const o = a.outturn;
      return [
        cell(p.id),
        cell(p.label),
        cell(p.unit),
        p.kind,
        formatPeriod(a.frequency, a.end),
        cell(a.original[last]),
        cell(a.adjustment?.adjusted[last]),
        cell(a.changes.yearOnYear),
        cell(a.changes.periodOnPeriodAdjusted),
        cell(a.changes.periodOnPeriodAnnualised),
        cell(a.changes.trend),
        a.changes.trendDirection,
        cell(a.changes.yearToDate),
        cell(a.adjustment?.model),
        cell(a.cycle?.phase),
        cell(a.cycle?.gap[last]),
        cell(a.forecast?.method),
        cell(a.forecast?.mean[0]),
        cell(o?.fiscalYear),
        cell(o?.total),
        cell(o?.target),
        cell(o?.gapPct),
        cell(b?.mase),
        cell(b?.smape),
      ];
    });
  return {
    name: 'summary',
    sheet: 'Summary',
    columns: [
      text('series'),
      text('label'),
      text('unit'),
      text('kind'),
      text('period'),
      num('value'),
      num('adjusted'),
      pct('year_on_year_pct'),
      pct('adjusted_change_pct'),
      pct('adjusted_change_annualised_pct'),
      pct('trend_change_pct'),
      text('trend_direction'),
      pct('year_to_date_pct'),
      text('model'),
      text('cycle_phase'),
      pct('cycle_gap_pct'),
      text('forecast_method'),
      num('forecast_next'),
      text('fiscal_year'),
      num('outturn'),
      num('target'),
      pct('target_gap_pct'),
      num('mase'),
      pct('smape_pct'),
    ],
    rows,
  };
}

function backtestTable(report: Report): Table {
  const rows: Cell[][] = [];
  for (const s of report.series) {
    const f = s.analysis.forecast;
    const b = f?.backtest;
    if (s.plan.hidden || !f || !b) continue;
    const row = (method: string, role: string, mase: number, smape: number): Cell[] => [
      cell(s.plan.id),
      cell(method),
      role,
      cell(mase),
      cell(smape),
      cell(b.origins),
      cell(b.horizon),
    ];
    rows.push(row(f.method, 'model', b.mase, b.smape));
    for (const m of b.benchmarks) rows.push(row(m.method, 'benchmark', m.mase, m.smape));
  }
  return {
    name: 'backtest',
    sheet: 'Back-test',
    columns: [
      text('series'),
      text('method'),
      text('role'),
      num('mase'),
      pct('smape_pct'),
      {header: 'origins', format: 'integer'},
      {header: 'horizon', format: 'integer'},
    ],
    rows,
  };
}

function calloutTable(report: Report): Table {
  const inPack = new Map(report.callouts.map((c, i) => [c.id, i + 1]));
  const rows = report.series.flatMap((s) =>
    s.callouts.map((c) => [
      cell(inPack.get(c.id) ?? null),
      cell(c.seriesId),
      cell(c.rule),
      cell(c.severity),
      cell(c.rank),
      cell(c.text),
      cell(c.chart),
      cell(JSON.stringify(c.figures, (_, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v))),
    ]),
  );
  return {
    name: 'callouts',
    sheet: 'Callouts',
    columns: [
      {header: 'summary_position', format: 'integer'},
      text('series'),
      text('rule'),
      text('severity'),
      num('rank'),
      text('text'),
      text('chart'),
      text('figures'),
    ],
    rows,
  };
}

function revisionTable(report: Report): Table {
  const rows = (report.history?.revisions ?? []).map((r) => [
    cell(r.seriesId),
    cell(r.period),
    cell(r.kind),
    cell(r.measure),
    cell(r.previous),
    cell(r.current),
    cell(r.revisionPct),
    r.large ? 'yes' : 'no',
  ]);
  return {
    name: 'revisions',
    sheet: 'Revisions',
    columns: [
      text('series'),
      text('period'),
      text('kind'),
      text('measure'),
      num('previous'),
      num('current'),
      pct('revision_pct'),
      text('large'),
    ],
    rows,
  };
}

function trackingTable(report: Report): Table {
  const tracking = report.history?.tracking ?? [];
  const levels = [...new Set(tracking.flatMap((r) => Object.keys(r.inside).map(Number)))].sort((x, y) => x - y);
  const rows = tracking.map((r) => [
    cell(r.seriesId),
    cell(r.publishedIn),
    cell(r.period),
    cell(r.horizon),
    cell(r.forecast),
    cell(r.actual),
    cell(r.error),
    ...levels.map((l) => (r.inside[String(l)] === undefined ? null : r.inside[String(l)] ? 'yes' : 'no')),
  ]);
  return {
    name: 'tracking',
    sheet: 'Tracking',
    columns: [
      text('series'),
      text('published_in'),
      text('period'),
      {header: 'horizon', format: 'integer'},
      num('forecast'),
      num('actual'),
      num('error'),
      ...levels.map((l) => text(`inside_${l}`)),
    ],
    rows,
  };
}
