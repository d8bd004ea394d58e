import type {Report} from './types.js';
import {cell, type Cell, type Table} from './table.js';
import type {Words} from '../words/index.js';

/**
 * The workbook's methods sheet: every resolved setting of every method, one row each — series, part
 * (adjustment, calendar, forecast, cycle), setting (a dotted path into the options) and value — so that the
 * report itself can stay in plain sentences. The same settings are in results.json and the manifest.
 * Keys are sorted, so the sheet does not depend on the order options were built in.
 */
export function methodsTable(report: Report, w: Words): Table {
  const rows: Cell[][] = [];
  for (const {plan, analysis: a} of report.series.filter((s) => !s.plan.hidden)) {
    const add = (part: string, options: unknown) => {
      for (const [setting, value] of flatten(options, '')) rows.push([cell(plan.id), part, cell(setting), value]);
    };
    const adj = a.adjustment;
    if (adj) {
      add('adjustment', {method: adj.method, model: adj.model, ...adj.options});
      for (const r of adj.calendar?.regressors ?? []) {
        add('calendar', {[r.name]: {coefficient: r.coefficient, tStatistic: r.tStatistic, pValue: r.pValue, significant: r.significant}});
      }
    }
    if (a.forecast) add('forecast', {method: a.forecast.method, ...a.forecast.options});
    if (a.cycle) add('cycle', a.cycle.options);
  }
  return {
    name: 'methods',
    sheet: w.t('sheet.methods'),
    columns: [
      {header: 'series', format: 'text'},
      {header: 'part', format: 'text'},
      {header: 'setting', format: 'text'},
      {header: 'value', format: 'text'},
    ],
    rows,
  };
}

/** Leaves of a nested options value as `[path, cell]`, keys sorted; numbers stay numbers, the rest text. */
function flatten(value: unknown, path: string): [string, Cell][] {
  if (value === null || value === undefined) return [];
  if (typeof value === 'number') return [[path, cell(value)]];
  if (typeof value !== 'object') return [[path, cell(String(value))]];
  const entries: [string, unknown][] = Array.isArray(value) || ArrayBuffer.isView(value)
    ? Array.from(value as ArrayLike<unknown>, (v, i) => [String(i + 1), v])
    : Object.keys(value).sort().map((k) => [k, (value as Record<string, unknown>)[k]]);
  return entries.flatMap(([k, v]) => flatten(v, path ? `${path}.${k}` : k));
}
