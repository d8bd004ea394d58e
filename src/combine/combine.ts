import type {SeriesAnalysis} from '../analyse/index.js';
import type {GroupPlan, Plan} from '../config/plan.js';
import type {RatioParts} from '../derive/formulas/index.js';
import type {DataNote, Dataset} from '../ingest/types.js';
import {parsePeriod, periodsPerYear, yearAgo} from '../time/period.js';
import {align} from './align.js';
import {groupResult} from './groupResult.js';
import {hierarchies} from './hierarchies.js';
import * as msg from './messages.js';
import {reconcileHierarchy} from './reconcileHierarchy.js';
import {ratioYearToDate, seriesVersusTarget} from './seriesVersusTarget.js';
import type {GroupResult, ReconciledBacktest, SeriesCombination} from './types.js';

/** Everything the combine stage produces. */
export interface Combined {
  /** The analyses in plan order, with indirect totals, ratio year-to-date figures and reconciled forecasts. */
  analyses: SeriesAnalysis[];
  /** Per series id: better, variance against target, base forecast and reconciliation. */
  series: Map<string, SeriesCombination>;
  /** Groups with a total, in pack order, each with its hierarchy's back-test of reconciled forecasts. */
  groups: (GroupResult & {backtest: ReconciledBacktest | null})[];
  notes: DataNote[];
}

/**
 * The combine stage: what needs several series at once.
 *
 * ```
 * analyses ──► ratios: year-to-date change as the ratio of sums
 *          ──► groups with a total, deepest first: parts gap, contributions, direct vs indirect total
 *              (adjustTotal: indirect replaces the total's adjusted series and adjusted changes)
 *          ──► hierarchies: reconciled forecasts (MinT, OLS, bottom-up) and their back-test against the base
 *          ──► targets: variance for the review period and the fiscal year to date
 * ```
 *
 * Pure: no I/O, deterministic. The trend-cycle and the fiscal-year outturn of a total stay those of its own
 * (direct) analysis and base forecast.
 */
export function combine(
  plan: Plan,
  data: Dataset,
  analyses: SeriesAnalysis[],
  ratios: ReadonlyMap<string, RatioParts>,
): Combined {
  const frequency = plan.frequency;
  const notes: DataNote[] = [];
  const current = new Map(analyses.map((a) => [a.id, a]));
  const plans = new Map(plan.series.map((s) => [s.id, s]));

  for (const [id, ratio] of ratios) {
    const a = current.get(id);
    if (a === undefined) continue;
    const ytd = ratioYearToDate(
      ratio,
      {start: a.start, end: a.end, frequency, fiscalYearStart: plan.fiscalYearStart},
      (i) => yearAgo(frequency, i),
    );
    current.set(id, {...a, changes: {...a.changes, yearToDate: ytd}});
  }

  const withTotal = plan.groups.filter((g): g is GroupPlan & {total: string} => g.total !== null);
  const depth = (g: GroupPlan & {total: string}): number => {
    let d = 0;
    for (let at = g.total; ; d++) {
      const up = withTotal.find((o) => o.series.includes(at));
      if (up === undefined || d > withTotal.length) return d;
      at = up.total;
    }
  };
  const results = new Map<string, GroupResult>();
  for (const g of [...withTotal].sort((x, y) => depth(y) - depth(x))) {
    const byId = new Map(
      [g.total, ...g.series].map((id) => [id, {plan: plans.get(id)!, analysis: current.get(id)!}] as const),
    );
    const {result, indirect} = groupResult(g, byId, frequency);
    results.set(g.id, result);
    if (result.partsGap) {
      const {period, gap, percent, periods} = result.partsGap;
      notes.push({
        file: plan.packFile,
        line: g.line,
        series: null,
        note: msg.partsGap(g.id, g.total, {frequency, period: parsePeriod(frequency, period)!}, gap, percent, periods),
      });
    }
    if (g.adjustTotal === 'indirect')
      current.set(g.total, withIndirect(current.get(g.total)!, indirect, periodsPerYear[frequency]));
  }

  const combination = new Map<string, SeriesCombination>(
    plan.series.map((s) => [s.id, {better: s.better, versusTarget: null, baseMean: null, reconciliation: null}]),
  );
  const backtests = new Map<string, ReconciledBacktest | null>();
  for (const h of hierarchies(plan.groups)) {
    const {result, notes: said} = reconcileHierarchy(h, current, frequency);
    for (const note of said)
      notes.push({file: plan.packFile, line: plan.groups.find((g) => g.id === h.id)!.line, series: null, note});
    for (const g of withTotal) if (h.series.includes(g.total)) backtests.set(g.id, result?.backtest ?? null);
    if (result === null) continue;
    for (const [id, forecast] of result.forecasts) {
      const a = current.get(id)!;
      current.set(id, {...a, forecast});
      const c = combination.get(id)!;
      combination.set(id, {...c, baseMean: a.forecast!.mean, reconciliation: {method: result.method, group: h.id}});
    }
  }

  const seriesById = new Map(data.series.map((s) => [s.id, s]));
  for (const s of plan.series) {
    if (s.target === null) continue;
    const a = current.get(s.id);
    const t = seriesById.get(s.target);
    const tp = plans.get(s.target);
    if (a === undefined || t === undefined || tp === undefined) continue;
    const target = {start: t.start, values: [...t.values, ...t.ahead], kind: tp.kind, ratio: ratios.get(tp.id) ?? null};
    const actual = {start: a.start, values: a.original, kind: s.kind, ratio: ratios.get(s.id) ?? null, analysis: a};
    const versusTarget = seriesVersusTarget(actual, target, {
      frequency,
      fiscalYearStart: plan.fiscalYearStart,
      better: s.better,
    });
    combination.set(s.id, {...combination.get(s.id)!, versusTarget});
  }

  return {
    analyses: analyses.map((a) => current.get(a.id)!),
    series: combination,
    groups: withTotal.map((g) => ({...results.get(g.id)!, backtest: backtests.get(g.id) ?? null})),
    notes,
  };
}

/** A total adjusted indirectly: its adjusted series becomes the sum of its adjusted parts, with the changes on it. */
function withIndirect(a: SeriesAnalysis, indirect: Float64Array, perYear: number): SeriesAnalysis {
  if (a.adjustment === null) return a;
  const adjusted = Array.from(align({start: a.start, values: indirect}, a.start, a.original.length), (v, i) =>
    Number.isNaN(a.original[i]) ? NaN : v,
  );
  const last = adjusted.length - 1;
  const r = adjusted[last - 1] > 0 && Number.isFinite(adjusted[last]) ? adjusted[last] / adjusted[last - 1] : NaN;
  return {
    ...a,
    adjustment: {...a.adjustment, adjusted},
    changes: {...a.changes, periodOnPeriodAdjusted: (r - 1) * 100, periodOnPeriodAnnualised: (r ** perYear - 1) * 100},
  };
}
