import type {MessageKey} from './catalog/en.js';
import type {Words} from './words.js';

/** The code of a note: its message key without the `note.` prefix. */
export type NoteCode = MessageKey extends infer K ? (K extends `note.${infer C}` ? C : never) : never;

/**
 * A note from the analysis or from reading the data, as a code and its values instead of a sentence: the words
 * module words it in the pack's language where it is shown (report, results.json, manifest). Values are plain
 * strings and numbers (numbers for counts that choose a plural).
 */
export interface Note {
  code: NoteCode;
  values: Record<string, string | number>;
}

/** A note in words. */
export function wordNote(words: Words, note: Note): string {
  return words.t(`note.${note.code}` as MessageKey, note.values);
}

/**
 * A data note in words, led by the id of its series when it is about one (`net-sales: 3 missing months: …`); a note
 * that came as a sentence is given as it is.
 */
export function wordDataNote(words: Words, note: {series?: string | null; note?: Note; message?: string}): string {
  if (note.note === undefined) return note.message ?? '';
  const text = wordNote(words, note.note);
  return note.series == null ? text : words.t('note.ofSeries', {series: note.series, text});
}
