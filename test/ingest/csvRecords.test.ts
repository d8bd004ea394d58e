import fc from 'fast-check';
import {parse} from 'csv-parse/sync';
import {describe, expect, it} from 'vitest';
import {CsvRecords, CsvSyntaxError} from '../../src/ingest/csvRecords.js';

/** Records and end lines of a text pushed in the given chunk sizes. */
function split(text: string, delimiter: string, chunks: number[] = [], fromLine = 1): [string[], number][] {
  const out: [string[], number][] = [];
  const r = new CsvRecords(delimiter, (fields, line) => out.push([fields, line]), fromLine);
  let at = 0;
  for (const n of chunks) {
    r.push(text.slice(at, at + n));
    at += n;
  }
  r.push(text.slice(at));
  r.end();
  return out;
}

/** The reference: csv-parse 7 (the general-purpose parser ebbflow used before) with the same rules. */
function reference(text: string, delimiter: string): [string[], number][] {
  const records = parse(text, {delimiter, relax_column_count: true, relax_quotes: true, skip_empty_lines: true, info: true}) as {
    record: string[];
    info: {lines: number};
  }[];
  return records.map((r) => [r.record, r.info.lines]);
}

describe('CsvRecords', () => {
  it('cuts plain lines, quoted fields with delimiters, doubled quotes and line breaks; lines where records end', () => {
    const text = 'a,b\r\n1,"x, y"\n\n2,"say ""hi"""\r3,"two\nlines"\n4,plain "quote"\n';
    expect(split(text, ',')).toEqual([
      [['a', 'b'], 1],
      [['1', 'x, y'], 2],
      [['2', 'say "hi"'], 4],
      [['3', 'two\nlines'], 6],
      [['4', 'plain "quote"'], 7],
    ]);
    expect(split(text, ',', [1, 3, 7, 2, 9])).toEqual(split(text, ','));
    expect(split('title\nmore\nh;v\n1;2', ';', [], 3)).toEqual([
      [['h', 'v'], 3],
      [['1', '2'], 4],
    ]);
  });

  it('an unclosed quote and text after a closing quote are errors at their line', () => {
    expect(() => split('a,b\n1,"12\n', ',')).toThrow(/^Quote Not Closed: the parsing is finished with an opening quote at line 2$/);
    const e = (() => {
      try {
        split('a,b\n1,"12"x\n', ',');
      } catch (err) {
        return err as CsvSyntaxError;
      }
    })();
    expect(e).toBeInstanceOf(CsvSyntaxError);
    expect(e!.line).toBe(2);
  });

  it('gives the same records and lines as csv-parse for random texts in random chunks (property)', () => {
    const field = fc.oneof(
      fc.stringMatching(/^[a-z0-9 .-]{0,6}$/),
      // No CR inside quotes: csv-parse counts a CRLF inside a quoted field as two lines (outside quotes as one);
      // CsvRecords counts it as one line break everywhere.
      fc.stringMatching(/^[a-z;, \n"]{0,6}$/).map((s) => `"${s.replace(/"/g, '""')}"`),
    );
    const newline = fc.constantFrom('\n', '\r\n', '\r');
    const text = fc
      .tuple(fc.array(fc.array(field, {minLength: 1, maxLength: 4}), {maxLength: 12}), newline, fc.constantFrom(',', ';'), fc.boolean())
      .map(([rows, nl, d, last]) => ({text: rows.map((r) => r.join(d)).join(nl) + (last ? nl : ''), d}));
    fc.assert(
      fc.property(text, fc.array(fc.integer({min: 0, max: 7}), {maxLength: 20}), ({text, d}, chunks) => {
        expect(split(text, d, chunks)).toEqual(reference(text, d));
      }),
      {numRuns: 400},
    );
  });
});
