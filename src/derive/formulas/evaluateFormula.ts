import type {Formula} from './types.js';

/** Values of a formula over n aligned periods, and the periods where it divided by zero. */
export interface Evaluated {
  values: Float64Array;
  /** Indices where a denominator was 0 (and the numerator known): the value there is missing. */
  divisionByZero: number[];
}

/**
 * Evaluate a formula period by period over series already on one calendar (`lookup(id)` gives n values).
 *
 * Why: derived measures (margin, average basket, a total written as `sum(…)`) are analysed like any series.
 * NaN policy: NaN in → NaN out, period by period. A division by zero gives NaN (missing), never ±Infinity, and
 * its period is listed so that the caller can write a data note. Complexity O(n × size of the formula).
 *
 * @example evaluateFormula(parseFormula('a / b'), id => ({a: [1, 2], b: [2, 0]})[id], 2)
 * // => {values: [0.5, NaN], divisionByZero: [1]}
 */
export function evaluateFormula(formula: Formula, lookup: (id: string) => ArrayLike<number>, n: number): Evaluated {
  const zero = new Set<number>();
  const walk = (f: Formula): Float64Array => {
    switch (f.type) {
      case 'number':
        return new Float64Array(n).fill(f.value);
      case 'series': {
        const v = lookup(f.id);
        return Float64Array.from({length: n}, (_, i) => v[i]);
      }
      case 'negate':
        return walk(f.operand).map((v) => -v);
      case 'sum': {
        const out = new Float64Array(n);
        for (const t of f.terms) {
          const v = walk(t);
          for (let i = 0; i < n; i++) out[i] += v[i];
        }
        return out;
      }
      case 'binary': {
        const a = walk(f.left);
        const b = walk(f.right);
        const out = new Float64Array(n);
        for (let i = 0; i < n; i++) {
          if (f.operator === '+') out[i] = a[i] + b[i];
          else if (f.operator === '-') out[i] = a[i] - b[i];
          else if (f.operator === '*') out[i] = a[i] * b[i];
          else if (b[i] === 0) {
            out[i] = NaN;
            if (!Number.isNaN(a[i])) zero.add(i);
          } else out[i] = a[i] / b[i];
        }
        return out;
      }
    }
  };
  const values = walk(formula);
  return {values, divisionByZero: [...zero].sort((x, y) => x - y)};
}
