// The catalog's formatter without the catalog: messages are registered by language (the server
// registers every message of every language through catalog.ts; an island registers only the part
// of one language its page sent it), so the browser never downloads a catalog it does not show.
import { IntlMessageFormat } from 'intl-messageformat';
import type en from './messages/en.json';
import { DEFAULT_LANGUAGE, intlLocale, type Language } from './languages';

/** A key of the catalog (English is the reference: every language has exactly its keys). */
export type MessageKey = keyof typeof en;

/** The values a message's placeholders take: lengths come already written ("1 1/2 in"). */
export type MessageValues = Record<string, string | number>;

/** Renders one message of the catalog in one language. */
export type Translate = (key: MessageKey, values?: MessageValues) => string;

/** Renders a message whose values may be elements (a length in its own styled span): the parts in order. */
export type TranslateParts = <T>(key: MessageKey, values?: Record<string, string | number | T>) => (string | T)[];

/** Messages by key: syntax trees after the build's transform, or ICU source text on the server. */
export type Messages = Record<string, unknown>;

const registry: Partial<Record<Language, Messages>> = {};
const compiled = new Map<string, IntlMessageFormat>();

/** Makes messages of one language available to translator(); later ones with the same key win. */
export function registerMessages(language: Language, messages: Messages): void {
  const had = registry[language];
  registry[language] = had ? { ...had, ...messages } : messages;
}

function formatOf(language: Language, key: string): IntlMessageFormat | null {
  const id = `${language}\u0000${key}`;
  let f = compiled.get(id);
  if (!f) {
    const source = registry[language]?.[key] ?? registry[DEFAULT_LANGUAGE]?.[key];
    if (source === undefined) return null;
    f = new IntlMessageFormat(source as string, intlLocale(language));
    compiled.set(id, f);
  }
  return f;
}

/** The catalog's messages in one language as a function of key and values (the key itself when the page was not sent it). */
export function translator(language: Language): Translate {
  return (key, values) => {
    const out = formatOf(language, key)?.format(values) ?? key;
    return Array.isArray(out) ? out.join('') : String(out);
  };
}

/** The catalog's messages in one language, as parts, for values that are not text. */
export function partsTranslator(language: Language): TranslateParts {
  return (key, values) => {
    const out: unknown = formatOf(language, key)?.format(values as never) ?? key;
    return (Array.isArray(out) ? out : [out]) as never;
  };
}
