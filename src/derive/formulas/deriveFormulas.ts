import type {Plan, SeriesPlan} from '../../config/plan.js';
import {InputError, type Problem} from '../../errors.js';
import type {Dataset} from '../../ingest/types.js';
import {deriveSeries, type RatioParts} from './deriveSeries.js';
import {planFormulas} from './formulaPlan.js';
import * as msg from './messages.js';
import {isDivision, ratioParts} from './ratioParts.js';
import type {Formula} from './types.js';

/** The pack's formulas parsed and ordered, with each series' kind resolved, or the problems at pack lines. */
export type CheckedFormulas =
  {ok: true; order: {plan: SeriesPlan; formula: Formula}[]; plans: SeriesPlan[]} | {ok: false; problems: Problem[]};

/**
 * Check every formula of a pack (syntax, ids, cycles; `kind: ratio` only on a division) and resolve the kind of
 * each derived series: `ratio` for a formula whose top operation is a division unless the pack sets `kind:`.
 * Needs no data, so `ebbflow check` runs it before reading any source.
 *
 * @param plans the pack's series with `fromSource` entries expanded (ingest's `plans`)
 */
export function checkFormulas(plan: Plan, plans: readonly SeriesPlan[]): CheckedFormulas {
  const derived = plans.filter((s) => s.formula !== null);
  const known = new Set(plans.map((s) => s.id));
  const planned = planFormulas(
    derived.map((s) => ({id: s.id, text: s.formula!.text, line: s.formula!.line})),
    known,
  );
  const at = (line: number, message: string): Problem => ({file: plan.packFile, line, column: null, message});
  if (!planned.ok) return {ok: false, problems: planned.problems.map((p) => at(p.line, p.message))};
  const formulas = new Map(planned.order.map((o) => [o.id, o.formula]));
  const problems: Problem[] = [];
  const resolved = plans.map((s): SeriesPlan => {
    const formula = formulas.get(s.id);
    if (formula === undefined || s.formula === null) return s;
    if (!s.formula.kindGiven && isDivision(formula)) return {...s, kind: 'ratio'};
    if (s.kind === 'ratio' && ratioParts(formula) === null)
      problems.push(at(s.formula.line, msg.ratioWithoutDivision(s.id)));
    return s;
  });
  if (problems.length > 0) return {ok: false, problems};
  const byId = new Map(resolved.map((s) => [s.id, s]));
  return {ok: true, order: planned.order.map((o) => ({plan: byId.get(o.id)!, formula: o.formula})), plans: resolved};
}

/**
 * The formula step of the derive stage: evaluate every derived series on the pack's calendar and put it into the
 * dataset in pack order, with the plans' kinds resolved. Ratios keep their numerator and denominator.
 *
 * @throws InputError listing every formula problem at its pack line
 */
export function deriveFormulas(plan: Plan, data: Dataset): {data: Dataset; ratios: Map<string, RatioParts>} {
  const checked = checkFormulas(plan, data.plans);
  if (!checked.ok) throw new InputError(checked.problems);
  if (checked.order.length === 0) return {data, ratios: new Map()};
  const {series, ratios, notes: formulaNotes} = deriveSeries(
    checked.order.map((o) => ({
      id: o.plan.id,
      formula: o.formula,
      line: o.plan.formula!.line,
      ratio: o.plan.kind === 'ratio',
    })),
    data.series,
    {frequency: plan.frequency, period: data.period, packFile: plan.packFile},
  );
  const byId = new Map([...data.series, ...series].map((s) => [s.id, s]));
  const ordered = checked.plans.flatMap((p) => byId.get(p.id) ?? []);
  // A formula's data notes (divisions by zero) go to the pack's data notes with those of the sources.
  const notes = [...data.notes, ...formulaNotes];
  return {data: {...data, series: ordered, plans: checked.plans, notes}, ratios};
}
