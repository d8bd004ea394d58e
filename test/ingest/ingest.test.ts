import {join} from 'node:path';
import {describe, expect, it} from 'vitest';
import type {Dataset} from '../../src/ingest/index.js';
import {isoWeekIndex, monthIndex, quarterIndex} from '../../src/time/period.js';
import {FIXTURES, fromSource, plan, problemsOf, readPack, scratch, series, source} from './plan.js';
import {placed, worded} from '../fixtures/notes.js';

const {dir: temp, write} = scratch('ingest');

const values = (d: Dataset, id: string): number[] => [...d.series.find((s) => s.id === id)!.values];
const notes = (d: Dataset, id: string): string[] => d.notes.filter((n) => n.series === id).map(worded);
/** `2000-01` for i = 0, one month per step. */
const monthLabel = (i: number): string => `${2000 + Math.floor(i / 12)}-${String((i % 12) + 1).padStart(2, '0')}`;

describe('wide layout', () => {
  it('reads a UTF-8 file with BOM, CRLF, thousands separators and missing markers', async () => {
    const src = source('trading', 'wide-bom.csv');
    const d = await readPack(plan('monthly', [src], ['net_sales', 'orders', 'margin'].map((c) => series(c, 'trading'))));
    expect(d.period).toBe(monthIndex(2024, 6));
    expect(d.series.map((s) => s.start)).toEqual([monthIndex(2024, 1), monthIndex(2024, 1), monthIndex(2024, 1)]);
    expect(values(d, 'net_sales')).toEqual([1234.5, 1300, 1310.25, 1290, 1400, 2001000]);
    expect(values(d, 'orders')).toEqual([10, 11, NaN, 12, 13, 14]);
    expect(values(d, 'margin')).toEqual([0.5, NaN, 0.6, NaN, NaN, NaN]);
    expect(notes(d, 'margin')).toEqual([
      'margin: 1 missing month: February 2024',
      'margin: data end at March 2024: the 3 months up to the review period June 2024 are missing',
    ]);
    // Reference: `sha256sum test/fixtures/ingest/wide-bom.csv` (GNU coreutils) and `wc -c`.
    expect(d.inputs).toEqual([
      {
        file: join(FIXTURES, 'wide-bom.csv'),
        sha256: '4fa3e158d1c6d4ef07656ef450803b43b176d75e55b85a76fb7005e9ed20c4c9',
        bytes: 174,
        rows: 6,
      },
    ]);
    expect(d.notes.map(worded)).toEqual([
      'review period June 2024: the pack sets none, so the last period with data is used',
      'orders: 1 missing month: March 2024',
      'margin: 1 missing month: February 2024',
      'margin: data end at March 2024: the 3 months up to the review period June 2024 are missing',
    ]);
    expect(d.plans!.map((s) => s.id)).toEqual(['net_sales', 'orders', 'margin']);
  });

  it('reads every month format in one file', async () => {
    const d = await readPack(plan('monthly', [source('s', 'date-formats.csv')], [series('sales', 's')]));
    expect(d.series[0].start).toBe(monthIndex(2024, 1));
    expect(values(d, 'sales')).toEqual([1, 2, 3, 4, 5, 6, 7]);
  });

  it('semicolons and decimal commas, with space and point grouping', async () => {
    const src = source('de', 'semicolon-decimal-comma.csv', {dateColumn: 'Monat', decimal: ','});
    const list = [series('umsatz', 'de', {column: 'Umsatz'}), series('kosten', 'de', {column: 'Kosten'})];
    const d = await readPack(plan('monthly', [src], list));
    expect(values(d, 'umsatz')).toEqual([1234.5, 1300.75, 1400]);
    expect(values(d, 'kosten')).toEqual([10.25, -3.5, 12]);
  });

  it('tabs, ISO weeks and a date inside a week', async () => {
    const src = source('w', 'tab.tsv', {dateColumn: 'week'});
    const d = await readPack(plan('weekly', [src], [series('visits', 'w')]));
    // 2026-01-15 is in ISO week 2026-W03 (python3: datetime.date(2026,1,15).isocalendar() → (2026, 3, 4)).
    expect(d.series[0].start).toBe(isoWeekIndex(2026, 1));
    expect(d.period).toBe(isoWeekIndex(2026, 3));
    expect(values(d, 'visits')).toEqual([100, 110, 120]);
  });

  it('an explicit delimiter wins over sniffing', async () => {
    const src = source('w', 'tab.tsv', {dateColumn: 'week', delimiter: ','});
    const problems = await problemsOf(plan('weekly', [src], [series('visits', 'w')]));
    expect(problems[0]).toMatchObject({
      line: 1,
      message: expect.stringMatching(/date column "week" is not in the header/),
    });
  });

  it('quarters in every label form and a date inside a quarter', async () => {
    const src = source('q', 'quarterly.csv', {dateColumn: 'quarter'});
    const d = await readPack(plan('quarterly', [src], [series('sales', 'q')]));
    expect(d.series[0].start).toBe(quarterIndex(2024, 1));
    expect(values(d, 'sales')).toEqual([10, 11, 12, 13]);
  });

  it('keeps gaps as NaN and lists them', async () => {
    const d = await readPack(plan('monthly', [source('s', 'gaps.csv')], [series('sales', 's')]));
    expect(values(d, 'sales')).toEqual([10, NaN, NaN, 13, 14, 15, NaN, 17]);
    expect(notes(d, 'sales')).toEqual(['sales: 3 missing months: February 2024, March 2024 and July 2024']);
  });

  it('sorts rows out of date order and notes it', async () => {
    const file = write('unsorted.csv', 'month,sales\n2024-03,3\n2024-01,1\n2024-02,2\n');
    const d = await readPack(plan('monthly', [source('s', file)], [series('sales', 's')]));
    expect(values(d, 'sales')).toEqual([1, 2, 3]);
    expect(placed(d.notes[0])).toEqual({
      file,
      line: 3,
      message: 'rows are not in date order (first at line 3); they were sorted',
    });
  });
});

