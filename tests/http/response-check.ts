// Holds an answer to what the API document declares for its status: the media type, and for JSON
// the body parsed with zod against the declared schema (z.fromJSONSchema of the document's own
// schema, so what is checked is what clients read). Used by open-api.spec.ts for every example.
import { z } from 'zod';

/** An operation's responses as the document gives them. */
export type DocumentedResponses = Record<string, { content?: Record<string, { schema?: Record<string, unknown> }> } | { $ref: string }>;

/** True when the operation declares the JSON body of at least one success status. */
export function declaresAnswer(responses: DocumentedResponses): boolean {
  return Object.entries(responses).some(([status, r]) => status.startsWith('2') && 'content' in r && Boolean(r.content?.['application/json']?.schema));
}

/** What is wrong with an answer against the declaration (empty: nothing). A route that declares no
 * JSON body yet (the allow-list in tests/lib/openapi-responses.test.ts) is held to its media type only. */
export function answerProblems(responses: DocumentedResponses, status: number, contentType: string | null, body: unknown): string[] {
  const declared = responses[String(status)];
  if (!declared || !('content' in declared) || !declared.content)
    return [`status ${status} is not among the declared responses (${Object.keys(responses).join(', ')})`];
  const media = (contentType ?? '').split(';')[0]!.trim();
  const types = Object.keys(declared.content);
  if (!types.some((t) => t === media || (t.endsWith('/*') && media.startsWith(t.slice(0, -1)))))
    return [`answered ${media || 'no type'}, declared ${types.join(' or ')}`];
  const schema = declared.content[media]?.schema;
  if (media !== 'application/json' || !schema) return [];
  const parsed = z.fromJSONSchema(schema as Parameters<typeof z.fromJSONSchema>[0]).safeParse(body);
  return parsed.success ? [] : parsed.error.issues.slice(0, 5).map((i) => `${i.path.join('.') || '(body)'}: ${i.message}`);
}
