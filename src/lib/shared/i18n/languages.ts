// The languages the app speaks, and what each means for Intl (dates, numbers, money). Plain data:
// read by the server, the islands and the cut sheet alike.

/** Every language with a complete catalog; the first is the default. */
export const LANGUAGES = ['en', 'fr'] as const;

/** A language of the catalog. */
export type Language = (typeof LANGUAGES)[number];

/** The default language: a shop that chose none, a stranger whose browser asks for none we have. */
export const DEFAULT_LANGUAGE: Language = 'en';

/** Each language's own name, for the switch and the settings (written in that language). */
export const LANGUAGE_NAMES: Record<Language, string> = { en: 'English', fr: 'Français' };

// The region Intl formats dates and numbers for: English as British shops write it (day before month),
// French as France writes it. One place, so no screen hard-codes a locale.
const INTL_LOCALE: Record<Language, string> = { en: 'en-GB', fr: 'fr-FR' };

/** The Intl locale of the default language, for text with no shop or visitor to ask (and the default of the formatters). */
export const DEFAULT_LOCALE = INTL_LOCALE[DEFAULT_LANGUAGE];

/** True when the value is a language of the catalog. */
export function isLanguage(v: unknown): v is Language {
  return typeof v === 'string' && (LANGUAGES as readonly string[]).includes(v);
}

/** The Intl locale (BCP 47) a language formats dates, numbers and money with. */
export function intlLocale(language: Language): string {
  return INTL_LOCALE[language];
}

/**
 * The best language for an Accept-Language header ("fr-CH, fr;q=0.9, en;q=0.8"): the highest-weighted
 * one we have by its primary tag, else the default. Malformed parts are skipped.
 */
export function fromAcceptLanguage(header: string | null | undefined): Language {
  if (!header) return DEFAULT_LANGUAGE;
  const asked = header
    .split(',')
    .map((part, i) => {
      const [tag = '', ...params] = part.trim().split(';');
      const q = params.map((p) => /^\s*q=([0-9.]+)\s*$/.exec(p)?.[1]).find((x) => x !== undefined);
      return { lang: tag.trim().toLowerCase().split('-')[0] ?? '', q: q === undefined ? 1 : Number(q), i };
    })
    .filter((a) => a.lang !== '' && Number.isFinite(a.q) && a.q > 0)
    .sort((a, b) => b.q - a.q || a.i - b.i);
  return asked.map((a) => a.lang).find(isLanguage) ?? DEFAULT_LANGUAGE;
}
