// The catalog in the islands: a page says its language once (the shop's, or the visitor's on the
// public calculator), and every component under it renders its words with useT().
import { createContext, Fragment, useContext, useMemo, type ComponentType, type ReactNode } from 'react';
import { partsTranslator, registerMessages, translator, type MessageKey, type Translate } from '@/lib/shared/i18n/format';
import { DEFAULT_LANGUAGE, intlLocale, type Language } from '@/lib/shared/i18n/languages';

// null outside any provider: a screen not yet in the catalog keeps its English words.
const LanguageContext = createContext<Language | null>(null);

/** Gives the components below it one language. */
export function LanguageProvider({ language, children }: { language: Language; children: ReactNode }) {
  return <LanguageContext.Provider value={language}>{children}</LanguageContext.Provider>;
}

/** The language of the page. */
export function useLanguage(): Language {
  return useContext(LanguageContext) ?? DEFAULT_LANGUAGE;
}

/** The catalog in the page's language, or null on an island its page gave no language (and no messages). */
export function useMaybeT(): Translate | null {
  const language = useContext(LanguageContext);
  return useMemo(() => (language ? translator(language) : null), [language]);
}

/** The catalog where the page gave a language, else the English written beside each key (islands on pages not yet in the catalog). */
export function useSay(): (key: MessageKey, english: string, values?: Record<string, string | number>) => string {
  const t = useMaybeT();
  return useMemo(() => (t ? (key, _english, values) => t(key, values) : (_key, english) => english), [t]);
}

/** The Intl locale of the page's language (dates, numbers, money). */
export function useIntlLocale(): string {
  return intlLocale(useLanguage());
}

/** The catalog in the page's language: t(key, values). */
export function useT(): Translate {
  const language = useLanguage();
  return useMemo(() => translator(language), [language]);
}

/** The catalog in the page's language for messages with elements among their values (a styled length). */
export function useRich(): (key: MessageKey, values: Record<string, ReactNode>) => ReactNode {
  const language = useLanguage();
  return useMemo(() => {
    const parts = partsTranslator(language);
    return (key, values) => parts<ReactNode>(key, values as Record<string, ReactNode>).map((p, i) => <Fragment key={i}>{p}</Fragment>);
  }, [language]);
}

// The messages an island's page sent (JSON from messagesFor), registered once per text.
const registered = new Set<string>();

/**
 * Wraps an island so its page can give it a `language` and that language's `messages` (JSON from
 * messagesFor(language, …): only what the island shows, so the browser gets no whole catalog).
 */
export function withLanguage<P extends object>(Component: ComponentType<P>) {
  return function WithLanguage({ language = DEFAULT_LANGUAGE, messages, ...props }: P & { language?: Language; messages?: string }) {
    if (messages && !registered.has(messages)) {
      registered.add(messages);
      registerMessages(language, JSON.parse(messages) as Record<string, unknown>);
    }
    return (
      <LanguageProvider language={language}>
        <Component {...(props as P)} />
      </LanguageProvider>
    );
  };
}
