import type {Report, ReportSeries} from '../types.js';

export interface Placed {
  entry: ReportSeries;
  kicker: string | null;
  /** Index of the pack's group that placed the series, or null. */
  group: number | null;
}

/** The visible series in report order: groups first, in plan order (a group's total before its parts); then the rest. */
export function orderSeries(report: Report): Placed[] {
  const visible = report.series.filter((s) => !s.plan.hidden);
  const byId = new Map(visible.map((s) => [s.plan.id, s]));
  const placed = new Set<string>();
  const out: Placed[] = [];
  report.plan.groups.forEach((group, index) => {
    for (const id of group.total === null ? group.series : [group.total, ...group.series]) {
      const entry = byId.get(id);
      if (!entry || placed.has(id)) continue;
      placed.add(id);
      out.push({entry, kicker: group.title, group: index});
    }
  });
  for (const entry of visible) if (!placed.has(entry.plan.id)) out.push({entry, kicker: null, group: null});
  return out;
}
