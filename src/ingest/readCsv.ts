import {createHash} from 'node:crypto';
import {createReadStream} from 'node:fs';
import iconv from 'iconv-lite';
import type {SourcePlan} from '../config/plan.js';
import {CsvRecords, CsvSyntaxError} from './csvRecords.js';
import type {InputFile} from './types.js';
import type {ProblemLog} from './problemLog.js';
import {sniffDelimiter} from './sniffDelimiter.js';
import * as msg from './messages.js';
import type {RowVisitor} from './rowVisitor.js';
import {utf16Order} from './utf16.js';


/**
 * Stream one CSV source through a visitor, reading the file once: the raw bytes are hashed (SHA-256)
 * and counted, decoded (UTF-8 validated strictly, or Windows-1252 through iconv-lite because Node 20's
 * TextDecoder maps 0x80–0x9F to control characters, or UTF-16 when the file starts with its byte-order mark, see
 * utf16.ts), the delimiter is sniffed from the header line when `auto`, and {@link CsvRecords} cuts the text into
 * records from the source's `headerRow` on (title lines above it are skipped). Memory stays bounded by the
 * stream's chunk size.
 *
 * File, decoding and CSV-syntax failures go to `problems`; the result is then undefined.
 */
export async function readCsv(
  source: SourcePlan,
  visitor: RowVisitor,
  problems: ProblemLog,
): Promise<InputFile | undefined> {
  const hash = createHash('sha256');
  const counter = {bytes: 0, lines: 1};
  const text = decodedText(source, hash, counter);
  let rows = 0;
  // Set once the visitor rejects the header (its problems are reported): the rest is not read.
  let stopped = false;
  try {
    let head = '';
    let lines: string[] = [];
    for (;;) {
      const next = await text.next();
      if (next.done) break;
      head += next.value;
      lines = head.replace(/^\ufeff/, '').split(/\r\n|\r|\n/, source.headerRow + 1);
      if (lines.length > source.headerRow) break;
    }
    const headerLine = lines[source.headerRow - 1];
    if (headerLine === undefined) {
      const count = lines.length - (lines.at(-1) === '' ? 1 : 0);
      if (count === 0) problems.add(source.file, 1, null, msg.emptyFile());
      else problems.add(source.file, null, null, msg.headerBeyondEnd(source.headerRow, count));
      return undefined;
    }
    const delimiter = source.delimiter === 'auto' ? sniffDelimiter(headerLine) : source.delimiter;
    if (headerLine.split(delimiter).every((f) => f.trim() === '') && head.trim() !== '') {
      problems.add(source.file, source.headerRow, null, msg.emptyHeader(source.headerRow));
      return undefined;
    }
    let headerSeen = false;
    const records = new CsvRecords(
      delimiter,
      (record, line) => {
        if (stopped) return;
        if (headerSeen) {
          rows++;
          visitor.record(record, line);
        } else {
          headerSeen = true;
          stopped = !visitor.header(
            record.map((f) => f.trim()),
            line,
          );
        }
      },
      source.headerRow,
      visitor.line === undefined
        ? undefined
        : (s, start, end, line) => {
            if (stopped || !headerSeen || !visitor.line!(s, start, end, line, delimiter)) return false;
            rows++;
            return true;
          },
    );
    records.push(head.replace(/^\ufeff/, ''));
    for (;;) {
      if (stopped) break;
      const next = await text.next();
      if (next.done) break;
      records.push(next.value);
    }
    if (stopped) {
      await text.return(undefined);
      return undefined;
    }
    records.end();
    if (!headerSeen) {
      problems.add(source.file, 1, null, msg.emptyFile());
      return undefined;
    }
  } catch (e) {
    if (e instanceof DecodeFailure) problems.add(source.file, e.line, null, e.message);
    // After a rejected header a syntax error further on is a follow-on (read with the wrong line's delimiter).
    else if (e instanceof CsvSyntaxError) {
      if (!stopped) problems.add(source.file, e.line, null, msg.csvSyntax(e.message));
    }
    else if (isFileError(e)) problems.add(source.file, null, null, msg.unreadableFile(e.code));
    else throw e;
    return undefined;
  }
  return {file: source.file, sha256: hash.digest('hex'), bytes: counter.bytes, rows};
}

class DecodeFailure extends Error {
  constructor(
    message: string,
    readonly line: number,
  ) {
    super(message);
  }
}

/** Raw chunks → hashed, counted, decoded text chunks. */
async function* decodedText(
  source: SourcePlan,
  hash: ReturnType<typeof createHash>,
  counter: {bytes: number; lines: number},
): AsyncGenerator<string> {
  const win1252 = source.encoding === 'windows-1252';
  let decoder = win1252 ? iconv.getDecoder('win1252') : undefined;
  const utf8 = new TextDecoder('utf-8', {fatal: true});
  for await (const chunk of createReadStream(source.file) as AsyncIterable<Buffer>) {
    if (counter.bytes === 0 && win1252 && chunk[0] === 0xef && chunk[1] === 0xbb && chunk[2] === 0xbf) {
      throw new DecodeFailure(msg.utf8BomInWindows1252(), 1);
    }
    const wide = counter.bytes === 0 ? utf16Order(chunk) : null;
    if (wide) decoder = iconv.getDecoder(wide);
    hash.update(chunk);
    counter.bytes += chunk.length;
    let text: string;
    if (decoder) text = decoder.write(chunk);
    else {
      try {
        text = utf8.decode(chunk, {stream: true});
      } catch {
        const partial = new TextDecoder('utf-8').decode(chunk);
        const before = partial.slice(0, Math.max(0, partial.indexOf('\ufffd')));
        throw new DecodeFailure(msg.notUtf8(), counter.lines + countNewlines(before));
      }
    }
    counter.lines += countNewlines(text);
    yield text;
  }
  try {
    yield decoder ? (decoder.end() ?? '') : utf8.decode();
  } catch {
    throw new DecodeFailure(msg.notUtf8(), counter.lines);
  }
}

function countNewlines(text: string): number {
  let n = 0;
  for (let i = text.indexOf('\n'); i >= 0; i = text.indexOf('\n', i + 1)) n++;
  return n;
}

function isFileError(e: unknown): e is {code: string} {
  const code = typeof e === 'object' && e !== null ? (e as {code?: unknown}).code : undefined;
  return typeof code === 'string' && /^E[A-Z]+$/.test(code);
}
