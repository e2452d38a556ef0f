// The catalog in the islands: a page says its language once (the shop's, or the visitor's on the
// public calculator), and every component under it renders its words with useT().
import { createContext, Fragment, useContext, useMemo, type ComponentType, type ReactNode } from 'react';
import { partsTranslator, translator, type MessageKey, type Translate } from '@/lib/i18n/catalog';
import { DEFAULT_LANGUAGE, intlLocale, type Language } from '@/lib/i18n/languages';

const LanguageContext = createContext<Language>(DEFAULT_LANGUAGE);

/** Gives the components below it one language. */
export function LanguageProvider({ language, children }: { language: Language; children: ReactNode }) {
  return <LanguageContext.Provider value={language}>{children}</LanguageContext.Provider>;
}

/** The language of the page. */
export function useLanguage(): Language {
  return useContext(LanguageContext);
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

/** Wraps an island so its page can give it a `language` prop (English when left out). */
export function withLanguage<P extends object>(Component: ComponentType<P>) {
  return function WithLanguage({ language = DEFAULT_LANGUAGE, ...props }: P & { language?: Language }) {
    return (
      <LanguageProvider language={language}>
        <Component {...(props as P)} />
      </LanguageProvider>
    );
  };
}
