/**
 * Every problem and note text of the ingest stage, one function each. Problems say what is wrong and
 * how to fix it; the file, line and column travel beside the text (see errors.ts).
 */
import type {Frequency} from '../time/period.js';
import type {Note} from '../words/index.js';

const UNIT: Record<Frequency, [string, string]> = {
  monthly: ['month', 'months'],
  quarterly: ['quarter', 'quarters'],
  weekly: ['week', 'weeks'],
};
const EXAMPLE: Record<Frequency, string> = {monthly: '2026-10', quarterly: '2026-Q3', weekly: '2026-W41'};
const LISTED = 12;

/** `1 month`, `3 months`. */
export function count(frequency: Frequency, n: number): string {
  return `${n} ${UNIT[frequency][n === 1 ? 0 : 1]}`;
}

export const emptyFile = (): string => 'the file is empty: it needs a header line and data rows';
export const noRows = (): string => 'the file has a header line but no data rows';
export const unreadableFile = (code: string): string => `cannot read the file (${code})`;
export const csvSyntax = (detail: string): string => `not valid CSV: ${detail}`;
export const notUtf8 = (): string =>
  'the file is not valid UTF-8; if it was saved by a spreadsheet in Western European encoding, add `encoding: windows-1252` to the source';
export const utf8BomInWindows1252 = (): string =>
  'the file starts with a UTF-8 byte-order mark but the source says `encoding: windows-1252`; remove that line (UTF-8 is the default)';

export const missingColumn = (what: string, name: string, suggestion: string | undefined, header: string[]): string =>
  `${what} "${name}" is not in the header` +
  (suggestion !== undefined
    ? `; did you mean "${suggestion}"?`
    : `; the columns are: ${listed(header.map((h) => `"${h}"`))}`);
export const duplicateColumn = (name: string, columns: number[]): string =>
  `column "${name}" appears ${columns.length} times in the header (columns ${columns.join(', ')}); rename all but one`;
export const missingKey = (column: string, key: string, seriesId: string, suggestion: string | undefined): string =>
  `no rows with ${column} = "${key}" (series ${seriesId})` +
  (suggestion !== undefined ? `; did you mean "${suggestion}"?` : '');
export const noKeys = (sourceId: string): string =>
  `source ${sourceId} has no rows, so \`fromSource: ${sourceId}\` gives no series`;
export const slugClash = (id: string, key: string, other: string): string =>
  `key "${key}" becomes series id "${id}", which ${other} already uses; rename one of them`;

export const badDate = (text: string, column: string, frequency: Frequency): string =>
  `"${text}" in column "${column}" is not a date; write ${EXAMPLE[frequency]} or a full date such as 2026-10-31`;
export const blankKey = (column: string): string => `the key in column "${column}" is blank`;
export const blankDate = (column: string): string => `the date in column "${column}" is blank`;
export const mixedFrequency = (text: string, column: string, found: Frequency, pack: Frequency): string =>
  `column "${column}" holds ${found} periods ("${text}") but the pack is ${pack}; a pack has one frequency, ` +
  `so read this file from a ${found} pack, or give full dates or ${pack} periods such as ${EXAMPLE[pack]}`;
export const duplicateRow = (label: string, first: number, second: number): string =>
  `${label} appears twice, on lines ${first} and ${second}; keep one row per period`;
export const duplicateKeyRow = (key: string, label: string, first: number, second: number): string =>
  `"${key}" has two rows for ${label}, on lines ${first} and ${second}; keep one row per period`;
export const missingColumnDelimiter = (what: string, name: string, declared: string, found: string): string =>
  `${what} "${name}" is not in the header: split at ${shown(declared)} the header is one column, but it splits at ` +
  `${shown(found)}; set \`delimiter: "${found === '\t' ? '\\t' : found}"\` (or \`auto\`) on the source`;
export const shortRow = (fields: number, header: number): string =>
  `the row has ${fields} fields but the header has ${header}; a delimiter or quote may be missing`;
export const notANumber = (text: string, column: string, advice: string): string =>
  `"${text}" in column "${column}" is not a number: ${advice}`;
export const allMissing = (seriesId: string, where: string): string =>
  `series ${seriesId} has no values: every cell of ${where} is blank or missing`;
export const periodBeforeData = (seriesId: string, period: string, first: string): string =>
  `the review period ${period} is before the first value of series ${seriesId} (${first}); choose a later \`period\``;
export const noData = (): string => 'the pack names no series with data, so there is no review period';
export const unknownSource = (seriesId: string, sourceId: string): string =>
  `series ${seriesId} names source ${sourceId}, which the pack does not define`;

// Data notes are coded (worded in the pack's language by src/words); problems above stay sentences.
export const outOfOrder = (line: number): Note => ({code: 'outOfOrder', values: {line: String(line)}});
export const gaps = (frequency: Frequency, labels: string[]): Note => ({
  code: 'gaps',
  values: {frequency, n: labels.length, list: labels.slice(0, LISTED).join(', '), more: Math.max(0, labels.length - LISTED)},
});
export const truncated = (frequency: Frequency, n: number, period: string, from: string, to: string): Note => ({
  code: 'truncated',
  values: {frequency, n, period, from, to, same: from === to ? 'yes' : 'no'},
});
export const padded = (frequency: Frequency, last: string, n: number, period: string): Note => ({
  code: 'padded',
  values: {frequency, last, n, period},
});
export const inferredPeriod = (period: string): Note => ({code: 'inferredPeriod', values: {period}});

function shown(delimiter: string): string {
  return delimiter === '\t' ? 'tabs' : `"${delimiter}"`;
}

function listed(items: string[]): string {
  if (items.length <= LISTED) return items.join(', ');
  return `${items.slice(0, LISTED).join(', ')} and ${items.length - LISTED} more`;
}
export const unknownTarget = (seriesId: string, target: string): string =>
  `series ${seriesId} has target ${target}, which is neither a series of the pack nor a key of a fromSource source`;
export const unknownMember = (groupId: string, id: string): string =>
  `group ${groupId} lists ${id}, which is neither a series of the pack nor a key of a fromSource source`;
