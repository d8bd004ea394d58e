/** Linear constraints among series: each total equals the sum of its parts (indices into one list of series). */
export interface Constraint {
  total: number;
  parts: number[];
}

/**
 * The constraint matrix C (k × n, row-major) with C y = 0 for coherent y: row j has +1 at total j and −1 at
 * each of its parts. A total broken down two ways (regions, channels) has two rows; a part that is itself a
 * total (nested groups) has its own row. Complexity O(k n).
 */
export function constraintMatrix(constraints: readonly Constraint[], n: number): Float64Array {
  const c = new Float64Array(constraints.length * n);
  constraints.forEach((k, j) => {
    c[j * n + k.total] = 1;
    for (const p of k.parts) c[j * n + p] -= 1;
  });
  return c;
}
