/** Ids of packs, sources, series and groups: lowercase letters, digits and hyphens, not starting with a hyphen. */
export const SLUG = /^[a-z0-9][a-z0-9-]*$/;

/**
 * Turn a name into an id: lowercase, runs of other characters become one hyphen, no hyphen at
 * either end; `item` when nothing is left. Used for the default pack id (from the file name) and,
 * by ingest, for series ids taken from the keys of a long source (`fromSource`).
 *
 * @example slugify('Web visits (UK)') // => 'web-visits-uk'
 */
export function slugify(name: string): string {
  const s = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return s === '' ? 'item' : s;
}