describe('encodings', () => {
  it('windows-1252 with € (byte 0x80) and é in the header', async () => {
    const src = source('fr', 'windows-1252.csv', {dateColumn: 'mois', decimal: ',', encoding: 'windows-1252'});
    const list = [series('ca', 'fr', {column: "chiffre d'affaires (€)"}), series('act', 'fr', {column: 'activité'})];
    const d = await readPack(plan('monthly', [src], list));
    expect(values(d, 'ca')).toEqual([1000.5, 2000.25]);
    expect(values(d, 'act')).toEqual([1, 2]);
  });

  it('the same file read as UTF-8 is a problem suggesting windows-1252', async () => {
    const src = source('fr', 'windows-1252.csv', {dateColumn: 'mois', decimal: ','});
    const problems = await problemsOf(plan('monthly', [src], [series('act', 'fr', {column: 'activité'})]));
    expect(problems).toEqual([
      {
        file: join(FIXTURES, 'windows-1252.csv'),
        line: 1,
        column: null,
        message: expect.stringMatching(/not valid UTF-8.*encoding: windows-1252/),
      },
    ]);
  });

  it('UTF-16 with its byte-order mark (a spreadsheet\'s Unicode text export, tab-separated) reads as its UTF-8 twin', async () => {
    // Big chunks of rows so the stream's chunks end inside characters; Node's Buffer writes the UTF-16 bytes.
    const rows = Array.from({length: 4000}, (_, i) => `${2000 + Math.floor(i / 12)}-${String((i % 12) + 1).padStart(2, '0')}\t${i}.5\tCafé ${i % 3}`);
    const text = `Monat\tUmsatz\tFiliale\r\n${rows.join('\r\n')}\r\n`;
    const little = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, 'utf16le')]);
    const big = Buffer.concat([Buffer.from([0xfe, 0xff]), Buffer.from(text, 'utf16le').swap16()]);
    const read = (file: string) =>
      readPack(plan('monthly', [source('u', file, {dateColumn: 'Monat'})], [series('umsatz', 'u', {column: 'Umsatz'})]));
    const utf8 = values(await read(write('utf8.csv', text)), 'umsatz');
    expect(utf8.length).toBeGreaterThan(1000);
    expect(values(await read(write('utf16le.csv', little)), 'umsatz')).toEqual(utf8);
    expect(values(await read(write('utf16be.csv', big)), 'umsatz')).toEqual(utf8);
  });

  it('a UTF-8 BOM in a file declared windows-1252 is a problem', async () => {
    const src = source('t', 'wide-bom.csv', {encoding: 'windows-1252'});
    const problems = await problemsOf(plan('monthly', [src], [series('orders', 't')]));
    expect(problems[0].message).toMatch(/byte-order mark/);
  });

  it('an invalid byte deep in the file is reported at its line', async () => {
    const rows = Array.from({length: 4000}, (_, i) => `${monthLabel(i)},${i}`);
    // Line 1 is the header, lines 2–4001 the rows, so the bad byte 0xFF is on line 4002.
    const bytes = Buffer.concat([Buffer.from(`month,sales\n${rows.join('\n')}\n`), Buffer.from([0x39, 0xff, 0x0a])]);
    const src = source('s', write('late-bad-byte.csv', bytes));
    const problems = await problemsOf(plan('monthly', [src], [series('sales', 's')]));
    expect(problems[0]).toMatchObject({line: 4002, message: expect.stringMatching(/not valid UTF-8/)});
  });
});

