// Every route file under src/pages/api, found by Vite's glob at build time, and the OpenAPI
// document built from their declarations (src/lib/server/openapi.ts). Shared by /api/openapi.json and
// /api-reference; the leading underscore keeps Astro from serving this file as a page.
import { openApiDocument, type OpenApiDocument, type RouteEntry } from '@/lib/server/openapi';
import type { DeclaredRoute } from '@/lib/server/route';
import pkg from '../../package.json';

const modules = import.meta.glob<Record<string, unknown>>('./api/**/*.ts', { eager: true });

const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE', 'ALL'];

/** Each declared handler of each route file; a handler made without route() is left out, so the
 * API test (every file and method in the document) fails for it. */
export function routeEntries(): RouteEntry[] {
  return Object.entries(modules).flatMap(([path, mod]) =>
    METHODS.flatMap((method) => {
      const handler = mod[method] as Partial<DeclaredRoute> | undefined;
      return handler?.spec ? [{ file: path.replace(/^\.\/api\//, ''), method, spec: handler.spec }] : [];
    }),
  );
}

let built: OpenApiDocument | undefined;

/** The document, built once per process (the routes do not change while it runs). */
export function apiDocument(): OpenApiDocument {
  return (built ??= openApiDocument(routeEntries(), pkg.version));
}
