import type {Aggregate, Plan, SeriesPlan} from '../config/plan.js';
import {InputError} from '../errors.js';
import type {Readings} from '../ingest/ingest.js';
import * as msg from '../ingest/messages.js';
import type {PeriodStore} from '../ingest/periodStore.js';
import type {SourceData} from '../ingest/sourceData.js';
import type {DataNote, Dataset, Series} from '../ingest/types.js';
import {civilFromDays, formatPeriod} from '../time/period.js';
import {finerThan} from '../time/stamp.js';
import {defaultAggregate, periodValue} from './aggregate.js';
import {completePeriods} from './completeness.js';
import {placeSeries} from './placeSeries.js';

/** One series' values by period, from its first to its last value, after aggregation and completeness. */
interface Derived {
  plan: SeriesPlan;
  data: SourceData;
  start: number;
  values: Float64Array;
  range: {first: number; last: number};
}

/**
 * The derive stage: turn the period stores ingest read into one `Series` per pack series on a regular calendar
 * ending at the review period.
 *
 * ```
 * stores ──► grain (rows at the pack's frequency, or finer: days, weeks, months into quarters)
 *        ──► duplicates (two rows of one period at the pack's frequency, unless the series sets `aggregate`)
 *        ──► aggregate (sum, mean, last, first, min, max, count; flows sum, stocks last)
 *        ──► complete periods (a first or last period the rows cover only in part is left out, with a note)
 *        ──► review period (the pack's, or the last period with data in a visible series)
 *        ──► placeSeries (gaps, truncation, padding)
 * ```
 *
 * Throws one InputError listing every problem of ingest and derive.
 */
export function derive(plan: Plan, readings: Readings): Dataset {
  const {problems, plans, sources} = readings;
  const notes: DataNote[] = [...sources.values()].flatMap((d) => d.notes);
  const coverage = new Map<string, {first: number; last: number} | null>();
  for (const [id, data] of sources) {
    if (data.input === undefined || !isFiner(data, plan)) {
      coverage.set(id, null);
      continue;
    }
    const {span, periods, grains} = data.cells;
    if (span === undefined || periods === undefined) continue;
    mixedGrains(data);
    const c = completePeriods(span, periods, plan.frequency);
    coverage.set(id, {first: c.first, last: c.last});
    notes.push(...c.notes.map((m) => data.cells.note(null, m)));
    notes.push(data.cells.note(null, {code: 'combined', values: {grain: [...grains.keys()][0], frequency: plan.frequency}}));
  }

  const found: Derived[] = [];
  const reported = new Set<string>();
  for (const s of plans) {
    // Derived series (formulas) are made from the others by derive/formulas.
    if (s.formula !== null) continue;
    const data = sources.get(s.source);
    if (data === undefined) {
      problems.add(plan.packFile, s.line, null, msg.unknownSource(s.id, s.source));
      continue;
    }
    const store = data.stores.get(s.column);
    if (data.input === undefined || store === undefined) continue;
    const clip = coverage.get(s.source) ?? null;
    if (clip === null && s.aggregate == null) duplicates(s, data, store, plan, reported);
    const method: Aggregate = s.aggregate ?? defaultAggregate(s.kind);
    const derived = aggregated(store, method, clip, data.cells.source.emptyMeans === 'zero');
    // A file without rows, or a column with unreadable cells, already has its problems.
    if (derived === undefined && (data.input.rows === 0 || store.rejected > 0)) continue;
    if (derived === undefined && clip !== null && store.range('rows') !== undefined) {
      // Rows there are, but only in periods cut at the data's ends (a few days of one month).
      const span = data.cells.span!;
      const day = (d: number) => {
        const {year, month, day: dd} = civilFromDays(d);
        return `${year}-${String(month).padStart(2, '0')}-${String(dd).padStart(2, '0')}`;
      };
      problems.add(data.input.file, null, null, msg.noCompletePeriod(s.id, day(span.from), day(span.to), plan.frequency));
      continue;
    }
    if (derived === undefined) {
      const at = data.columnNumbers.get(s.column);
      const where = at !== undefined ? `column "${s.column}"` : `the rows for "${s.column}"`;
      data.cells.report(at !== undefined ? data.headerLine : null, at ?? null, msg.allMissing(s.id, where));
      continue;
    }
    found.push({plan: s, data, ...derived});
  }

  const visible = found.filter((f) => !f.plan.hidden);
  const last = (visible.length > 0 ? visible : found).reduce((max, f) => Math.max(max, f.range.last), -Infinity);
  const period = plan.period ?? (Number.isFinite(last) ? last : undefined);
  if (period === undefined) {
    if (problems.size === 0) problems.add(plan.packFile, null, null, msg.noData());
    throw new InputError(problems.list());
  }
  if (plan.period === null) {
    const periods = {frequency: plan.frequency, named: {period}};
    notes.push({file: plan.packFile, line: null, series: null, note: {code: 'inferredPeriod', values: {}, periods}});
  }

  // A set, not a search of the plans per series: with 10,000 series that search took 14 s.
  const targets = new Set(plans.flatMap((p) => p.target ?? []));
  const series: Series[] = [];
  const cut = {series: 0, last: period};
  for (const {plan: s, data, start, values, range} of found) {
    const at = (p: number) => (p >= start && p < start + values.length ? values[p - start] : NaN);
    // A target (budget) keeps its values past the review period: the fiscal-year outturn compares against them.
    const placed = placeSeries(s.id, at, range, period, plan.frequency, targets.has(s.id));
    const file = data.input!.file;
    if (!placed.ok) {
      problems.add(plan.packFile, s.line, null, placed.problem);
      continue;
    }
    notes.push(...placed.notes.map((note) => ({file, line: null, series: s.id, note})));
    if (placed.dropped > 0) {
      cut.series++;
      cut.last = Math.max(cut.last, range.last);
    }
    series.push({
      id: s.id,
      frequency: plan.frequency,
      start: placed.start,
      values: placed.values,
      ahead: placed.ahead,
      sourceId: s.source,
      file,
    });
  }
  if (cut.series > 0) {
    const periods = {frequency: plan.frequency, named: {period, last: cut.last}};
    notes.push({file: plan.packFile, line: null, series: null, note: {code: 'truncated', values: {n: cut.series}, periods}});
  }
  if (problems.size > 0) throw new InputError(problems.list());
  const inputs = plan.sources.flatMap((source) => sources.get(source.id)?.input ?? []);
  return {period, series, inputs, notes, plans};
}

