import type {Plan, SeriesPlan} from '../config/plan.js';
import {expandSeries} from './expandSeries.js';
import * as msg from './messages.js';
import {ProblemLog} from './problemLog.js';
import {readSource} from './readSource.js';
import type {SourceData, Wanted} from './sourceData.js';

/** What ingest read of a pack: each source's period stores, the series list with `fromSource` expanded, problems. */
export interface Readings {
  /** By source id, in pack order. */
  sources: Map<string, SourceData>;
  /**
   * The plan of each series: the pack's own series and those expanded from `fromSource` entries
   * (id = slug of the key, label = column = key), in pack order.
   */
  plans: SeriesPlan[];
  /** Every problem found while reading; derive adds its own and throws them together. */
  problems: ProblemLog;
}

/**
 * The ingest stage: read every source of a plan once (CSV, XLSX, DuckDB or PostgreSQL query) into period stores.
 *
 * ```
 * sources ──► readSource (read, hash, decode, parse, cells → stamps → period stores)
 *         ──► expandSeries (fromSource keys → series)
 *         ──► references (targets, group members)
 * ```
 *
 * Problems are collected, not thrown: derive (which turns the stores into series) adds its own and throws one
 * InputError listing them all.
 */
export async function ingest(plan: Plan): Promise<Readings> {
  const problems = new ProblemLog();
  const sources = new Map<string, SourceData>();
  // Sources that reported a problem: their missing keys are its consequence, not one more problem.
  const failed = new Set<string>();
  for (const source of plan.sources) {
    const before = problems.size;
    const data = await readSource(source, wantedFrom(plan, source.id), plan.frequency, plan.locale, problems);
    sources.set(source.id, data);
    if (problems.size > before) failed.add(source.id);
  }
  const keysOf = (id: string): string[] | undefined => {
    const data = sources.get(id);
    const keys = data?.input ? [...data.stores.keys()] : undefined;
    return keys?.length === 0 && failed.has(id) ? undefined : keys;
  };
  const plans = expandSeries(plan, keysOf, problems);
  checkReferences(plan, plans, sources, problems);
  return {sources, plans, problems};
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
  // The same defaults as derive/aggregate.ts's defaultAggregate: stocks take the period's last value.
  const byOrder = (s: {aggregate?: string | null; kind: string}) =>
    s.aggregate === 'first' || s.aggregate === 'last' || (s.aggregate == null && s.kind === 'stock');
  const ordered =
    plan.series.some((s) => s.source === sourceId && byOrder(s)) ||
    (plan.fromSource ?? []).some((f) => f.source === sourceId && byOrder(f.template));
  return {names, all, pack: {file: plan.packFile, lines}, ordered};
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
