// GET /api/openapi.json: the API described (OpenAPI 3.1), generated from the routes' own
// declarations; /api-reference shows the same document as a page.
import { json } from '@/lib/server/api';
import { openApiDocumentJson } from '@/lib/server/openapi';
import { route } from '@/lib/server/route';

/** The OpenAPI 3.1 document of every route. */
export const GET = route(
  {
    summary: 'This document: every route, its permission, body, query, examples and answers (OpenAPI 3.1).',
    permission: 'public',
    responses: { 200: openApiDocumentJson },
  },
  async () => {
    // Loaded on first use: the catalog imports every route module, this one included.
    const { apiDocument } = await import('../_api-catalog');
    const res = json(apiDocument());
    res.headers.set('cache-control', 'public, max-age=300');
    return res;
  },
);
