import {residualSeasonality, type SeriesAnalysis} from '../analyse/index.js';
import type {GroupPlan, SeriesPlan} from '../config/plan.js';
import {civilFromDays, formatPeriod, periodStartDay, periodsPerYear, seasonOf, type Frequency} from '../time/period.js';
import {align} from './align.js';
import {contributions} from './contributions.js';
import {indirectTotal, largestDifference} from './indirectAdjustment.js';
import {partsGap} from './partsGap.js';
import type {ContributionsAt, GroupResult} from './types.js';

/**
 * One group with a total: the parts-vs-total check (when the total and all parts come from data), each part's
 * contribution to the total's year-on-year change and to its adjusted period-on-period change (on adjusted parts,
 * i.e. against the indirect total), and the indirect total against the direct one (largest difference, and the
 * residual-seasonality test of the indirect total on the total's model scale).
 *
 * Everything runs on the total's periods. NaN policy: NaN in → NaN out, period by period.
 * Returns the indirect adjusted total too, on the total's periods, for `adjustTotal: indirect`.
 */
export function groupResult(
  group: GroupPlan & {total: string},
  byId: ReadonlyMap<string, {plan: SeriesPlan; analysis: SeriesAnalysis}>,
  frequency: Frequency,
): {result: GroupResult; indirect: Float64Array} {
  const total = byId.get(group.total)!;
  const parts = group.series.map((id) => byId.get(id)!);
  const {start} = total.analysis;
  const n = total.analysis.original.length;
  const label = (i: number) => formatPeriod(frequency, start + i);
  const original = (a: SeriesAnalysis) => align({start: a.start, values: a.original}, start, n);
  const adjusted = (a: SeriesAnalysis) =>
    align({start: a.start, values: a.adjustment?.adjusted ?? a.original}, start, n);

  const x = Float64Array.from(total.analysis.original);
  const xs = parts.map((p) => original(p.analysis));
  const fromData = total.plan.formula === null && parts.every((p) => p.plan.formula === null);
  const gap = fromData ? partsGap(x, xs) : null;

  const yoy = contributions(x, xs, periodsPerYear[frequency]);
  const adjustedParts = parts.map((p) => adjusted(p.analysis));
  const indirect = indirectTotal(adjustedParts, n);
  const pop = contributions(indirect, adjustedParts, 1);
  const at = (c: {total: Float64Array; parts: Float64Array[]}, i: number): Omit<ContributionsAt, 'period'> => ({
    total: c.total[i],
    parts: Object.fromEntries(group.series.map((id, k) => [id, c.parts[k][i]])),
  });
  const history: GroupResult['contributions']['history'] = [];
  for (let i = Math.min(periodsPerYear[frequency], n - 1); i < n; i++)
    history.push({period: label(i), yearOnYear: at(yoy, i), periodOnPeriodAdjusted: at(pop, i)});

  const direct = total.analysis.adjustment;
  let comparison: GroupResult['indirect'] = null;
  if (direct !== null) {
    const multiplicative = direct.model === 'multiplicative';
    const scale = Float64Array.from(indirect, (v) => (multiplicative ? Math.log(v) : v));
    // Weeks are grouped by the month of their Thursday, as the seasonal engine's own test does.
    const season = Int32Array.from({length: n}, (_, i) =>
      frequency === 'weekly'
        ? civilFromDays(periodStartDay('weekly', start + i) + 3).month - 1
        : seasonOf(frequency, start + i),
    );
    const groups = frequency === 'weekly' ? 12 : periodsPerYear[frequency];
    const diff = largestDifference(Float64Array.from(direct.adjusted), indirect);
    comparison = {
      residualSeasonality: residualSeasonality(scale, season, groups),
      largestDifference: {period: diff.index < 0 ? null : label(diff.index), percent: diff.percent},
    };
  }
  const last = n - 1;
  return {
    result: {
      id: group.id,
      title: group.title,
      total: group.total,
      parts: [...group.series],
      adjustTotal: group.adjustTotal,
      reconcile: group.reconcile,
      partsGap: gap && {period: label(gap.index), gap: gap.gap, percent: gap.percent, periods: gap.periods},
      contributions: {
        yearOnYear: {period: label(last), ...at(yoy, last)},
        periodOnPeriodAdjusted: {period: label(last), ...at(pop, last)},
        history,
      },
      indirect: comparison,
    },
    indirect,
  };
}
