import {join} from 'node:path';
import {describe, expect, it} from 'vitest';
import {monthIndex} from '../../src/time/period.js';
import {fromSource, plan, problemsOf, readPack, scratch, series, source} from './plan.js';
import {worded} from '../fixtures/notes.js';

const {write} = scratch('exported');

/** Daily rows `date,amount` from a start day for n days, amount = day number + 1. */
function daily(from: string, n: number, format = (iso: string) => iso): string {
  const start = Date.parse(`${from}T00:00:00Z`);
  const rows = Array.from({length: n}, (_, i) => `${format(new Date(start + i * 86_400_000).toISOString().slice(0, 10))},${i + 1}`);
  return ['date,amount', ...rows].join('\n') + '\n';
}

describe('daily and transaction rows in a monthly pack', () => {
  it('flows sum, stocks take the last day; partial months at both ends are left out with a note', async () => {
    // 2026-01-20 to 2026-04-12: January and April are cut.
    const file = write('daily.csv', daily('2026-01-20', 83));
    const src = source('d', file, {dateColumn: 'date'});
    const d = await readPack(
      plan('monthly', [src], [series('flow', 'd', {column: 'amount'}), series('level', 'd', {column: 'amount', kind: 'stock'})]),
    );
    // Feb: days 13..40 (sum of 13..40 = 742), Mar: days 41..71 (sum 1736).
    expect(d.series[0].start).toBe(monthIndex(2026, 2));
    expect([...d.series[0].values]).toEqual([742, 1736]);
    expect([...d.series[1].values]).toEqual([40, 71]);
    expect(d.period).toBe(monthIndex(2026, 3));
    const notes = d.notes.map(worded);
    expect(notes).toContain('January 2026 has data for 12 of 31 days (the data start inside it) and is left out');
    expect(notes).toContain('April 2026 has data for 12 of 30 days (the data stop inside it) and is left out');
  });

  it('transactions with times: count, mean; empty days are missing unless emptyMeans: zero', async () => {
    const rows = ['at,amount', '2026-01-01 09:00,10', '2026-01-31 18:00,30', '2026-03-01 08:00,5', '2026-03-31 23:59:59,7'];
    const file = write('tx.csv', rows.join('\n') + '\n');
    const src = source('t', file, {dateColumn: 'at'});
    const list = [series('n', 't', {column: 'amount', aggregate: 'count'}), series('avg', 't', {column: 'amount', aggregate: 'mean'})];
    const missing = await readPack(plan('monthly', [src], list));
    expect([...missing.series[0].values]).toEqual([2, NaN, 2]);
    expect([...missing.series[1].values]).toEqual([20, NaN, 6]);
    const zero = await readPack(plan('monthly', [{...src, emptyMeans: 'zero'}], list));
    expect([...zero.series[0].values]).toEqual([2, 0, 2]);
    expect([...zero.series[1].values]).toEqual([20, NaN, 6]);
  });

  it('two rows of one month at the pack frequency are a duplicate unless the series sets aggregate', async () => {
    const file = write('dup.csv', 'month,sales\n2026-01,1\n2026-02,2\n2026-02,3\n2026-03,4\n');
    const src = source('s', file);
    const problems = await problemsOf(plan('monthly', [src], [series('sales', 's')]));
    expect(problems.map((p) => [p.line, p.message])).toEqual([
      [4, '2026-02 appears twice, on lines 3 and 4; keep one row per period, or set `aggregate` on the series to combine them'],
    ]);
    const d = await readPack(plan('monthly', [src], [series('sales', 's', {aggregate: 'sum'})]));
    expect([...d.series[0].values]).toEqual([1, 5, 4]);
  });

  it('months into quarters and ISO weeks into months', async () => {
    const months = write('months.csv', 'month,v\n2026-01,1\n2026-02,2\n2026-03,3\n2026-04,4\n2026-05,5\n2026-06,6\n2026-07,7\n');
    const q = await readPack(plan('quarterly', [source('m', months)], [series('v', 'm')]));
    expect([...q.series[0].values]).toEqual([6, 15]);
    expect(q.notes.map(worded)).toContain('Q3 2026 has data for 31 of 92 days (the data stop inside it) and is left out');
    // 2026-W01 (Mon 29 Dec 2025, Thursday 1 Jan) to 2026-W09 (Mon 23 Feb to Sun 1 Mar, Thursday 26 Feb).
    const weeks = write('weeks.csv', ['week,v', ...Array.from({length: 9}, (_, i) => `2026-W${String(i + 1).padStart(2, '0')},1`)].join('\n'));
    const m = await readPack(plan('monthly', [source('w', weeks, {dateColumn: 'week'})], [series('v', 'w')]));
    // January (W01–W05, Thursdays 1–29 Jan) is whole: W01 starts on 29 December. February ends on W09's Sunday 1 March.
    expect([...m.series[0].values]).toEqual([5, 4]);
  });

  it('days mixed with month labels cannot be combined', async () => {
    const file = write('mixed.csv', 'date,v\n2026-01-05,1\n2026-01-06,2\n2026-02,3\n');
    const problems = await problemsOf(plan('monthly', [source('x', file, {dateColumn: 'date'})], [series('v', 'x')]));
    expect(problems[0]).toMatchObject({line: 4, column: 1});
    expect(problems[0].message).toMatch(/^column "date" mixes days \("2026-01-05", line 2\) and months \("2026-02", line 4\)/);
  });
});