describe('problems', () => {
  it('duplicate periods name both lines', async () => {
    const problems = await problemsOf(plan('monthly', [source('s', 'duplicates.csv')], [series('sales', 's')]));
    expect(problems).toEqual([
      {
        file: join(FIXTURES, 'duplicates.csv'),
        line: 5,
        column: 1,
        message: '2024-02 appears twice, on lines 3 and 5; keep one row per period, or set `aggregate` on the series to combine them',
      },
    ]);
  });

  it('bad cells at file:line:column, every one of them', async () => {
    const file = join(FIXTURES, 'bad-cells.csv');
    const list = [series('sales', 's'), series('costs', 's')];
    const problems = await problemsOf(plan('monthly', [source('s', 'bad-cells.csv')], list));
    expect(problems.map((p) => [p.line, p.column])).toEqual([
      [3, 2],
      [4, 2],
      [5, 1],
      [6, 3],
      [7, 2],
    ]);
    expect(problems.every((p) => p.file === file)).toBe(true);
    expect(problems[0].message).toBe(
      '"12x" in column "sales" is not a number: ' +
        'write a number such as 1234.5, or leave the cell blank or NA when the value is missing',
    );
    expect(problems[1].message).toMatch(/"€12" in column "sales" is not a number: remove the currency symbol/);
    expect(problems[2].message).toBe(
      '"31/10/2024" in column "month" is a day-first date; add `dateFormat: DD/MM/YYYY` to the source',
    );
    expect(problems[3].message).toMatch(/"5%" in column "costs" is not a number: write percentages as plain numbers/);
    expect(problems[4].message).toMatch(/"1,5" in column "sales" .*set `decimal: ","`/);
  });

  it('a missing column suggests the nearest header name', async () => {
    const list = [series('net-sales', 's', {column: 'net_sales'})];
    const problems = await problemsOf(plan('monthly', [source('s', 'missing-column.csv')], list));
    expect(problems).toEqual([
      {
        file: join(FIXTURES, 'missing-column.csv'),
        line: 1,
        column: null,
        message: 'column of series net-sales "net_sales" is not in the header; did you mean "net_sale"?',
      },
    ]);
  });

  it('a missing column far from every name lists the header', async () => {
    const problems = await problemsOf(plan('monthly', [source('s', 'missing-column.csv')], [series('headcount', 's')]));
    expect(problems[0].message).toMatch(/the columns are: "month", "net_sale", "orders"/);
  });

  it('a series with no values at all', async () => {
    const list = [series('sales', 's'), series('returns', 's')];
    const problems = await problemsOf(plan('monthly', [source('s', 'all-missing.csv')], list));
    expect(problems).toEqual([
      {
        file: join(FIXTURES, 'all-missing.csv'),
        line: 1,
        column: 3,
        message: 'series returns has no values: every cell of column "returns" is blank or missing',
      },
    ]);
  });

  it('quarter labels in a monthly pack: one clear problem for the file', async () => {
    const src = source('q', 'quarterly-labels.csv', {dateColumn: 'quarter'});
    const problems = await problemsOf(plan('monthly', [src], [series('sales', 'q')]));
    expect(problems[0]).toMatchObject({line: 2, column: 1});
    expect(problems[0].message).toMatch(
      /column "quarter" holds quarterly periods \("2024-Q1"\) but the pack is monthly; a pack has one frequency/,
    );
    expect(problems.filter((p) => /frequency/.test(p.message))).toHaveLength(1);
  });

  it('file errors, empty files, header-only files and broken quotes', async () => {
    const missing = source('a', join(temp, 'nope.csv'));
    const empty = source('b', write('empty.csv', ''));
    const headerOnly = source('c', write('header.csv', 'month,sales\n'));
    const quote = source('d', write('quote.csv', 'month,sales\n2024-01,"12\n'));
    const list = ['a', 'b', 'c', 'd'].map((id) => series(id, id, {column: 'sales'}));
    const problems = await problemsOf(plan('monthly', [missing, empty, headerOnly, quote], list));
    expect(problems.map((p) => p.message)).toEqual([
      'cannot read the file (ENOENT)',
      'the file is empty: it needs a header line and data rows',
      'the file has a header line but no data rows',
      expect.stringMatching(/^not valid CSV: Quote Not Closed/),
    ]);
  });

  it('problems from every source come together in one error', async () => {
    const p = plan(
      'monthly',
      [source('a', 'duplicates.csv'), source('b', 'bad-cells.csv'), source('c', 'missing-column.csv')],
      [series('sales', 'a'), series('costs', 'b'), series('net_sales', 'c')],
    );
    const files = (await problemsOf(p)).map((x) => x.file.split('/').pop());
    expect(new Set(files)).toEqual(new Set(['duplicates.csv', 'bad-cells.csv', 'missing-column.csv']));
  });

  it('of one kind, the first three problems, then one line counting the rest where the fourth was', async () => {
    // 80 bad cells in column sales, then one short row: 3 listed, 77 counted, the short row after them.
    const rows = Array.from({length: 80}, (_, i) => `${monthLabel(i)},x,1`);
    const src = source('s', write('many.csv', `month,sales,cost\n${rows.join('\n')}\n${monthLabel(80)},1\n`));
    const problems = await problemsOf(plan('monthly', [src], [series('sales', 's')]));
    expect(problems.map((p) => [p.line, p.message.slice(0, 40), p.count])).toEqual([
      [2, '"x" in column "sales" is not a number: w', undefined],
      [3, '"x" in column "sales" is not a number: w', undefined],
      [4, '"x" in column "sales" is not a number: w', undefined],
      [null, '77 more like the 3 above in column "sale', 77],
      [82, 'the row has 2 fields but the header has ', undefined],
    ]);
    expect(problems[3].message).toBe('77 more like the 3 above in column "sales", the last on line 81');
  });

  it('at most 50 problems per file, then a count', async () => {
    // One bad cell in each of 80 columns: 80 kinds, 50 listed.
    const names = Array.from({length: 80}, (_, i) => `c${i}`);
    const src = source('s', write('many.csv', `month,${names.join(',')}\n2024-01,${names.map(() => 'x').join(',')}\n`));
    const problems = await problemsOf(plan('monthly', [src], names.map((n) => series(n, 's'))));
    expect(problems).toHaveLength(51);
    expect(problems[50]).toMatchObject({message: '30 more problems not listed', count: 30, line: null});
  });

  it('short rows are reported', async () => {
    const src = source('s', write('short.csv', 'month,a,b\n2024-01,1,2\n2024-02,3\n'));
    const problems = await problemsOf(plan('monthly', [src], [series('a', 's')]));
    expect(problems).toEqual([
      expect.objectContaining({
        line: 3,
        message: 'the row has 2 fields but the header has 3; a delimiter or quote may be missing',
      }),
    ]);
  });
});

