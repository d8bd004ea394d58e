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
  private rows = 0;
  private open = true;

  constructor(
    private readonly source: SourcePlan,
    private readonly visitor: RowVisitor,
  ) {}

  /** The column names; false when the visitor stops (a needed column is missing). */
  header(names: string[]): boolean {
    this.digest(names);
    this.open = this.visitor.header(names, 0);
    return this.open;
  }

  /** One row of text fields (null = SQL NULL). */
  row(fields: (string | null)[]): void {
    this.digest(fields);
    this.rows++;
    this.visitor.record(
      fields.map((f) => f ?? ''),
      this.rows,
    );
  }

  get count(): number {
    return this.rows;
  }

  /** What the manifest records of the query: engine, text, fingerprint, size of the canonical text, rows. */
  input(): InputFile {
    const engine = this.source.reader === 'postgres' ? 'postgres' : 'duckdb';
    return {
      file: `${this.source.id} (${engine} query)`,
      sha256: this.hash.digest('hex'),
      bytes: this.bytes,
      rows: this.rows,
      query: {engine, text: this.source.query ?? ''},
    };
  }

  private digest(fields: (string | null)[]): void {
    const line = fields.map((f) => (f === null ? '\\N' : f.replace(/[\\\t\n\r]/g, escape))).join('\t') + '\n';
    this.bytes += Buffer.byteLength(line);
    this.hash.update(line);
  }
}

function escape(c: string): string {
  return c === '\\' ? '\\\\' : c === '\t' ? '\\t' : c === '\n' ? '\\n' : '\\r';
}
