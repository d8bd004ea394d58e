import {hint} from '../../config/suggest.js';
import * as msg from './messages.js';
import {parseFormula} from './parseFormula.js';
import {references} from './references.js';
import {FormulaSyntaxError, type Formula} from './types.js';

/** A formula as written in the pack: the series it defines, its text and the pack line of `formula:`. */
export interface FormulaEntry {
  id: string;
  text: string;
  line: number;
}

/** A problem at a pack line. */
export interface LineProblem {
  line: number;
  message: string;
}

/** The parsed formulas in an order where each comes after every formula it uses, or the problems found. */
export type FormulaPlan = {ok: true; order: {id: string; formula: Formula}[]} | {ok: false; problems: LineProblem[]};

/**
 * Parse every formula of a pack, check that each names only known series, and order them so that formulas
 * using other derived series come after those (depth-first topological order, in pack order where free).
 *
 * Problems, each at the `formula:` line: a syntax error (with its column in the formula), an id that names no
 * series (with a "did you mean" hint; for `net-sales-cogs` when `net-sales` and `cogs` exist, the hint that a
 * minus between ids is written with spaces), and a cycle (the ids around it). Complexity O(total formula size).
 *
 * @param known ids of every series of the pack, from data or formula
 */
export function planFormulas(entries: readonly FormulaEntry[], known: ReadonlySet<string>): FormulaPlan {
  const problems: LineProblem[] = [];
  const parsed = new Map<string, {formula: Formula; uses: string[]; line: number}>();
  for (const e of entries) {
    let formula: Formula;
    try {
      formula = parseFormula(e.text);
    } catch (error) {
      if (!(error instanceof FormulaSyntaxError)) throw error;
      problems.push({line: e.line, message: msg.syntax(e.id, error.message, error.column)});
      continue;
    }
    const uses = references(formula).map((r) => r.id);
    for (const name of uses.filter((u) => !known.has(u))) {
      const spaced = hyphenSplit(name, known);
      const message =
        spaced !== null ? msg.hyphenMinus(e.id, name, spaced) : msg.unknownId(e.id, name, hint(name, [...known]));
      problems.push({line: e.line, message});
    }
    parsed.set(e.id, {formula, uses, line: e.line});
  }

  const order: {id: string; formula: Formula}[] = [];
  const state = new Map<string, 'open' | 'done'>();
  const reported = new Set<string>();
  const visit = (id: string, path: string[]): void => {
    const node = parsed.get(id);
    if (node === undefined || state.get(id) === 'done') return;
    if (state.get(id) === 'open') {
      const loop = [...path.slice(path.indexOf(id)), id];
      const key = [...new Set(loop)].sort().join(' ');
      if (!reported.has(key)) {
        reported.add(key);
        problems.push({line: parsed.get(loop[0])!.line, message: msg.cycle(loop)});
      }
      return;
    }
    state.set(id, 'open');
    for (const u of node.uses) visit(u, [...path, id]);
    state.set(id, 'done');
    order.push({id, formula: node.formula});
  };
  for (const e of entries) visit(e.id, []);
  if (problems.length > 0) return {ok: false, problems: problems.sort((a, b) => a.line - b.line)};
  return {ok: true, order};
}

/** `a - b` for an unknown `a-b` whose pieces around one hyphen are both known ids or numbers, else null. */
function hyphenSplit(name: string, known: ReadonlySet<string>): string | null {
  const ok = (s: string) => known.has(s) || /^\d+$/.test(s);
  for (let i = name.indexOf('-'); i > 0; i = name.indexOf('-', i + 1)) {
    const [left, right] = [name.slice(0, i), name.slice(i + 1)];
    if (ok(left) && (ok(right) || hyphenSplit(right, known) !== null))
      return `${left} - ${ok(right) ? right : hyphenSplit(right, known)}`;
  }
  return null;
}
