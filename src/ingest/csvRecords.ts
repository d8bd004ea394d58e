/** A CSV syntax error at a line, with a message in the form the problem list shows. */
export class CsvSyntaxError extends Error {
  constructor(
    message: string,
    readonly line: number,
  ) {
    super(message);
  }
}

/**
 * Splits CSV text, pushed in chunks of any size, into records of fields (RFC 4180), calling `onRecord(fields, line)`
 * with the 1-based line where each record ends. Lines end in LF, CRLF or CR; empty lines are skipped; records
 * may have any number of fields. A field that starts with `"` is quoted: it may hold delimiters, line breaks and
 * `""` for a quote, and must close before the next delimiter or line end. A quote inside an unquoted field is kept
 * as a character. Lines before `fromLine` are skipped unread (title lines above a header). A line without quotes is
 * first offered whole to `onLine` (when given), which may read it without the fields being cut.
 *
 * Why not a general CSV library: a line without a quote, the common case of exports, is cut with `String.split`,
 * several times faster per row than a character-by-character parser (measured with the ingest benchmark); quoted
 * lines take the careful path.
 *
 * Complexity: O(text length); memory bounded by the longest record plus one chunk.
 */
export class CsvRecords {
  private rest = '';
  /** Line number of the first character of `rest`. */
  private line = 1;

  constructor(
    private readonly delimiter: string,
    private readonly onRecord: (fields: string[], line: number) => void,
    private readonly fromLine = 1,
    private readonly onLine?: (s: string, start: number, end: number, line: number) => boolean,
  ) {}

  /** Take a chunk of text; whole records in it are handed on, the incomplete tail is kept. */
  push(text: string): void {
    this.rest = this.split(this.rest === '' ? text : this.rest + text, false);
  }

  /** The end of the text: the last record (with or without a final line break); an open quote is an error. */
  end(): void {
    this.rest = this.split(this.rest, true);
  }

  private split(s: string, eof: boolean): string {
    const d = this.delimiter;
    let i = 0;
    // Next LF, CR and quote at or after i (-1: none left), each searched again only once passed.
    let lf = s.indexOf('\n');
    let cr = s.indexOf('\r');
    let qt = s.indexOf('"');
    while (i < s.length) {
      if (lf !== -1 && lf < i) lf = s.indexOf('\n', i);
      if (cr !== -1 && cr < i) cr = s.indexOf('\r', i);
      if (qt !== -1 && qt < i) qt = s.indexOf('"', i);
      const nl = lf === -1 ? cr : cr === -1 ? lf : Math.min(lf, cr);
      if (nl === -1 && !eof) break;
      const end = nl === -1 ? s.length : nl;
      // Character codes, not one-character strings: this runs once per line.
      const isCr = nl !== -1 && s.charCodeAt(nl) === 13;
      const next = nl === -1 ? s.length : isCr && s.charCodeAt(nl + 1) === 10 ? nl + 2 : nl + 1;
      if (isCr && nl + 1 === s.length && !eof) break; // a CR at the end may be half of CRLF
      if (this.line < this.fromLine) {
        this.line++;
        i = next;
        continue;
      }
      if (qt === -1 || qt >= end) {
        if (end > i && !this.onLine?.(s, i, end, this.line)) this.onRecord(fieldsOf(s, i, end, d), this.line);
        this.line++;
        i = next;
        continue;
      }
      const done = this.quoted(s, i, eof);
      if (done === -1) break;
      i = done;
    }
    return s.slice(i);
  }

  /**
   * One record that has a quote somewhere, character by character from `start`; returns the index after its line
   * break, or -1 when the text ends inside it and more may come.
   */
  private quoted(s: string, start: number, eof: boolean): number {
    const d = this.delimiter;
    const fields: string[] = [];
    let lines = 0;
    let i = start;
    for (;;) {
      let field = '';
      if (s[i] === '"') {
        const opened = this.line + lines;
        i++;
        for (;;) {
          const q = s.indexOf('"', i);
          if (q === -1) {
            if (!eof) return -1;
            throw new CsvSyntaxError(
              `Quote Not Closed: the parsing is finished with an opening quote at line ${opened}`,
              opened,
            );
          }
          const piece = s.slice(i, q);
          field += piece;
          lines += countBreaks(piece);
          if (s[q + 1] === '"') {
            field += '"';
            i = q + 2;
            continue;
          }
          if (q + 1 === s.length && !eof) return -1;
          i = q + 1;
          break;
        }
        const c = s[i];
        if (i < s.length && c !== d && c !== '\n' && c !== '\r') {
          const at = this.line + lines;
          throw new CsvSyntaxError(
            `Invalid Closing Quote: got "${c}" at line ${at} instead of delimiter, record delimiter, trimable character (if activated) or comment`,
            at,
          );
        }
      } else {
        let j = i;
        while (j < s.length && s[j] !== d && s[j] !== '\n' && s[j] !== '\r') j++;
        field = s.slice(i, j);
        i = j;
      }
      fields.push(field);
      if (i >= s.length) {
        if (!eof) return -1;
        this.onRecord(fields, this.line + lines);
        this.line += lines + 1;
        return s.length;
      }
      if (s[i] === d) {
        i++;
        continue;
      }
      // A line break ends the record.
      if (s[i] === '\r' && i + 1 === s.length && !eof) return -1;
      const next = s[i] === '\r' && s[i + 1] === '\n' ? i + 2 : i + 1;
      this.onRecord(fields, this.line + lines);
      this.line += lines + 1;
      return next;
    }
  }
}

/** Line breaks in a text: LF, CRLF (one) and lone CR. */
function countBreaks(text: string): number {
  let n = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 10) n++;
    else if (c === 13 && text.charCodeAt(i + 1) !== 10) n++;
  }
  return n;
}

/** The fields of s[start, end), a line without quotes, cut at each delimiter (no copy of the whole line). */
function fieldsOf(s: string, start: number, end: number, d: string): string[] {
  const fields: string[] = [];
  let i = start;
  for (let j = s.indexOf(d, i); j !== -1 && j < end; j = s.indexOf(d, i)) {
    fields.push(s.slice(i, j));
    i = j + d.length;
  }
  fields.push(s.slice(i, end));
  return fields;
}
