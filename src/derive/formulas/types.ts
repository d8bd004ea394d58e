/** A parsed formula: numbers, series ids, `+ - * /`, unary minus and `sum(a, b, …)`. */
export type Formula =
  | {type: 'number'; value: number}
  | {type: 'series'; id: string; column: number}
  | {type: 'negate'; operand: Formula}
  | {type: 'binary'; operator: '+' | '-' | '*' | '/'; left: Formula; right: Formula}
  | {type: 'sum'; terms: Formula[]};

/** A formula that cannot be read: what is wrong, at which 1-based column of the formula text. */
export class FormulaSyntaxError extends Error {
  readonly column: number;
  constructor(message: string, column: number) {
    super(message);
    this.name = 'FormulaSyntaxError';
    this.column = column;
  }
}
