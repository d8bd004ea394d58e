import {describe, expect, it} from 'vitest';
import {
  evaluateFormula,
  parseFormula,
  planFormulas,
  ratioOfSums,
  ratioParts,
  references,
} from '../../../src/derive/formulas/index.js';

const ids = (text: string) => references(parseFormula(text)).map((r) => r.id);

describe('parseFormula', () => {
  it('keeps hyphens inside ids and reads a spaced minus as subtraction', () => {
    expect(ids('net-sales-cogs')).toEqual(['net-sales-cogs']);
    expect(ids('net-sales - cogs')).toEqual(['net-sales', 'cogs']);
    expect(ids('net-sales -cogs')).toEqual(['net-sales', 'cogs']);
    expect(ids('2026-plan * 1.1')).toEqual(['2026-plan']);
  });
  it('gives * and / precedence over + and -, left to right, with unary minus and sum()', () => {
    const v = (t: string) => evaluateFormula(parseFormula(t), () => [], 1).values[0];
    expect(v('1 + 2 * 3')).toBe(7);
    expect(v('10 - 4 - 3')).toBe(3);
    expect(v('8 / 4 / 2')).toBe(1);
    expect(v('-(2 + 3) * 2')).toBe(-10);
    expect(v('sum(1, 2 * 3, -4)')).toBe(3);
    expect(v('1e3 / .5')).toBe(2000);
  });
  it('is a division at the top for a margin, so kind ratio applies', () => {
    const f = parseFormula('100 * (net-sales - cogs) / net-sales');
    expect(f.type === 'binary' && f.operator).toBe('/');
    const parts = ratioParts(parseFormula('(a / b) * 100'))!;
    const look = (id: string) => ({a: [3], b: [4]})[id]!;
    expect(evaluateFormula(parts.numerator, look, 1).values[0]).toBe(300);
    expect(evaluateFormula(parts.denominator, look, 1).values[0]).toBe(4);
    expect(ratioParts(parseFormula('a + b / c'))).toBeNull();
  });
  it('reports syntax errors with their column', () => {
    const err = (t: string) => {
      try {
        parseFormula(t);
      } catch (e) {
        return `${(e as {column: number}).column}: ${(e as Error).message}`;
      }
      return 'parsed';
    };
    expect(err('a +')).toBe('4: the formula ends where a value is expected');
    expect(err('(a + b')).toBe('7: the bracket opened at column 1 is not closed');
    expect(err('a b')).toBe('3: "b" after a complete value (an operator is missing)');
    expect(err('max(a, b)')).toBe('1: unknown function max; the only function is sum(…)');
    expect(err('a ^ 2')).toBe('3: unexpected "^"');
    expect(err('Sales')).toBe('1: "S": series ids are lowercase');
    expect(err('')).toBe('1: the formula is empty');
    expect(err('a + )')).toBe('5: ")" where a value is expected');
  });
});

describe('evaluateFormula', () => {
  it('is NaN in → NaN out and leaves division by zero missing, listing the period', () => {
    const look = (id: string) => ({a: [1, NaN, 3, 0], b: [2, 2, 0, 0]})[id]!;
    const r = evaluateFormula(parseFormula('a / b'), look, 4);
    expect(Array.from(r.values)).toEqual([0.5, NaN, NaN, NaN]);
    expect(r.divisionByZero).toEqual([2, 3]);
  });
});

describe('ratioOfSums', () => {
  it('is the ratio of the summed parts, not the mean of the ratios', () => {
    const num = Float64Array.of(1, 9);
    const den = Float64Array.of(10, 10);
    expect(ratioOfSums(num, den, 0, 1)).toBe(0.5);
    expect(ratioOfSums(Float64Array.of(1, 9), Float64Array.of(1, 10), 0, 1)).toBeCloseTo(10 / 11, 15);
    expect(ratioOfSums(num, den, 0, 2)).toBeNaN();
    expect(ratioOfSums(Float64Array.of(1, NaN), den, 0, 1)).toBeNaN();
    expect(ratioOfSums(num, Float64Array.of(1, -1), 0, 1)).toBeNaN();
  });
});

describe('planFormulas', () => {
  const known = new Set(['net-sales', 'cogs', 'orders', 'margin', 'profit', 'basket']);
  it('orders formulas after the formulas they use', () => {
    const r = planFormulas(
      [
        {id: 'margin', text: '100 * profit / net-sales', line: 5},
        {id: 'profit', text: 'net-sales - cogs', line: 6},
      ],
      known,
    );
    expect(r.ok && r.order.map((o) => o.id)).toEqual(['profit', 'margin']);
  });
  it('says a minus between ids needs spaces when net-sales-cogs names no series', () => {
    const r = planFormulas([{id: 'profit', text: 'net-sales-cogs', line: 6}], known);
    expect(!r.ok && r.problems).toEqual([
      {
        line: 6,
        message:
          'series profit: the formula names no series net-sales-cogs; a minus between two ids is written with spaces around it: net-sales - cogs',
      },
    ]);
  });
  it('reports an unknown id with a hint, a cycle with its path, and a syntax error with its column', () => {
    const r = planFormulas(
      [
        {id: 'basket', text: 'net-sales / order', line: 4},
        {id: 'margin', text: 'profit / 2', line: 5},
        {id: 'profit', text: 'margin * 2', line: 6},
        {id: 'cogs', text: 'net-sales *', line: 7},
      ],
      known,
    );
    expect(!r.ok && r.problems.map((p) => `${p.line}: ${p.message}`)).toEqual([
      '4: series basket: the formula names no series order; did you mean orders?',
      '5: series margin: the formula depends on itself (margin → profit → margin); break the circle',
      '7: series cogs: the formula cannot be read at column 12: the formula ends where a value is expected',
    ]);
  });
  it('finds a formula that names itself', () => {
    const r = planFormulas([{id: 'profit', text: 'profit + 1', line: 3}], known);
    expect(!r.ok && r.problems[0].message).toBe(
      'series profit: the formula depends on itself (profit → profit); break the circle',
    );
  });
});
