import {createRequire} from 'node:module';

/** Ids of packs, sources, series and groups: lowercase letters, digits and hyphens, not starting with a hyphen. */
export const SLUG = /^[a-z0-9][a-z0-9-]*$/;

const require = createRequire(import.meta.url);
let transliterate: ((text: string) => string) | null = null;

/**
 * Turn a name into an id: lowercase, accents dropped, runs of other characters become one hyphen, no hyphen at
 * either end. A name in another script (Cyrillic, Greek, CJK, Arabic…), which leaves nothing that way, is first
 * transliterated to Latin letters with the `transliteration` package (its tables follow Unidecode: Москва → moskva,
 * Αθήνα → athina, 北京 → bei-jing); what still leaves nothing (emoji, symbols) becomes its code points (`u1f642`).
 * So distinct keys of a long source do not all become one id. Used for the default pack id (from the file name)
 * and, by ingest, for series ids taken from the keys of a long source (`fromSource`).
 *
 * @example slugify('Web visits (UK)') // => 'web-visits-uk'
 * @example slugify('Москва') // => 'moskva'
 */
export function slugify(name: string): string {
  const plain = latinSlug(name);
  if (plain !== '') return plain;
  // Loaded on first use only: its tables are a megabyte of code, needed only for names in other scripts.
  transliterate ??= (require('transliteration') as {transliterate: (text: string) => string}).transliterate;
  const spelled = latinSlug(transliterate(name));
  if (spelled !== '') return spelled;
  const points = [...name.trim()].map((c) => `u${c.codePointAt(0)!.toString(16)}`).join('-');
  return points === '' ? 'item' : points;
}

function latinSlug(name: string): string {
  return name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
}
