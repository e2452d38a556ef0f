// The OpenAPI 3.1 document of the JSON API, built from what each route declares with route()
// (src/lib/server/route.ts): its permission, its zod body and query, its summary and examples. Nothing
// here is written by hand per route: a route's declaration is the one source, and zod 4's
// toJSONSchema gives JSON Schema 2020-12, the dialect OpenAPI 3.1 uses.
import { z } from 'zod';
import { permissionsOf, type RouteExample, type RouteSpec } from './route';

/** The document's outline as /api/openapi.json declares it (the rest is OpenAPI 3.1's own schema,
 * which tests/http/open-api.spec.ts validates it against). */
export const openApiDocumentJson = z.looseObject({
  openapi: z.literal('3.1.0'),
  info: z.object({ title: z.string(), version: z.string(), description: z.string() }),
  paths: z.record(z.string(), z.record(z.string(), z.looseObject({ operationId: z.string(), summary: z.string() }))),
});

/** One method of one route file, as the catalog found it. */
export interface RouteEntry {
  /** The file under src/pages/api, e.g. "tickets/[id]/garments.ts". */
  file: string;
  /** The exported handler's name: GET, POST, PUT, PATCH, DELETE or ALL. */
  method: string;
  spec: RouteSpec;
}

/** A JSON Schema object as OpenAPI carries it. */
export type JsonSchema = { [key: string]: unknown };

/** A request example as the document keeps it (x-examples): sent as it is by the API's test. */
export type DocumentedExample = RouteExample;

/** One operation of the document (the fields this app fills). */
export interface Operation {
  operationId: string;
  summary: string;
  description?: string;
  tags: string[];
  security: Record<string, string[]>[];
  'x-permission': 'public' | string[];
  'x-examples': DocumentedExample[];
  parameters: { name: string; in: 'path' | 'query'; required: boolean; schema: JsonSchema; description?: string }[];
  requestBody?: { required: boolean; content: Record<string, { schema: JsonSchema; examples?: Record<string, { summary: string; value: unknown }> }> };
  responses: Record<string, unknown>;
}

/** The whole document. */
export interface OpenApiDocument {
  openapi: '3.1.0';
  info: { title: string; version: string; description: string };
  jsonSchemaDialect: string;
  paths: Record<string, Record<string, Operation>>;
  components: { schemas: Record<string, JsonSchema>; responses: Record<string, unknown>; securitySchemes: Record<string, unknown> };
  tags: { name: string }[];
}

/** The address of a route file: "tickets/[id]/index.ts" → "/api/tickets/{id}", "[...all]" → "{all}". */
export function apiPathOf(file: string): string {
  const key = file.replace(/\.(ts|js|mjs)$/, '').replace(/(^|\/)index$/, '');
  return `/api${key ? `/${key}` : ''}`.replace(/\[(?:\.\.\.)?([^\]]+)\]/g, '{$1}');
}

/** The methods an exported handler answers: ALL (better-auth's catch-all) is its GET and POST. */
export function methodsOf(exported: string): string[] {
  return exported === 'ALL' ? ['get', 'post'] : [exported.toLowerCase()];
}

/** A zod schema as the JSON Schema a client sends (defaults make a field optional). */
export function jsonSchemaOf(schema: z.ZodType): JsonSchema {
  const out = z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any', target: 'draft-2020-12' }) as JsonSchema;
  delete out.$schema;
  return out;
}

/** A zod schema as the JSON Schema of what the API sends (io 'output': what the value is). */
export function answerSchemaOf(schema: z.ZodType): JsonSchema {
  const out = z.toJSONSchema(schema, { io: 'output', unrepresentable: 'any', target: 'draft-2020-12' }) as JsonSchema;
  delete out.$schema;
  return out;
}

/** The query schema's fields as query parameters. */
function queryParameters(schema: z.ZodType): Operation['parameters'] {
  const js = jsonSchemaOf(schema);
  const properties = (js.properties ?? {}) as Record<string, JsonSchema>;
  const required = new Set((js.required ?? []) as string[]);
  return Object.entries(properties).map(([name, s]) => ({
    name,
    in: 'query' as const,
    required: required.has(name),
    schema: s,
    ...(typeof s.description === 'string' ? { description: s.description } : {}),
  }));
}

const PROBLEM = { $ref: '#/components/responses/Problem' };
const BINARY = { type: 'string', contentMediaType: 'application/octet-stream' };

/** The success answers: each declared status with its JSON Schema (from the zod schema, one
 * source), else the route's status with only its media type (a PDF or CSV is bytes or text). */
function successResponses(spec: RouteSpec): Record<string, unknown> {
  const answer = spec.answer ?? 'json';
  const declared = Object.entries(spec.responses ?? {});
  if (answer === 'json' && declared.length) {
    return Object.fromEntries(
      declared.map(([status, schema]) => [
        status,
        { description: schema.description ?? spec.summary, content: { 'application/json': { schema: answerSchemaOf(schema) } } },
      ]),
    );
  }
  const content = answer === 'json' ? { 'application/json': {} } : { [answer]: { schema: answer === 'text/csv' ? { type: 'string' } : BINARY } };
  return { [String(spec.status ?? 200)]: { description: spec.summary, content } };
}

