import type {Frequency} from '../../time/period.js';
import type {DataNote, Series} from '../../ingest/types.js';
import {evaluateFormula} from './evaluateFormula.js';
import * as msg from './messages.js';
import {ratioParts} from './ratioParts.js';
import {references} from './references.js';
import type {Formula} from './types.js';

/** Numerator and denominator of a ratio series, aligned with its values (same start and length). */
export interface RatioParts {
  numerator: Float64Array;
  denominator: Float64Array;
}

/** One formula to evaluate: the series it defines, where it is written, and whether it is a ratio. */
export interface DerivedEntry {
  id: string;
  formula: Formula;
  line: number;
  ratio: boolean;
}

/**
 * Evaluate formulas, in dependency order, into series on the pack's calendar.
 *
 * Each formula runs over the union of its inputs' periods, up to the review period, and past it as far as the
 * inputs carry values ahead (targets), so a budget may be a formula too. Leading missing periods are dropped.
 * Ratios also keep their numerator and denominator for ratio-of-sums aggregation (see ratioOfSums.ts).
 * NaN policy: NaN in → NaN out; a division by zero leaves the period missing with a data note.
 *
 * @param ordered formulas, each after the formulas it uses (planFormulas)
 * @param data series read from the sources; derived series are added to a copy as they are made
 */
export function deriveSeries(
  ordered: readonly DerivedEntry[],
  data: readonly Series[],
  {frequency, period, packFile}: {frequency: Frequency; period: number; packFile: string},
): {series: Series[]; ratios: Map<string, RatioParts>; notes: DataNote[]} {
  const byId = new Map(data.map((s) => [s.id, s]));
  const out: Series[] = [];
  const ratios = new Map<string, RatioParts>();
  const notes: DataNote[] = [];
  for (const entry of ordered) {
    const inputs = references(entry.formula).map((r) => byId.get(r.id)!);
    const start = inputs.length > 0 ? Math.min(...inputs.map((s) => s.start)) : period;
    const ahead = inputs.length > 0 ? Math.max(...inputs.map((s) => s.ahead.length)) : 0;
    const n = period - start + 1 + ahead;
    const lookup = (id: string): Float64Array => {
      const s = byId.get(id)!;
      return Float64Array.from({length: n}, (_, i) => {
        const k = start + i - s.start;
        if (k < 0) return NaN;
        return k < s.values.length ? s.values[k] : (s.ahead[k - s.values.length] ?? NaN);
      });
    };
    const {values, divisionByZero} = evaluateFormula(entry.formula, lookup, n);
    if (divisionByZero.length > 0) {
      const periods = divisionByZero.map((i) => start + i);
      notes.push({file: packFile, line: entry.line, series: entry.id, note: msg.divisionByZero(frequency, periods)});
    }
    let first = 0;
    while (first < period - start && Number.isNaN(values[first])) first++;
    const known = period - start + 1;
    let last = n;
    while (last > known && Number.isNaN(values[last - 1])) last--;
    const series: Series = {
      id: entry.id,
      frequency,
      start: start + first,
      values: values.slice(first, known),
      ahead: values.slice(known, last),
      sourceId: '',
      file: packFile,
    };
    if (entry.ratio) {
      const parts = ratioParts(entry.formula)!;
      ratios.set(entry.id, {
        numerator: evaluateFormula(parts.numerator, lookup, n).values.slice(first, known),
        denominator: evaluateFormula(parts.denominator, lookup, n).values.slice(first, known),
      });
    }
    byId.set(entry.id, series);
    out.push(series);
  }
  return {series: out, ratios, notes};
}
