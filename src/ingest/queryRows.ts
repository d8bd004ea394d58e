import {createHash} from 'node:crypto';
import type {SourcePlan} from '../config/plan.js';
import type {RowVisitor} from './rowVisitor.js';
import type {InputFile} from './types.js';

/**
 * Hands a query's rows to a visitor and keeps their fingerprint: SHA-256 of the rows as read, in a canonical
 * text (PostgreSQL's COPY text format: fields as the engine writes them as text, tab-separated, one line per
 * row, the header first, NULL as `\N`, and backslash, tab and newline escaped). The same rows give the same
 * hash whatever the engine's chunking, so a changed table shows in the manifest like a changed CSV.
 */
export class QueryRows {
  private readonly hash = createHash('sha256');
  private bytes = 0;
  /** Data rows handed on so far. */
  count = 0;

  constructor(
    private readonly source: SourcePlan,
    private readonly visitor: RowVisitor,
  ) {}

  /** The column names; false when the visitor stops (a needed column is missing). */
  header(names: string[]): boolean {
    const text = line(names);
    this.bytes += Buffer.byteLength(text);
    this.hash.update(text);
    return this.visitor.header(names, 0);
  }

  /**
   * The rows of one result chunk, as text fields (null = SQL NULL); each array is handed on with its nulls made
   * blank. The chunk's canonical text is hashed in one piece (hashing row by row cost more than the rows' parsing).
   */
  rows(chunk: (string | null)[][]): void {
    let text = '';
    for (const fields of chunk) {
      text += line(fields);
      for (let i = 0; i < fields.length; i++) if (fields[i] === null) fields[i] = '';
      this.count++;
      this.visitor.record(fields as string[], this.count);
    }
    this.bytes += Buffer.byteLength(text);
    this.hash.update(text);
  }

  /** What the manifest records of the query: engine, text, fingerprint, size of the canonical text, rows. */
  input(): InputFile {
    const engine = this.source.reader === 'postgres' ? 'postgres' : 'duckdb';
    return {
      file: `${this.source.id} (${engine} query)`,
      sha256: this.hash.digest('hex'),
      bytes: this.bytes,
      rows: this.count,
      query: {engine, text: this.source.query ?? ''},
    };
  }
}

const SPECIAL = /[\\\t\n\r]/;

/** One row in COPY text form: fields tab-separated, NULL as `\N`, backslash, tab and line breaks escaped. */
export function line(fields: readonly (string | null)[]): string {
  let out = '';
  for (let i = 0; i < fields.length; i++) {
    const f = fields[i];
    if (i > 0) out += '\t';
    out += f === null ? '\\N' : SPECIAL.test(f) ? f.replace(/[\\\t\n\r]/g, escape) : f;
  }
  return out + '\n';
}

function escape(c: string): string {
  return c === '\\' ? '\\\\' : c === '\t' ? '\\t' : c === '\n' ? '\\n' : '\\r';
}
