// The one way to write an API route: it declares who may call it and what it reads (a zod body and
// query), and the declaration is what the route checks AND what /api/openapi.json describes
// (src/lib/server/openapi.ts). The order is fixed, so every route answers alike:
//   401/403 (permission) → 422 (query) → 400/408/413/422 (body) → the handler → its refusals.
// Errors are always `{ error }`, or `{ error, issues }` with one message per field (DEVELOPERS.md
// "Adding an API route").
import type { APIContext, APIRoute } from 'astro';
import type { z } from 'zod';
import { actorOf, guard, json, problem, readBody, refusal, type Actor } from './api';
import { ServiceError } from './service-error';
import { can, type Permission } from '../shared/roles';

/** Who may call: one permission, any one of several (the handler narrows with `demand`), or anyone. */
export type Access = Permission | readonly Permission[] | 'public';

/** One request a client may send, shown in the API document and sent by its test as it is. */
export interface RouteExample<B = unknown> {
  summary: string;
  /** Path parameters that are not ids of the caller's shop (better-auth's endpoint name). */
  params?: Record<string, string>;
  body?: B;
  query?: Record<string, string>;
}

/** What a route's answer is when it is not JSON (PDF, CSV, a picture). */
export type Answer = 'json' | 'application/pdf' | 'text/csv' | 'image/*';

/** The JSON a route answers, per success status: a zod schema of the body as sent (dates as ISO
 * strings), shown in the API document and held to the handler's return type by `route()`. */
export type Responses = { readonly [status: number]: z.ZodType };

/** What a route declares: read by the route itself and by the API document. */
export interface RouteSpec<
  B extends z.ZodType | undefined = z.ZodType | undefined,
  Q extends z.ZodType | undefined = z.ZodType | undefined,
  R extends Responses | undefined = Responses | undefined,
> {
  /** One line: what the route does. */
  summary: string;
  /** A longer note for the reference (limits, who sees what). */
  description?: string;
  permission: Access;
  /** The JSON body's schema; without one the body is not read (unless `rawBody`). */
  body?: B;
  /** The 400 message for a body that is not JSON (say what to send). */
  unreadable?: string;
  /** The query's schema (its fields as strings); without one the query is ignored. */
  query?: Q;
  /** A body the handler reads itself (a multipart upload, a signed payload): its media type, and
   * the schema the document shows for it when it is JSON. */
  rawBody?: { type: string; schema?: z.ZodType };
  /** The success status (200 unless said). */
  status?: number;
  /** The answer's media type (JSON unless said). */
  answer?: Answer;
  /** The JSON body of each success status (`{ 200: ticketJson }`); without it the document says
   * only "JSON" (tests/lib/openapi-responses.test.ts lists the routes still without one). */
  responses?: R;
  examples?: RouteExample<B extends z.ZodType ? z.input<B> : unknown>[];
  /** When this returns false the route does not exist here: 404 for everyone, before sign-in. */
  available?: () => boolean;
}

/** The path parameters, each '' when missing (the middleware has already refused a bad id). */
export type Params = { readonly [name: string]: string };

/** What a handler receives: the checked actor, body and query. */
export interface RouteInput<A, B, Q> {
  actor: A;
  body: B;
  query: Q;
  params: Params;
  request: Request;
  context: APIContext;
}

type Out<S> = S extends z.ZodType ? z.output<S> : undefined;
/** A value that JSON.stringify turns into `D`: a string may be a Date (sent as its ISO string). */
type Sendable<D> = D extends string
  ? D | Date
  : D extends readonly (infer U)[]
    ? readonly Sendable<U>[]
    : D extends object
      ? { [K in keyof D]: Sendable<D[K]> }
      : D;
/** What a handler may return: a Response (its own answer), or a value whose JSON one of the
 * declared schemas describes, so a route file whose handler drifts from its schema does not compile. */
type Reply<R> = R extends Responses ? Response | Sendable<z.output<R[keyof R]>> | Promise<Response | Sendable<z.output<R[keyof R]>>> : unknown;
type ActorOf<P> = P extends 'public' ? Actor | null : Actor;

/** An Astro handler that carries its declaration (for the API document). */
export type DeclaredRoute = APIRoute & { spec: RouteSpec };

/** True when the access is a list of permissions (any one of which lets the caller in). */
function isAnyOf(access: Access): access is readonly Permission[] {
  return Array.isArray(access) && Array.isArray(access[0]);
}

/** The permissions an access names (empty when public). */
export function permissionsOf(access: Access): readonly Permission[] {
  if (access === 'public') return [];
  return isAnyOf(access) ? access : [access as Permission];
}

/** The caller, or the 401/403 answer: signed in, a member, and granted one of the permissions. */
function admit(context: APIContext, access: Access): Actor | null | Response {
  const locals = context.locals as App.Locals | undefined;
  if (access === 'public') {
    return actorOf(locals);
  }
  const list = permissionsOf(access);
  const granted = list.find((p) => can(locals?.member?.role, p)) ?? list[0]!;
  return guard(locals ?? ({} as App.Locals), granted);
}

/** One message per field path ("legs.left.cuffDepth"; '_' for the body itself), first issue wins. */
export function issuesOf(error: z.ZodError): Record<string, string> {
  const issues: Record<string, string> = {};
  for (const issue of error.issues) issues[issue.path.map(String).join('.') || '_'] ??= issue.message;
  return issues;
}

/** The query as one string per name (the first when repeated). */
function queryObject(url: URL): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of url.searchParams) if (!(k in out)) out[k] = v;
  return out;
}

/** Refuses with 403 unless the actor's role has the permission (a route's narrower case). */
export function demand(actor: Actor, permission: Permission, what = 'do this'): void {
  if (!can(actor.role, permission)) throw new ServiceError(403, `Your role (${actor.role}) may not ${what}.`);
}

/** Declares an API route: permission, body and query checked in that order, then the handler;
 * a returned value is answered as JSON with the spec's status, a returned Response as it is. */
export function route<
  const P extends Access,
  B extends z.ZodType | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
  R extends Responses | undefined = undefined,
>(spec: RouteSpec<B, Q, R> & { permission: P }, handler: (input: RouteInput<ActorOf<P>, Out<B>, Out<Q>>) => Reply<R>): DeclaredRoute {
  const answer: APIRoute = async (context) => {
    if (spec.available && !spec.available()) return problem(404, 'Not found.');
    const actor = admit(context, spec.permission);
    if (actor instanceof Response) return actor;
    const { request } = context;
    let query: unknown;
    if (spec.query) {
      const parsed = spec.query.safeParse(queryObject(new URL(request.url)));
      if (!parsed.success) return problem(422, 'Some of the query is not understood.', issuesOf(parsed.error));
      query = parsed.data;
    }
    let body: unknown;
    if (spec.body) {
      const read = await readBody(request, spec.body, spec.unreadable);
      if (read instanceof Response) return read;
      body = read;
    }
    const params: Params = Object.fromEntries(Object.entries(context.params ?? {}).map(([k, v]) => [k, v ?? '']));
    try {
      const result = await handler({ actor: actor as ActorOf<P>, body: body as Out<B>, query: query as Out<Q>, params, request, context });
      return result instanceof Response ? result : json(result, spec.status ?? 200);
    } catch (e) {
      return refusal(e);
    }
  };
  return Object.assign(answer, { spec: spec as unknown as RouteSpec });
}