/** Whether a source's rows are finer than the pack: labels of a finer grain, or rows on two instants of a period. */
function isFiner(data: SourceData, plan: Plan): boolean {
  for (const grain of data.cells.grains.keys()) if (finerThan(grain, plan.frequency)) return true;
  for (const store of data.stores.values()) if (store.finer) return true;
  return false;
}

/**
 * Values from the first to the last period with a value (with a row, for `count`), within `clip` (the complete
 * periods of a finer source); undefined when none is left.
 */
function aggregated(
  store: PeriodStore,
  method: Aggregate,
  clip: {first: number; last: number} | null,
  zeroWhenEmpty: boolean,
): {start: number; values: Float64Array; range: {first: number; last: number}} | undefined {
  const rows = store.range(method === 'count' ? 'rows' : 'values');
  if (rows === undefined) return undefined;
  const first = Math.max(rows.first, clip?.first ?? -Infinity);
  const last = Math.min(rows.last, clip?.last ?? Infinity);
  if (first > last) return undefined;
  const values = new Float64Array(last - first + 1);
  for (let p = first; p <= last; p++) values[p - first] = periodValue(store.at(p), method, zeroWhenEmpty);
  // Trim ends that aggregate to missing (a period whose rows are all blank).
  let a = 0;
  let b = values.length - 1;
  while (a <= b && Number.isNaN(values[a])) a++;
  while (b >= a && Number.isNaN(values[b])) b--;
  if (a > b) return undefined;
  return {start: first + a, values: values.subarray(a, b + 1), range: {first: first + a, last: first + b}};
}

/**
 * Two rows naming one period at the pack's own frequency (two `2026-10` rows) are a problem unless the series
 * asks for `aggregate`; reported once per pair of rows (a wide row holds many series).
 */
function duplicates(s: SeriesPlan, data: SourceData, store: PeriodStore, plan: Plan, reported: Set<string>): void {
  const {cells} = data;
  const place = cells.source.reader === 'csv' ? 'on lines' : 'in rows';
  for (const p of store.repeated()) {
    const {line, secondLine} = store.at(p);
    const key = `${cells.source.id}:${line}:${secondLine}`;
    if (reported.has(key)) continue;
    reported.add(key);
    const label = formatPeriod(plan.frequency, p);
    const message =
      cells.source.layout !== 'wide'
        ? msg.duplicateKeyAtPack(s.column, label, line, secondLine, place)
        : msg.duplicateAtPack(label, line, secondLine, place);
    cells.report(secondLine, cells.dateColumn + 1, message);
  }
}

/**
 * Rows to aggregate must be of one grain: days mixed with month labels (`2026-01-05` and `2026-02`) cannot be
 * combined into one period's value. (Without aggregation a date may name its period, as it always could.)
 */
function mixedGrains(data: SourceData): void {
  const {grains, source, dateColumn} = data.cells;
  if (grains.size < 2) return;
  const [[grain, first], [otherGrain, other]] = [...grains.entries()];
  const message = msg.mixedGrains(source.dateColumn, {...first, grain}, {...other, grain: otherGrain});
  data.cells.report(other.line, dateColumn + 1, message);
}
