/** Month names by locale, built once per locale: lower-cased name (with and without a trailing dot) → month 1–12. */
const cache = new Map<string, Map<string, number>>();

const ENGLISH = [
  ['jan', 'january'],
  ['feb', 'february'],
  ['mar', 'march'],
  ['apr', 'april'],
  ['may', 'may'],
  ['jun', 'june'],
  ['jul', 'july'],
  ['aug', 'august'],
  ['sep', 'september', 'sept'],
  ['oct', 'october'],
  ['nov', 'november'],
  ['dec', 'december'],
];

/**
 * The month names a date cell may use in a pack of this locale: the short and long names that
 * `Intl.DateTimeFormat(locale, {month})` writes (`Okt`, `Oktober` in `de-DE`; `janv.`, `janvier` in `fr-FR`),
 * as standalone and as written inside a date, plus the English names, which exports use whatever the locale.
 * Keys are lower-cased in the locale and kept with and without a trailing dot.
 *
 * Complexity: 48 `Intl` calls the first time a locale is asked for, then a map lookup.
 *
 * @example monthNames('de-DE').get('okt') // => 10
 */
export function monthNames(locale: string): Map<string, number> {
  let names = cache.get(locale);
  if (names !== undefined) return names;
  names = new Map();
  ENGLISH.forEach((list, i) => list.forEach((n) => names!.set(n, i + 1)));
  for (const month of ['short', 'long'] as const) {
    const alone = new Intl.DateTimeFormat(locale, {month, timeZone: 'UTC'});
    const inDate = new Intl.DateTimeFormat(locale, {month, year: 'numeric', timeZone: 'UTC'});
    for (let m = 1; m <= 12; m++) {
      const at = new Date(Date.UTC(2001, m - 1, 15));
      const inside = inDate.formatToParts(at).find((p) => p.type === 'month')?.value ?? '';
      for (const written of [alone.format(at), inside]) {
        const key = written.toLocaleLowerCase(locale).trim();
        if (key === '' || /\d/.test(key)) continue;
        if (!names.has(key)) names.set(key, m);
        const bare = key.replace(/\.$/, '');
        if (!names.has(bare)) names.set(bare, m);
      }
    }
  }
  cache.set(locale, names);
  return names;
}
