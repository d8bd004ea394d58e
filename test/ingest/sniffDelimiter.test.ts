import {describe, expect, it} from 'vitest';
import {sniffDelimiter} from '../../src/ingest/sniffDelimiter.js';

describe('sniffDelimiter', () => {
  it('picks the commonest delimiter outside quotes', () => {
    expect(sniffDelimiter('month,a,b')).toBe(',');
    expect(sniffDelimiter('Monat;Umsatz;Kosten')).toBe(';');
    expect(sniffDelimiter('week\tvisits\tsignups')).toBe('\t');
    expect(sniffDelimiter('"a;b;c",d')).toBe(',');
    expect(sniffDelimiter('"sales, net";"orders, all"')).toBe(';');
  });
  it('defaults to a comma', () => {
    expect(sniffDelimiter('month')).toBe(',');
    expect(sniffDelimiter('')).toBe(',');
    expect(sniffDelimiter('a;b,c')).toBe(',');
  });
});
