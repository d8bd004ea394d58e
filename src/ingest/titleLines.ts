import {closeSync, openSync, readSync} from 'node:fs';
import iconv from 'iconv-lite';
import {sniffDelimiter} from './sniffDelimiter.js';
import {utf16Order} from './utf16.js';

/** How far past a title line the column names are looked for: the first lines of the file, at most 64 KiB. */
const LOOK_LINES = 50;
const LOOK_BYTES = 64 * 1024;

/**
 * The 1-based line of a CSV file that seems to hold its column names when the header line holds only a title:
 * the first line after `after` (itself 1-based) among the file's first 50 whose fields, split at the delimiter
 * sniffed from that line and unquoted, include `name`. Reads at most the first 64 KiB again, only when a column is
 * missing. Null when no such line is found or the file cannot be read (the missing column is reported anyway).
 */
export function lineHoldingColumn(
  file: string,
  encoding: 'utf-8' | 'windows-1252',
  after: number,
  name: string,
): number | null {
  let bytes: Buffer;
  try {
    const fd = openSync(file, 'r');
    try {
      const buffer = Buffer.alloc(LOOK_BYTES);
      bytes = buffer.subarray(0, readSync(fd, buffer, 0, LOOK_BYTES, 0));
    } finally {
      closeSync(fd);
    }
  } catch {
    return null;
  }
  const wide = utf16Order(bytes);
  const text = wide
    ? iconv.decode(bytes, wide)
    : encoding === 'windows-1252'
      ? iconv.decode(bytes, 'win1252')
      : bytes.toString('utf8');
  const lines = text.replace(/^\ufeff/, '').split(/\r\n|\r|\n/, LOOK_LINES);
  for (let i = after; i < lines.length; i++) {
    const fields = lines[i].split(sniffDelimiter(lines[i])).map((f) => f.trim().replace(/^"(.*)"$/, '$1').trim());
    if (fields.includes(name)) return i + 1;
  }
  return null;
}
