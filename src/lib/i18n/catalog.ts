// The one message catalog: every sentence the screens and the cut sheet show, by key, in each
// language, as ICU MessageFormat (intl-messageformat). Messages are compiled to their syntax trees
// at build time (scripts/vite-icu-catalog.mjs), so the browser ships the formatter without its parser.
import { IntlMessageFormat } from 'intl-messageformat';
import en from './messages/en.json';
import fr from './messages/fr.json';
import { DEFAULT_LANGUAGE, intlLocale, type Language } from './languages';

/** A key of the catalog (English is the reference: every language has exactly its keys). */
export type MessageKey = keyof typeof en;

/** The values a message's placeholders take: lengths come already written ("1 1/2 in"). */
export type MessageValues = Record<string, string | number>;

/** Renders one message of the catalog in one language. */
export type Translate = (key: MessageKey, values?: MessageValues) => string;

// Each catalog as imported: syntax trees after the build's transform, plain strings where a tool
// imports the JSON without it (intl-messageformat parses those on the server).
const CATALOGS: Record<Language, Record<string, unknown>> = { en, fr };

const compiled = new Map<string, IntlMessageFormat>();

function formatOf(language: Language, key: string): IntlMessageFormat {
  const id = `${language}\u0000${key}`;
  let f = compiled.get(id);
  if (!f) {
    const source = CATALOGS[language][key] ?? CATALOGS[DEFAULT_LANGUAGE][key];
    if (source === undefined) throw new Error(`No message "${key}" in the catalog.`);
    f = new IntlMessageFormat(source as string, intlLocale(language));
    compiled.set(id, f);
  }
  return f;
}

/** The catalog's messages in one language as a function of key and values. */
export function translator(language: Language): Translate {
  return (key, values) => {
    const out = formatOf(language, key).format(values);
    return Array.isArray(out) ? out.join('') : String(out);
  };
}

/** Every key of one language's catalog (for the catalog's own tests). */
export function catalogKeys(language: Language): string[] {
  return Object.keys(CATALOGS[language]);
}

/** Renders a message whose values may be elements (a length in its own styled span): the parts in order. */
export type TranslateParts = <T>(key: MessageKey, values?: Record<string, string | number | T>) => (string | T)[];

/** The catalog's messages in one language, as parts, for values that are not text. */
export function partsTranslator(language: Language): TranslateParts {
  return (key, values) => {
    const out = formatOf(language, key).format(values as never);
    return Array.isArray(out) ? out : [out as string];
  };
}
