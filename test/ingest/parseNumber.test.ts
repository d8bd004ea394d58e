import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {numberAdvice, parseNumberCell} from '../../src/ingest/parseNumber.js';

describe('parseNumberCell with decimal point', () => {
  it.each([
    ['1234.5', 1234.5],
    ['-12', -12],
    ['+12', 12],
    ['\u221212', -12],
    ['.5', 0.5],
    ['1.', 1],
    ['1e3', 1000],
    ['1.5E-2', 0.015],
    ['1,234.5', 1234.5],
    ['1,234,567', 1234567],
    ['1 234.5', 1234.5],
    ['1\u00a0234.5', 1234.5],
    ['1\u202f234', 1234],
    ["1'234.5", 1234.5],
    ['(1,234.5)', -1234.5],
    ['( 12 )', -12],
    ['  42  ', 42],
    // A trailing minus, as some ledger exports write negatives.
    ['1,234.5-', -1234.5],
    ['12-', -12],
  ])('%s → %d', (text, value) => expect(parseNumberCell(text, '.')).toBe(value));

  const missing = ['', '  ', 'NA', 'na', 'N/A', 'n/a', '#N/A', '-', '\u2013', 'null', 'NULL', 'NaN'];
  it.each(missing)('%j is missing (NaN)', (text) => expect(parseNumberCell(text, '.')).toBeNaN());

  const rejected = ['12x', '1,23', '1,2345', '1,234 567', '€12', '12 EUR', '$1,200', '5%', '1.2.3', '(-5)', '--5', '-5-', '(5-)'];
  it.each([...rejected, 'abc', '1,234e3'])('%s is rejected', (text) =>
    expect(parseNumberCell(text, '.')).toBeUndefined(),
  );
});

describe('parseNumberCell with decimal comma', () => {
  it.each([
    ['1234,5', 1234.5],
    ['1 234,5', 1234.5],
    ['1.234,5', 1234.5],
    ['1.234.567', 1234567],
    ['1\u00a0234,5', 1234.5],
    ['-3,5', -3.5],
    ['1,5e3', 1500],
    ['12', 12],
    ['1.234,50-', -1234.5],
  ])('%s → %d', (text, value) => expect(parseNumberCell(text, ',')).toBe(value));
  it.each(['1.5', '1,234.5', '1.23'])('%s is rejected', (text) => expect(parseNumberCell(text, ',')).toBeUndefined());
});

describe('numberAdvice', () => {
  it('names the fix', () => {
    expect(numberAdvice('€12', '.')).toMatch(/currency/);
    expect(numberAdvice('12 GBP', '.')).toMatch(/currency/);
    expect(numberAdvice('5%', '.')).toMatch(/percentages/);
    expect(numberAdvice('1,5', '.')).toMatch(/set `decimal: ","`/);
    expect(numberAdvice('1.5', ',')).toMatch(/set `decimal: "."`/);
    expect(numberAdvice('abc', '.')).toMatch(/write a number/);
    expect(numberAdvice('#DIV/0!', '.')).toMatch(/^it is a spreadsheet error value: correct the formula/);
    expect(numberAdvice('#value!', ',')).toMatch(/spreadsheet error value/);
  });
});

describe('properties', () => {
  it('any double printed by JavaScript reads back exactly', () => {
    fc.assert(fc.property(fc.double({noNaN: true, noDefaultInfinity: true}), (x) => {
      expect(parseNumberCell(String(x), '.')).toBe(x === 0 ? 0 : x); // String(-0) is "0"
    }));
  });
  it('grouped en-US and de-DE renderings of integers read back (Intl.NumberFormat)', () => {
    const us = new Intl.NumberFormat('en-US', {maximumFractionDigits: 2});
    const de = new Intl.NumberFormat('de-DE', {maximumFractionDigits: 2});
    fc.assert(fc.property(fc.integer({min: -1e12, max: 1e12}), fc.integer({min: 0, max: 99}), (n, cents) => {
      const x = n + Math.sign(n || 1) * cents / 100;
      expect(parseNumberCell(us.format(x), '.')).toBeCloseTo(x, 6);
      expect(parseNumberCell(de.format(x), ',')).toBeCloseTo(x, 6);
    }));
  });
});

describe('plain decimals read from their characters', () => {
  it('equal Number(text) bit for bit on seeded random decimals (fast-check)', () => {
    fc.assert(
      fc.property(fc.bigInt({min: 0n, max: 999_999_999_999_999n}), fc.integer({min: 0, max: 15}), fc.boolean(), (m, k, neg) => {
        const digits = m.toString().padStart(k + 1, '0');
        const text = `${neg ? '-' : ''}${k === 0 ? digits : `${digits.slice(0, -k)}.${digits.slice(-k)}`}`;
        expect(Object.is(parseNumberCell(text, '.'), Number(text)), text).toBe(true);
      }),
      {seed: 3, numRuns: 2000},
    );
    for (const text of ['.5', '7.', '-0', '-.25', '0.1', '9007199254740993', '1234567890.12345'])
      expect(Object.is(parseNumberCell(text, '.'), Number(text)), text).toBe(true);
  });
});