describe('review period', () => {
  const src = source('r', 'review.csv');
  const list = () => [
    series('sales', 'r'),
    series('budget', 'r', {hidden: true}),
    series('stock', 'r', {kind: 'stock'}),
  ];

  it('defaults to the last period with data and pads series that end earlier', async () => {
    const d = await readPack(plan('monthly', [src], list()));
    expect(d.period).toBe(monthIndex(2024, 8));
    expect(values(d, 'budget')).toEqual([9, 10, 11, 12, 13, 14, NaN, NaN]);
    expect(notes(d, 'budget')).toEqual([
      'budget: data end at June 2024: the 2 months up to the review period August 2024 are missing',
    ]);
    expect(d.series.find((s) => s.id === 'stock')!.start).toBe(monthIndex(2024, 5));
  });

  it('truncates data after the review period (a back-filled pack sees only data up to it)', async () => {
    const d = await readPack(plan('monthly', [src], list(), {period: monthIndex(2024, 6)}));
    expect(d.period).toBe(monthIndex(2024, 6));
    expect(values(d, 'sales')).toEqual([10, 11, 12, 13, 14, 15]);
    expect(notes(d, 'sales')).toEqual([]);
    expect(values(d, 'stock')).toEqual([1, 2]);
    expect(d.notes.map(worded)).toEqual([
      'data after the review period June 2024 ignored in 2 series (up to August 2024): a pack for an earlier period sees only the data up to it',
    ]);
  });

  it('hidden series do not set the default review period', async () => {
    const d = await readPack(plan('monthly', [src], [series('sales', 'r', {hidden: true}), series('budget', 'r')]));
    expect(d.period).toBe(monthIndex(2024, 6));
    expect(values(d, 'sales')).toHaveLength(6);
  });

  it('a review period before a series starts is a problem', async () => {
    const problems = await problemsOf(plan('monthly', [src], list(), {period: monthIndex(2024, 3)}));
    expect(problems.map((p) => p.message)).toEqual([
      'the review period 2024-03 is before the first value of series stock (2024-05); choose a later `period`',
    ]);
  });
});

