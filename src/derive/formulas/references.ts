import type {Formula} from './types.js';

/**
 * The series a formula names, each once, in the order they first appear (with the column of that first place).
 * Complexity O(size of the tree).
 */
export function references(formula: Formula): {id: string; column: number}[] {
  const seen = new Map<string, number>();
  const walk = (f: Formula): void => {
    if (f.type === 'series') {
      if (!seen.has(f.id)) seen.set(f.id, f.column);
    } else if (f.type === 'negate') walk(f.operand);
    else if (f.type === 'binary') {
      walk(f.left);
      walk(f.right);
    } else if (f.type === 'sum') f.terms.forEach(walk);
  };
  walk(formula);
  return [...seen].map(([id, column]) => ({id, column}));
}