describe('dates and layouts as exports write them', () => {
  it('dateFormat reads day-first dates; without it the problem names the setting', async () => {
    const file = write('dmy.csv', daily('2026-01-01', 59, (iso) => `${iso.slice(8, 10)}/${iso.slice(5, 7)}/${iso.slice(0, 4)}`));
    const src = source('d', file, {dateColumn: 'date'});
    const problems = await problemsOf(plan('monthly', [src], [series('amount', 'd')]));
    expect(problems).toEqual([
      {
        file,
        line: 2,
        column: 1,
        // 13/01/2026 (line 14) can only be day first, so it decides.
        message:
          '"01/01/2026" in column "date" could be day first or month first, and line 14 holds "13/01/2026", which is day first: add `dateFormat: DD/MM/YYYY` to the source',
      },
    ]);
    const d = await readPack(plan('monthly', [{...src, dateFormat: 'DD/MM/YYYY'}], [series('amount', 'd')]));
    expect([...d.series[0].values]).toEqual([(31 * 32) / 2, (59 * 60) / 2 - (31 * 32) / 2]);
  });

  it('German month names in a de-DE pack, header row 3, and a Total footer noted, not an error', async () => {
    const text = 'Umsatz nach Monat\nFiliale Nord\nMonat;Umsatz\nOkt 2026;1,5\nNov 2026;2,5\nDez 2026;3\nTotal;7\n;;\n';
    const file = write('de.csv', text);
    const src = source('de', file, {headerRow: 3, dateColumn: 'Monat', decimal: ','});
    const d = await readPack(plan('monthly', [src], [series('umsatz', 'de', {column: 'Umsatz'})], {locale: 'de-DE'}));
    expect([...d.series[0].values]).toEqual([1.5, 2.5, 3]);
    expect(d.series[0].start).toBe(monthIndex(2026, 10));
    expect(d.notes.map((n) => [n.line, worded(n)])).toContainEqual([
      7,
      '1 row after the data ignored ("Total"): not a date, so taken as a footer',
    ]);
  });

  it('an ERP long export with periods as MM.YYYY, a byte-order mark, CRLF and a trailing ; reads; unread periods are problems', async () => {
    const rows = ['01.2026;001 Nord;1.000,50;', '01.2026;002 Süd;2.000;', '02.2026;001 Nord;1.100;', '02.2026;002 Süd;2.100,25;'];
    const text = `\ufeffPeriode;Filiale;Umsatz;\r\n${rows.join('\r\n')}\r\n`;
    const long = (file: string) =>
      plan('monthly', [source('u', file, {layout: 'long', dateColumn: 'Periode', keyColumn: 'Filiale', valueColumn: 'Umsatz', decimal: ','})], [], {
        fromSource: [fromSource('u', 0)],
      });
    const d = await readPack(long(write('erp.csv', text)));
    expect(d.plans.map((x) => x.label)).toEqual(['001 Nord', '002 Süd']);
    expect(d.series.map((x) => [x.id, x.start, [...x.values]])).toEqual([
      ['001-nord', monthIndex(2026, 1), [1000.5, 1100]],
      ['002-sud', monthIndex(2026, 1), [2000, 2100.25]],
    ]);
    // No row has a date the pack can read: they are the data, not a footer, so each is a problem (three, then a count).
    const problems = await problemsOf(long(write('erp-bad.csv', text.replaceAll('.2026;', '|2026;'))));
    expect(problems.map((p) => [p.line, p.message])).toEqual([
      [2, '"01|2026" in column "Periode" is not a date; write 2026-10 or a full date such as 2026-10-31'],
      [3, '"01|2026" in column "Periode" is not a date; write 2026-10 or a full date such as 2026-10-31'],
      [4, '"02|2026" in column "Periode" is not a date; write 2026-10 or a full date such as 2026-10-31'],
      [null, '1 more like the 3 above in column "Periode", the last on line 5'],
    ]);
  });

  it('a month name with two digits could be a day or a year: the problem gives both ways to write it', async () => {
    const file = write('short-years.csv', 'month,v\nJan 24,1\nFeb 24,2\n');
    const problems = await problemsOf(plan('monthly', [source('s', file)], [series('v', 's')]));
    expect(problems[0].message).toBe(
      '"Jan 24" in column "month" is not a date: two digits after a month name could be a day or a year; write the year in full (Jan 2024) or as a spreadsheet writes it (Jan-24)',
    );
  });

  it('a spreadsheet day number in a date column: the problem names the date it stands for and the fix', async () => {
    // 45658 is 2025-01-01 in the 1900 date system (day 0 = 1899-12-30, recalled from memory; Python's datetime gives
    // (date(2025, 1, 1) - date(1899, 12, 30)).days == 45658).
    const file = write('serials.csv', 'month,v\n45658,1\n45689,2\n');
    const problems = await problemsOf(plan('monthly', [source('s', file)], [series('v', 's')]));
    expect(problems[0].message).toBe(
      '"45658" in column "month" is not a date: it looks like a spreadsheet\'s day number (45658 is 2025-01-01 there); format the column as dates in the workbook before saving or exporting it, or write 2026-10',
    );
  });

  it('a bad date in the middle stays a problem; an empty header row is a problem naming headerRow', async () => {
    const mid = write('mid.csv', 'month,v\n2026-01,1\nTotal,2\n2026-03,3\n');
    const problems = await problemsOf(plan('monthly', [source('m', mid)], [series('v', 'm')]));
    expect(problems[0]).toMatchObject({line: 3, column: 1});
    const empty = write('empty-header.csv', 'Report\n;;\nmonth;v\n2026-01;1\n');
    const p2 = await problemsOf(plan('monthly', [source('e', empty, {headerRow: 2})], [series('v', 'e')]));
    expect(p2[0]).toMatchObject({line: 2, message: expect.stringMatching(/header row \(line 2\) is empty; set `headerRow`/)});
  });

  it('ISO 8601 timestamps with offsets are dated in the source time zone', async () => {
    const text = 'at,v\n2026-01-01T00:30:00+01:00,1\n2026-01-31T23:30:00Z,2\n2026-02-28T23:30:00Z,4\n';
    const file = write('tz.csv', text);
    const list = [series('v', 'z', {aggregate: 'sum'})];
    const utc = await readPack(plan('monthly', [source('z', file, {dateColumn: 'at'})], list, {period: monthIndex(2026, 2)}));
    // In UTC the first row is 2025-12-31 23:30: December has one row, January one, February one.
    expect(utc.series[0].start).toBe(monthIndex(2025, 12));
    const berlin = await readPack(
      plan('monthly', [source('z', file, {dateColumn: 'at', timeZone: 'Europe/Berlin'})], list, {period: monthIndex(2026, 3)}),
    );
    // In Berlin: 1 January 00:30, 1 February 00:30, 1 March 00:30.
    expect(berlin.series[0].start).toBe(monthIndex(2026, 1));
    expect([...berlin.series[0].values]).toEqual([1, 2, 4]);
  });
});