describe('long layout', () => {
  const long = {layout: 'long', dateColumn: 'date', keyColumn: 'series', valueColumn: 'value'} as const;
  const web = source('web', 'long.csv', long);

  it('expands fromSource keys into series in first-seen order, at the pack position', async () => {
    const sales = source('s', 'gaps.csv');
    const p = plan('monthly', [sales, web], [series('sales', 's')], {fromSource: [fromSource('web', 0)]});
    const d = await readPack(p);
    expect(d.series.map((s) => s.id)).toEqual(['web-visits-uk', 'web-visits-de', 'sign-ups', 'sales']);
    expect(d.plans!.map((s) => [s.id, s.label, s.column, s.source])).toEqual([
      ['web-visits-uk', 'Web visits (UK)', 'Web visits (UK)', 'web'],
      ['web-visits-de', 'Web visits (DE)', 'Web visits (DE)', 'web'],
      ['sign-ups', 'Sign-ups', 'Sign-ups', 'web'],
      ['sales', 'sales', 'sales', 's'],
    ]);
    expect(d.period).toBe(monthIndex(2024, 8));
    expect(values(d, 'web-visits-uk')).toEqual([100, 110, 120, NaN, NaN, NaN, NaN, NaN]);
    expect(values(d, 'sign-ups').slice(0, 3)).toEqual([5, 6, 7]);
    expect(placed(d.notes.find((n) => /date order/.test(worded(n))))).toEqual({
      file: join(FIXTURES, 'long.csv'),
      line: 10,
      message: 'rows are not in date order (first at line 10); they were sorted',
    });
  });

  it('explicit series name keys; a missing key suggests the nearest', async () => {
    const d = await readPack(plan('monthly', [web], [series('uk', 'web', {column: 'Web visits (UK)'})]));
    expect(values(d, 'uk')).toEqual([100, 110, 120]);
    const problems = await problemsOf(plan('monthly', [web], [series('fr', 'web', {column: 'Web visit (UK)'})]));
    // The key is written in the pack, so the problem points at the series' pack line (10 in these test plans).
    expect(problems).toEqual([
      {
        file: join(FIXTURES, 'pack.yaml'),
        line: 10,
        column: null,
        message: 'long.csv: no rows with series = "Web visit (UK)" (series fr); did you mean "Web visits (UK)"?',
      },
    ]);
  });

  it('duplicates within a key name both lines', async () => {
    const src = source('l', 'long-duplicate.csv', long);
    const problems = await problemsOf(plan('monthly', [src], [series('visits', 'l')]));
    expect(problems.map((p) => [p.line, p.message])).toEqual([
      [5, '"visits" has two rows for 2024-02, on lines 3 and 5; keep one row per period, or set `aggregate` on the series to combine them'],
    ]);
  });

  it('a key whose slug is already an id is a problem; targets and groups are checked after expanding', async () => {
    const list = [series('sign-ups', 'web', {column: 'Web visits (DE)', target: 'web-visits-uk'})];
    const p = plan('monthly', [web], list, {
      fromSource: [fromSource('web', 1)],
      groups: [{id: 'web', title: 'Web', series: ['web-visits-uk', 'web-visits-fr']}],
    });
    const problems = await problemsOf(p);
    expect(problems.map((x) => x.message)).toEqual([
      'key "Sign-ups" becomes series id "sign-ups", which series sign-ups already uses; rename one of them',
      'group web lists web-visits-fr, which is neither a series of the pack nor a key of a fromSource source',
    ]);
  });
});

describe('blank rows and keys', () => {
  it('rows of bare delimiters are skipped; a blank key in a long file is a problem', async () => {
    const wide = source('w', write('trailing.csv', 'month,sales\n2024-01,1\n2024-02,2\n,\n,\n'));
    const d = await readPack(plan('monthly', [wide], [series('sales', 'w')]));
    expect(values(d, 'sales')).toEqual([1, 2]);
    const long = source('l', write('blank-key.csv', 'date,series,value\n2024-01,a,1\n2024-02, ,2\n'), {
      layout: 'long',
      dateColumn: 'date',
      keyColumn: 'series',
      valueColumn: 'value',
    });
    const problems = await problemsOf(plan('monthly', [long], [series('a', 'l')]));
    expect(problems).toEqual([
      expect.objectContaining({line: 3, column: 2, message: 'the key in column "series" is blank'}),
    ]);
  });
});
