import type {GroupPlan} from '../config/plan.js';
import type {Constraint} from './reconcile/hierarchy.js';

/** Groups joined through shared totals and parts: one set of series reconciled together. */
export interface Hierarchy {
  /** The top group's id (the first group whose total is no other group's part). */
  id: string;
  /** Series ids, totals and parts, in the order they first appear in the groups. */
  series: string[];
  constraints: Constraint[];
  method: GroupPlan['reconcile'];
}

/**
 * The hierarchies of a pack: nested groups (a part that is itself a total) and totals broken down in several
 * ways form one hierarchy. Config has checked that each part belongs to one total and that the groups of one
 * hierarchy ask for one method. Complexity O(groups · parts).
 */
export function hierarchies(groups: readonly GroupPlan[]): Hierarchy[] {
  const withTotal = groups.filter((g): g is GroupPlan & {total: string} => g.total !== null);
  const parent = new Map<string, string>();
  for (const g of withTotal) for (const p of g.series) parent.set(p, g.total);
  const top = (id: string): string => {
    let at = id;
    for (let steps = 0; parent.has(at) && steps <= parent.size; steps++) at = parent.get(at)!;
    return at;
  };
  const byTop = new Map<string, (GroupPlan & {total: string})[]>();
  for (const g of withTotal) byTop.set(top(g.total), [...(byTop.get(top(g.total)) ?? []), g]);
  return [...byTop.values()].map((members) => {
    const series: string[] = [];
    const index = (id: string) => {
      if (!series.includes(id)) series.push(id);
      return series.indexOf(id);
    };
    const constraints = members.map((g) => ({total: index(g.total), parts: g.series.map(index)}));
    const head = members.find((g) => !parent.has(g.total)) ?? members[0];
    return {id: head.id, series, constraints, method: head.reconcile};
  });
}
