// `import url from './x.ts?node-worker'`: the URL of x.ts built as a worker_threads entry of the
// server bundle, or null where there is no such file (astro dev, vitest: sources are TypeScript).
// Vite's own worker support leaves SSR code alone and bundles workers for the browser, so a
// server-side worker is emitted here as one more chunk of the server build (dist/server/x.mjs),
// sharing chunks with the pages and resolving packages from node_modules as they do.
import { basename, dirname, extname, resolve } from 'node:path';

const QUERY = '?node-worker';
const PREFIX = '\0node-worker:';

/**
 * The Vite plugin behind `?node-worker` imports (astro.config.mjs adds it).
 * @returns {import('vite').Plugin}
 */
export function nodeWorker() {
  let building = false;
  return {
    name: 'cuffwright:node-worker',
    enforce: 'pre',
    configResolved(config) {
      building = config.command === 'build';
    },
    resolveId(id, importer) {
      if (!id.endsWith(QUERY) || !importer) return null;
      return PREFIX + resolve(dirname(importer.split('?')[0]), id.slice(0, -QUERY.length));
    },
    load(id, options) {
      if (!id.startsWith(PREFIX)) return null;
      if (!building || !options?.ssr) return 'export default null;';
      const file = id.slice(PREFIX.length);
      const ref = this.emitFile({ type: 'chunk', id: file, name: basename(file, extname(file)) });
      return `export default import.meta.ROLLUP_FILE_URL_${ref};`;
    },
  };
}
