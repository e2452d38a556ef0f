// Two Vite plugins for the message catalog (src/lib/shared/i18n/messages/*.json): each message is parsed
// into its ICU syntax tree at build time, and the browser bundle gets intl-messageformat without the
// parser (about 7 KiB gzip saved on every island page; the public calculator's budget is 100 KiB).
import { parse } from '@formatjs/icu-messageformat-parser';

const CATALOG = /[\\/]src[\\/]lib[\\/](?:shared[\\/])?i18n[\\/]messages[\\/][a-z-]+\.json$/;

/** Parses the catalog's messages into syntax trees (still JSON, so Vite's own JSON plugin loads it). */
export function icuCatalog() {
  return {
    name: 'cuffwright:icu-catalog',
    enforce: /** @type {const} */ ('pre'),
    /** @param {string} code @param {string} id */
    transform(code, id) {
      if (!CATALOG.test(id.split('?')[0] ?? '')) return null;
      /** @type {Record<string, string>} */
      const messages = JSON.parse(code);
      const trees = Object.fromEntries(
        Object.entries(messages).map(([k, v]) => {
          try {
            return [k, parse(v)];
          } catch (e) {
            throw new Error(`${id}: message "${k}" is not ICU MessageFormat (${e instanceof Error ? e.message : e})`);
          }
        }),
      );
      return { code: JSON.stringify(trees), map: null };
    },
  };
}

/** In the browser, the formatter's parser is the package's own stand-in that refuses to parse. */
export function icuParserOffInBrowser() {
  return {
    name: 'cuffwright:icu-parser-off-in-browser',
    enforce: /** @type {const} */ ('pre'),
    /** @param {string} id @param {string | undefined} _importer @param {{ ssr?: boolean }} [options] */
    async resolveId(id, _importer, options) {
      if (id !== '@formatjs/icu-messageformat-parser' || options?.ssr) return null;
      return this.resolve('@formatjs/icu-messageformat-parser/no-parser.js', _importer, { skipSelf: true });
    },
  };
}
