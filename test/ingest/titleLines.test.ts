import {mkdtempSync, rmSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import iconv from 'iconv-lite';
import {afterAll, describe, expect, it} from 'vitest';
import {lineHoldingColumn} from '../../src/ingest/titleLines.js';

const temp = mkdtempSync(join(tmpdir(), 'ebbflow-title-'));
afterAll(() => rmSync(temp, {recursive: true, force: true}));

describe('lineHoldingColumn', () => {
  it('finds the line with the column names below title lines, in either encoding, quoted or not', () => {
    const utf8 = join(temp, 'utf8.csv');
    writeFileSync(utf8, '\ufeffTill export\r\nPrinted 03/12/2026\r\nDate,Till,Amount\r\n05/01/2026,North,12.50\r\n');
    expect(lineHoldingColumn(utf8, 'utf-8', 1, 'Amount')).toBe(3);
    expect(lineHoldingColumn(utf8, 'utf-8', 1, 'Sales')).toBeNull();
    // Only lines after the header line given are searched.
    expect(lineHoldingColumn(utf8, 'utf-8', 3, 'Amount')).toBeNull();
    const latin = join(temp, 'latin.csv');
    writeFileSync(latin, iconv.encode('Bericht\n\n"Datum";"Umsätze"\n01.01.2026;12,50\n', 'win1252'));
    expect(lineHoldingColumn(latin, 'windows-1252', 1, 'Umsätze')).toBe(3);
    expect(lineHoldingColumn(join(temp, 'missing.csv'), 'utf-8', 1, 'Date')).toBeNull();
  });
});
