import type {PathProblem} from './issues.js';
import {hint} from './suggest.js';
import {list, record, text} from './yamlShapes.js';

/**
 * The checks on the pack's structure: series keys that need another key (`better` needs a `target`, `kind:
 * ratio` needs a `formula`), and groups with a `total`: the total names a series, is not among its own parts
 * (directly or through nested groups), each part belongs to one total only, `adjustTotal` and `reconcile` come
 * with a total, the groups of one hierarchy ask for one `reconcile` method, and `bottom-up` has one breakdown per
 * total. Formulas themselves (syntax, ids, cycles) are checked by derive, which owns the grammar.
 * Works on the raw parsed YAML and skips what has the wrong type (the schema reports that).
 *
 * @param known ids of the pack's series, or null when `fromSource` entries make the full list unknown yet
 */
export function structureCheck(raw: unknown, known: ReadonlySet<string> | null): PathProblem[] {
  const out: PathProblem[] = [];
  const add = (path: PropertyKey[], message: string) => out.push({path, message});
  const root = record(raw);
  list(root.series)
    .map(record)
    .forEach((s, i) => {
      if (s.better != null && s.target == null)
        add(
          ['series', i, 'better'],
          `series[${i}].better needs a target: it says which side of the target is favourable; add target: or remove better`,
        );
      if (s.kind === 'ratio' && !('formula' in s))
        add(
          ['series', i, 'kind'],
          `series[${i}] has kind ratio, which needs a formula (numerator / denominator) so that year-to-date figures are ratios of sums; use kind stock for a ratio read from data`,
        );
    });

  const groups = list(root.groups).map(record);
  const partOf = new Map<string, {group: number; total: string}>();
  const parts = new Map<string, string[]>();
  const totalsOf = new Map<string, number[]>();
  groups.forEach((g, i) => {
    const total = text(g.total);
    if (total === undefined) {
      for (const key of ['adjustTotal', 'reconcile'])
        if (g[key] != null)
          add(['groups', i, key], `groups[${i}].${key} applies to a group with a total; add total: or remove ${key}`);
      return;
    }
    if (known !== null && !known.has(total))
      add(['groups', i, 'total'], `groups[${i}].total names no series: ${total}${hint(total, [...known])}`);
    totalsOf.set(total, [...(totalsOf.get(total) ?? []), i]);
    list(g.series).forEach((m, k) => {
      const part = text(m);
      if (part === undefined) return;
      if (part === total) {
        add(
          ['groups', i, 'series', k],
          `groups[${i}].series[${k}] ${part} is the group's total; a total cannot be its own part`,
        );
        return;
      }
      const earlier = partOf.get(part);
      if (earlier !== undefined)
        add(
          ['groups', i, 'series', k],
          `groups[${i}].series[${k}] ${part} is already a part of groups[${earlier.group}] (total ${earlier.total}); a part belongs to one hierarchy only`,
        );
      else partOf.set(part, {group: i, total});
      parts.set(total, [...(parts.get(total) ?? []), part]);
    });
  });

  // A total reached again through its parts (nested groups) would be its own part.
  for (const [total, indices] of totalsOf) {
    const seen = new Set<string>();
    const stack = [...(parts.get(total) ?? [])];
    while (stack.length > 0) {
      const p = stack.pop()!;
      if (p === total) {
        add(
          ['groups', indices[0], 'total'],
          `groups[${indices[0]}].total ${total} is one of its own parts through nested groups; a total cannot be its own part`,
        );
        break;
      }
      if (seen.has(p)) continue;
      seen.add(p);
      stack.push(...(parts.get(p) ?? []));
    }
  }

  // One hierarchy = the groups linked through shared totals and parts; it is reconciled by one method.
  const top = (id: string): string => {
    let at = id;
    const visited = new Set<string>();
    while (partOf.has(at) && !visited.has(at)) {
      visited.add(at);
      at = partOf.get(at)!.total;
    }
    return at;
  };
  const methodOf = new Map<string, {method: string; group: number}>();
  groups.forEach((g, i) => {
    const total = text(g.total);
    if (total === undefined) return;
    const method = typeof g.reconcile === 'string' ? g.reconcile : 'mint';
    const root = top(total);
    const first = methodOf.get(root);
    if (first === undefined) methodOf.set(root, {method, group: i});
    else if (first.method !== method)
      add(
        ['groups', i, 'reconcile'],
        `groups[${i}] and groups[${first.group}] form one hierarchy (under ${root}) but ask for reconcile ${method} and ${first.method}; give them the same method`,
      );
    if (method === 'bottom-up' && (totalsOf.get(total)?.length ?? 0) > 1)
      add(
        ['groups', i, 'reconcile'],
        `groups[${i}].reconcile bottom-up needs one breakdown per total, but ${total} is the total of groups ${totalsOf
          .get(total)!
          .map((j) => `[${j}]`)
          .join(' and ')}; use mint or ols`,
      );
  });
  return out;
}
