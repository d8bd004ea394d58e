import {tokenize, type Token} from './tokenize.js';
import {FormulaSyntaxError, type Formula} from './types.js';

/**
 * Parse a formula over series ids into a tree, by recursive descent over this grammar of our own:
 *
 * ```
 * expression := term (("+" | "-") term)*
 * term       := unary (("*" | "/") unary)*
 * unary      := "-" unary | primary
 * primary    := number | id | "sum" "(" expression ("," expression)* ")" | "(" expression ")"
 * ```
 *
 * Operators of one precedence associate to the left (`a - b - c` = `(a - b) - c`). `sum` followed by `(` is the
 * only function; anything else followed by `(` is an error. Nothing in a formula can run code: the tree holds
 * numbers, ids and the four operators only.
 *
 * Why: derived series (margins, averages, totals) are written in the pack, and their problems must point at the
 * place in the formula. Complexity O(length).
 *
 * @throws FormulaSyntaxError with the 1-based column of the problem
 * @example parseFormula('100 * (net-sales - cogs) / net-sales') // top node: binary '/'
 */
export function parseFormula(text: string): Formula {
  const tokens = tokenize(text);
  let at = 0;
  const end = text.length + 1;
  const peek = (): Token | undefined => tokens[at];
  const isOp = (t: Token | undefined, op: string): boolean => t?.type === 'operator' && t.text === op;
  const describe = (t: Token | undefined): string =>
    t === undefined ? 'the end' : t.type === 'number' ? `"${t.value}"` : `"${t.type === 'id' ? t.text : t.text}"`;

  function expression(): Formula {
    let left = term();
    for (let t = peek(); isOp(t, '+') || isOp(t, '-'); t = peek()) {
      at++;
      left = {type: 'binary', operator: (t as {text: '+' | '-'}).text, left, right: term()};
    }
    return left;
  }
  function term(): Formula {
    let left = unary();
    for (let t = peek(); isOp(t, '*') || isOp(t, '/'); t = peek()) {
      at++;
      left = {type: 'binary', operator: (t as {text: '*' | '/'}).text, left, right: unary()};
    }
    return left;
  }
  function unary(): Formula {
    if (isOp(peek(), '-')) {
      at++;
      return {type: 'negate', operand: unary()};
    }
    return primary();
  }
  function primary(): Formula {
    const t = peek();
    if (t === undefined) throw new FormulaSyntaxError('the formula ends where a value is expected', end);
    if (t.type === 'number') {
      at++;
      return {type: 'number', value: t.value};
    }
    if (t.type === 'id') {
      at++;
      if (!isOp(peek(), '(')) return {type: 'series', id: t.text, column: t.column};
      if (t.text !== 'sum')
        throw new FormulaSyntaxError(`unknown function ${t.text}; the only function is sum(…)`, t.column);
      at++;
      const terms = [expression()];
      while (isOp(peek(), ',')) {
        at++;
        terms.push(expression());
      }
      close(t.column);
      return {type: 'sum', terms};
    }
    if (isOp(t, '(')) {
      at++;
      const inner = expression();
      close(t.column);
      return inner;
    }
    throw new FormulaSyntaxError(`${describe(t)} where a value is expected`, t.column);
  }
  function close(opened: number): void {
    const t = peek();
    if (isOp(t, ')')) {
      at++;
      return;
    }
    throw new FormulaSyntaxError(
      t === undefined ? `the bracket opened at column ${opened} is not closed` : `${describe(t)} where ")" is expected`,
      t?.column ?? end,
    );
  }

  if (tokens.length === 0) throw new FormulaSyntaxError('the formula is empty', 1);
  const tree = expression();
  const rest = peek();
  if (rest !== undefined) {
    const what =
      rest.type === 'operator' ? describe(rest) : `${describe(rest)} after a complete value (an operator is missing)`;
    throw new FormulaSyntaxError(rest.type === 'operator' ? `unexpected ${what}` : what, rest.column);
  }
  return tree;
}
