import type {Frequency} from '../../time/period.js';
import type {Note} from '../../words/index.js';
/**
 * Every problem and note text about formulas, one function each. Problems say what is wrong and how to fix it;
 * the pack file and line travel beside the text (see errors.ts).
 */

export const syntax = (id: string, detail: string, column: number): string =>
  `series ${id}: the formula cannot be read at column ${column}: ${detail}`;

export const unknownId = (id: string, name: string, suggestion: string): string =>
  `series ${id}: the formula names no series ${name}${suggestion}`;

/** `net-sales-cogs` when `net-sales` and `cogs` exist: the hyphen was meant as a minus. */
export const hyphenMinus = (id: string, name: string, spaced: string): string =>
  `series ${id}: the formula names no series ${name}; a minus between two ids is written with spaces around it: ${spaced}`;

export const cycle = (path: string[]): string =>
  `series ${path[0]}: the formula depends on itself (${path.join(' → ')}); break the circle`;

export const ratioWithoutDivision = (id: string): string =>
  `series ${id} has kind ratio, but its formula is not a division (numerator / denominator, optionally times a number); write it as one or use kind flow`;

export const ratioWithoutFormula = (id: string): string =>
  `series ${id} has kind ratio, which needs a formula (numerator / denominator) so that year-to-date figures are ratios of sums`;

/** A data note (coded; worded in the pack's language by src/words), led by the series id when worded. */
export const divisionByZero = (frequency: Frequency, periods: number[]): Note => ({
  code: 'divisionByZero',
  values: {n: periods.length},
  periods: {frequency, named: {list: periods}},
});
