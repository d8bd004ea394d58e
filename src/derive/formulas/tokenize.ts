import {FormulaSyntaxError} from './types.js';

export type Token =
  | {type: 'number'; value: number; column: number}
  | {type: 'id'; text: string; column: number}
  | {type: 'operator'; text: '+' | '-' | '*' | '/' | '(' | ')' | ','; column: number};

const NUMBER = /^(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/;
/** A series id as the pack allows it; a hyphen belongs to the id only between two id characters. */
const ID = /^[a-z0-9]+(?:-[a-z0-9]+)*/;
const ID_CHAR = /[a-z0-9]/;

/**
 * Split a formula into numbers, ids and operators (columns 1-based, for messages).
 *
 * Ids keep their hyphens: `net-sales-cogs` is one id, and a minus between two operands is written with a space
 * on at least one side (`net-sales - cogs`). A run of digits directly followed by a letter or by a hyphen and an
 * id character is an id too (`2026-plan`). Only lowercase ids exist (the pack's id rule), so an uppercase letter
 * is a syntax error. Complexity O(length).
 *
 * @throws FormulaSyntaxError for a character that has no place in a formula
 */
export function tokenize(text: string): Token[] {
  const tokens: Token[] = [];
  let i = 0;
  while (i < text.length) {
    const c = text[i];
    const column = i + 1;
    if (c === ' ' || c === '\t') {
      i++;
      continue;
    }
    if ('+-*/(),'.includes(c)) {
      tokens.push({type: 'operator', text: c as '+', column});
      i++;
      continue;
    }
    const rest = text.slice(i);
    const num = NUMBER.exec(rest);
    const id = ID.exec(rest);
    // An id wins when it reaches further than the number (`2026-plan`, `12months`).
    if (num && !(id && id[0].length > num[0].length)) {
      if (ID_CHAR.test(text[i + num[0].length] ?? ''))
        throw new FormulaSyntaxError(`unexpected "${text[i + num[0].length]}"`, column + num[0].length);
      tokens.push({type: 'number', value: Number(num[0]), column});
      i += num[0].length;
      continue;
    }
    if (id) {
      tokens.push({type: 'id', text: id[0], column});
      i += id[0].length;
      continue;
    }
    if (/[A-Z]/.test(c)) throw new FormulaSyntaxError(`"${c}": series ids are lowercase`, column);
    throw new FormulaSyntaxError(`unexpected "${c}"`, column);
  }
  return tokens;
}
