import type {Plan, SeriesPlan} from '../config/plan.js';
import {InputError} from '../errors.js';
import {formatPeriod} from '../time/period.js';
import {expandSeries} from './expandSeries.js';
import * as msg from './messages.js';
import type {PeriodStore} from './periodStore.js';
import {placeSeries} from './placeSeries.js';
import {ProblemLog} from './problemLog.js';
import {readSource} from './readSource.js';
import type {SourceData, Wanted} from './sourceData.js';
import type {Dataset, Series} from './types.js';

/**
 * The ingest stage: read every source of a plan once and return its series on a regular calendar
 * ending at the review period.
 *
 * ```
 * sources ──► readSource (stream, hash, decode, parse, cells → period stores)
 *         ──► expandSeries (fromSource keys → series)
 *         ──► review period (the pack's, or the last period with data in a visible series)
 *         ──► placeSeries (gaps, truncation, padding)
 * ```
 *
 * Every problem in every source is collected first; if there is any, one InputError lists them all.
 */
export async function ingest(plan: Plan): Promise<Dataset> {
  const problems = new ProblemLog();
  const reads = new Map<string, SourceData>();
  for (const source of plan.sources) {
    reads.set(source.id, await readSource(source, wantedFrom(plan, source.id), plan.frequency, problems));
  }
  const keysOf = (id: string): string[] | undefined => {
    const data = reads.get(id);
    return data?.input ? [...data.stores.keys()] : undefined;
  };
  const plans = expandSeries(plan, keysOf, problems);
  checkReferences(plan, plans, reads, problems);

  const found: {plan: SeriesPlan; data: SourceData; store: PeriodStore; range: {first: number; last: number}}[] = [];
  for (const s of plans) {
    // Derived series (formulas) are made from the others by derive.
    if (s.formula !== null) continue;
    const data = reads.get(s.source);
    if (data === undefined) {
      problems.add(plan.packFile, s.line, null, msg.unknownSource(s.id, s.source));
      continue;
    }
    const store = data.stores.get(s.column);
    if (data.input === undefined || store === undefined) continue;
    const range = store.dataRange();
    // A file without rows, or a column with unreadable cells, already has its problems.
    if (range === undefined && (data.input.rows === 0 || store.rejected > 0)) continue;
    if (range === undefined) {
      const at = data.columnNumbers.get(s.column);
      const where = at !== undefined ? `column "${s.column}"` : `the rows for "${s.column}"`;
      problems.add(data.input.file, at !== undefined ? data.headerLine : null, at ?? null, msg.allMissing(s.id, where));
      continue;
    }
    found.push({plan: s, data, store, range});
  }

  const notes = [...reads.values()].flatMap((d) => d.notes);
  const visible = found.filter((f) => !f.plan.hidden);
  const last = (visible.length > 0 ? visible : found).reduce((max, f) => Math.max(max, f.range.last), -Infinity);
  const period = plan.period ?? (Number.isFinite(last) ? last : undefined);
  if (period === undefined) {
    if (problems.size === 0) problems.add(plan.packFile, null, null, msg.noData());
    throw new InputError(problems.list());
  }
  if (plan.period === null) {
    notes.push({file: plan.packFile, line: null, message: msg.inferredPeriod(formatPeriod(plan.frequency, period))});
  }

  // A set, not a search of the plans per series: with 10,000 series that search took 14 s.
  const targets = new Set(plans.flatMap((p) => p.target ?? []));
  const series: Series[] = [];
  for (const {plan: s, data, store, range} of found) {
    // A target (budget) keeps its values past the review period: the fiscal-year outturn compares against them.
    const placed = placeSeries(s.id, store, range, period, plan.frequency, targets.has(s.id));
    const file = data.input!.file;
    if (!placed.ok) {
      problems.add(plan.packFile, s.line, null, placed.problem);
      continue;
    }
    const seriesNotes = placed.notes.map((message) => ({file, line: null, message: `${s.id}: ${message}`}));
    series.push({
      id: s.id,
      frequency: plan.frequency,
      start: placed.start,
      values: placed.values,
      ahead: placed.ahead,
      sourceId: s.source,
      file,
      notes: seriesNotes,
    });
  }
  if (problems.size > 0) throw new InputError(problems.list());
  const inputs = plan.sources.flatMap((source) => reads.get(source.id)?.input ?? []);
  return {period, series, inputs, notes, plans};
}

/** Columns (wide) or keys (long) of one source that the pack's series name; every key for `fromSource`. */
function wantedFrom(plan: Plan, sourceId: string): Wanted {
  const names = new Map<string, string[]>();
  const lines = new Map<string, number>();
  for (const s of plan.series) {
    if (s.source !== sourceId) continue;
    names.set(s.column, [...(names.get(s.column) ?? []), s.id]);
    if (!lines.has(s.column)) lines.set(s.column, s.line);
  }
  const all = (plan.fromSource ?? []).some((f) => f.source === sourceId);
  return {names, all, pack: {file: plan.packFile, lines}};
}

/** Targets and group members must name a series once `fromSource` entries are expanded. */
function checkReferences(plan: Plan, plans: SeriesPlan[], reads: Map<string, SourceData>, problems: ProblemLog): void {
  const entries = plan.fromSource ?? [];
  if (entries.length === 0 || entries.some((f) => reads.get(f.source)?.input === undefined)) return;
  const ids = new Set(plans.map((s) => s.id));
  for (const s of plans) {
    if (s.target !== null && !ids.has(s.target)) {
      problems.add(plan.packFile, s.line, null, msg.unknownTarget(s.id, s.target));
    }
  }
  for (const g of plan.groups) {
    for (const id of g.series) if (!ids.has(id)) problems.add(plan.packFile, null, null, msg.unknownMember(g.id, id));
  }
}