/** The operation for one method of one route. */
function operationOf(path: string, method: string, spec: RouteSpec): Operation {
  const isPublic = spec.permission === 'public';
  const examples = spec.examples ?? [];
  const pathNames = [...path.matchAll(/\{([^}]+)\}/g)].map((m) => m[1]!);
  const parameters: Operation['parameters'] = [
    ...pathNames.map((name) => ({ name, in: 'path' as const, required: true, schema: { type: 'string' } })),
    ...(spec.query ? queryParameters(spec.query) : []),
  ];
  const bodySchema = spec.body ?? spec.rawBody?.schema;
  const bodyType = spec.body ? 'application/json' : spec.rawBody?.type;
  const bodyExamples = examples.filter((e) => e.body !== undefined);
  const requestBody: Operation['requestBody'] = bodyType
    ? {
        required: Boolean(spec.body),
        content: {
          [bodyType]: {
            schema: bodySchema
              ? jsonSchemaOf(bodySchema)
              : bodyType.startsWith('multipart/')
                ? { type: 'object', properties: { photos: { type: 'array', items: BINARY } } }
                : {},
            ...(bodyExamples.length
              ? { examples: Object.fromEntries(bodyExamples.map((e, i) => [`example${i + 1}`, { summary: e.summary, value: e.body }])) }
              : {}),
          },
        },
      }
    : undefined;
  const responses = successResponses(spec);
  if (bodyType?.includes('json') || bodyType?.startsWith('multipart/')) responses['400'] = PROBLEM;
  if (!isPublic) responses['401'] = PROBLEM;
  if (!isPublic) responses['403'] = PROBLEM;
  if (pathNames.length) responses['404'] = PROBLEM;
  if (bodySchema || spec.query) responses['422'] = PROBLEM;
  const tag = path.split('/')[2] ?? 'api';
  return {
    operationId: `${method}${path.replace(/[^A-Za-z0-9]+(.)?/g, (_, c: string | undefined) => (c ? c.toUpperCase() : ''))}`,
    summary: spec.summary,
    ...(spec.description ? { description: spec.description } : {}),
    tags: [tag.replace(/\.\w+$/, '')],
    security: isPublic ? [] : [{ session: [] }],
    'x-permission': isPublic ? 'public' : permissionsOf(spec.permission).map(([resource, action]) => `${resource}.${action}`),
    'x-examples': examples,
    parameters,
    ...(requestBody ? { requestBody } : {}),
    responses,
  };
}

/** The OpenAPI 3.1 document for the routes found (sorted by path, then method). */
export function openApiDocument(entries: RouteEntry[], version: string): OpenApiDocument {
  const paths: OpenApiDocument['paths'] = {};
  const sorted = [...entries].sort((a, b) => apiPathOf(a.file).localeCompare(apiPathOf(b.file)) || a.method.localeCompare(b.method));
  for (const { file, method, spec } of sorted) {
    const path = apiPathOf(file);
    // A catch-all's examples are requests to read (GET): one method keeps them.
    for (const m of methodsOf(method)) (paths[path] ??= {})[m] = operationOf(path, m, method === 'ALL' && m !== 'get' ? { ...spec, examples: [] } : spec);
  }
  const tags = [...new Set(Object.values(paths).flatMap((p) => Object.values(p).flatMap((o) => o.tags)))].sort().map((name) => ({ name }));
  return {
    openapi: '3.1.0',
    info: {
      title: 'Cuffwright API',
      version,
      description:
        "The JSON API behind Cuffwright's screens, open to other shop tools. Sign in with POST /api/auth/sign-in/email " +
        '{email, password}; the session cookie it sets is what every non-public route reads, and x-permission names the ' +
        "permission a role needs (src/lib/shared/roles.ts). A write from a browser must carry the site's own Origin. " +
        'Errors are always {error} or {error, issues} (one message per field): 400 the body is not JSON, 401 not signed in, ' +
        '403 the role may not, 404 not in your shop, 409 a conflict, 413 too large, 422 refused as sent, 429 too many.',
    },
    jsonSchemaDialect: 'https://json-schema.org/draft/2020-12/schema',
    paths,
    components: {
      schemas: {
        Error: {
          type: 'object',
          required: ['error'],
          properties: {
            error: { type: 'string', description: 'What went wrong, in words a person can act on.' },
            issues: { type: 'object', additionalProperties: { type: 'string' }, description: 'One message per field path ("legs.left.cuffDepth").' },
          },
        },
      },
      responses: {
        Problem: {
          description: 'Refused: see the status and the message.',
          content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } },
        },
      },
      securitySchemes: {
        session: {
          type: 'apiKey',
          in: 'cookie',
          name: 'better-auth.session_token',
          description: 'Set by POST /api/auth/sign-in/email (over HTTPS the cookie is named __Secure-better-auth.session_token).',
        },
      },
    },
    tags,
  };
}
