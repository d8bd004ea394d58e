import type {Frequency} from '../time/period.js';
import type {MessageKey} from './catalog/en.js';
import type {Words} from './words.js';

/** The code of a note: its message key without the `note.` prefix. */
export type NoteCode = MessageKey extends infer K ? (K extends `note.${infer C}` ? C : never) : never;

/** How many periods a note lists by name before it ends in `and n more`. */
const LISTED = 12;

/**
 * A note from the analysis or from reading the data, as a code and its values instead of a sentence: the words
 * module words it in the pack's language where it is shown (report, results.json, manifest). Values are plain
 * strings and numbers (numbers for counts that choose a plural). `periods` holds the values that name periods of
 * the pack's calendar (a period index, or a list of them), worded as the report words periods (`October 2026`,
 * `Oktober 2026`, `octobre 2026`; a list as `a, b and c`); `figures` the measured numbers, written by the report's
 * one number format (`1,234.5`, `1.234,5`, `1 234,5`).
 */
export interface Note {
  code: NoteCode;
  values: Record<string, string | number>;
  periods?: {frequency: Frequency; named: Record<string, number | readonly number[]>};
  figures?: Record<string, number>;
}

/** A note in words. */
export function wordNote(words: Words, note: Note): string {
  const values: Record<string, string | number> = {...note.values};
  for (const [name, x] of Object.entries(note.figures ?? {})) values[name] = words.number(x);
  if (note.periods !== undefined) {
    const {frequency, named} = note.periods;
    const long = (i: number) => words.periodLong(frequency, i);
    for (const [name, p] of Object.entries(named)) values[name] = typeof p === 'number' ? long(p) : words.list(p.map(long), LISTED);
  }
  return words.t(`note.${note.code}` as MessageKey, values);
}

/** Where a data note from a query source came from: the source's id and the row of the query's result, if one. */
export interface QueryPlace {
  source: string;
  row: number | null;
}

/**
 * A data note in words, led by the id of its series when it is about one (`net-sales: 3 missing months: …`), or by
 * its query source and row when it came from a query.
 */
export function wordDataNote(words: Words, note: {series: string | null; note: Note; query?: QueryPlace}): string {
  const text = wordNote(words, note.note);
  if (note.series != null) return words.t('note.ofSeries', {series: note.series, text});
  if (note.query === undefined) return text;
  const {source, row} = note.query;
  return words.t('note.ofQuery', {source, at: row === null ? 'none' : 'row', row: String(row ?? ''), text});
}
