/**
 * Which language of ours a BCP 47 locale tag speaks, and which locale formats its numbers and dates.
 *
 * The report is written in English, German or French; any other locale keeps its own numbers and dates
 * (`Intl`) but English words, and the report says so once ({@link Language.fallback}). A tag `Intl` does not
 * know falls back to `en-GB` for both.
 */
export type LanguageCode = 'en' | 'de' | 'fr';

export const LANGUAGES: readonly LanguageCode[] = ['en', 'de', 'fr'];

export interface Language {
  /** Language of the words. */
  code: LanguageCode;
  /** Locale of numbers and dates, as `Intl` resolved it. */
  locale: string;
  /** True when the pack's locale has no words of its own here, so English words are used. */
  fallback: boolean;
}

const cache = new Map<string, Language>();

/** The language and number locale for a pack's `locale` tag. */
export function languageOf(tag: string): Language {
  const hit = cache.get(tag);
  if (hit) return hit;
  const locale = resolveLocale(tag);
  const base = locale.split('-')[0].toLowerCase();
  const code = (LANGUAGES as readonly string[]).includes(base) ? (base as LanguageCode) : 'en';
  const language = {code, locale, fallback: code !== base};
  cache.set(tag, language);
  return language;
}

/** The locale tag we will actually use: `tag` when Intl supports it, else `en-GB`. */
export function resolveLocale(tag: string): string {
  try {
    return Intl.NumberFormat.supportedLocalesOf([tag]).length > 0 ? tag : 'en-GB';
  } catch {
    return 'en-GB';
  }
}
