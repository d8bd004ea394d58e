import type {Formula} from './types.js';

/**
 * The numerator and denominator of a ratio formula: the top operation is a division, possibly scaled by a
 * number (`100 * (a - b) / a`, `(a / b) * 100`). Null when the formula is not of that shape.
 *
 * Why: a ratio is never summed over periods; its year-to-date, quarterly or fiscal-year figure is the ratio of
 * the summed numerator and denominator (margin YTD = YTD profit / YTD sales), so both parts are needed.
 */
export function ratioParts(formula: Formula): {numerator: Formula; denominator: Formula} | null {
  if (formula.type === 'binary' && formula.operator === '/')
    return {numerator: formula.left, denominator: formula.right};
  if (formula.type === 'binary' && formula.operator === '*') {
    const [scale, rest] =
      formula.left.type === 'number'
        ? [formula.left, formula.right]
        : formula.right.type === 'number'
          ? [formula.right, formula.left]
          : [null, null];
    const inner = scale && rest ? ratioParts(rest) : null;
    if (scale && inner)
      return {
        numerator: {type: 'binary', operator: '*', left: scale, right: inner.numerator},
        denominator: inner.denominator,
      };
  }
  return null;
}

/** Whether a formula's top operation is a division, which makes `kind: ratio` its default. */
export function isDivision(formula: Formula): boolean {
  return formula.type === 'binary' && formula.operator === '/';
}
