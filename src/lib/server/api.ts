// Small helpers every API route uses: typed JSON answers, the permission guard, body parsing.
import { isAPIError } from 'better-auth/api';
import type { z } from 'zod';
import { ServiceError } from './service-error';
import { BodyRefused, JSON_BODY_LIMIT, readLimited } from './body';
import { can, type Permission, type Role } from '../shared/roles';

/** A JSON response, optionally carrying extra headers (such as a new session cookie). */
export function json<T>(data: T, status = 200, extra?: Headers): Response {
  const headers = new Headers(extra);
  headers.set('content-type', 'application/json');
  return new Response(JSON.stringify(data), { status, headers });
}

/** A JSON error with a message a person can act on. */
export function problem(status: number, error: string, issues?: Record<string, string>): Response {
  return json(issues ? { error, issues } : { error }, status);
}

/** A 429 in JSON with Retry-After (seconds), for every limit. */
export function tooMany(error: string, retryAfter: number): Response {
  const res = problem(429, error);
  res.headers.set('retry-after', String(retryAfter));
  res.headers.set('cache-control', 'no-store');
  return res;
}

/** The signed-in member an API route acts for. */
export interface Actor {
  userId: string;
  userName: string;
  email: string;
  memberId: string;
  role: Role;
  shopId: string;
  shopName: string;
}

/** The signed-in member as an Actor, or null (signed out, or not a member of a shop). */
export function actorOf(locals: App.Locals | undefined): Actor | null {
  const user = locals?.user;
  const member = locals?.member;
  if (!user || !member) return null;
  return {
    userId: user.id,
    userName: user.name,
    email: user.email,
    memberId: member.id,
    role: member.role,
    shopId: member.shopId,
    shopName: member.shopName,
  };
}

/** The actor when signed in with the permission, otherwise the 401/403 response to return. */
export function guard(locals: App.Locals, permission: Permission): Actor | Response {
  const { user, member } = locals;
  if (!user) return problem(401, 'Sign in first.');
  if (!member) return problem(403, 'You are not a member of a shop.');
  if (!can(member.role, permission)) return problem(403, `Your role (${member.role}) may not do this.`);
  return actorOf(locals)!;
}

/** The body's bytes, at most JSON_BODY_LIMIT of them; the 408/413 response when it cannot be read. */
export async function readBytes(request: Request): Promise<Uint8Array | Response> {
  try {
    return await readLimited(request, JSON_BODY_LIMIT);
  } catch (e) {
    if (e instanceof BodyRefused) return problem(e.status, e.message);
    throw e;
  }
}

/** The JSON body, read to at most JSON_BODY_LIMIT bytes; the 400/408/413 response when it cannot be. */
export async function readJson(request: Request, unreadable = 'Send a JSON body.'): Promise<{ value: unknown } | Response> {
  const bytes = await readBytes(request);
  if (bytes instanceof Response) return bytes;
  try {
    return { value: JSON.parse(new TextDecoder().decode(bytes)) };
  } catch {
    return problem(400, unreadable);
  }
}

/** Parses the JSON body with the schema; a 400/408/413/422 response when it does not fit. */
export async function readBody<S extends z.ZodType>(request: Request, schema: S, unreadable?: string): Promise<z.infer<S> | Response> {
  const raw = await readJson(request, unreadable);
  if (raw instanceof Response) return raw;
  const parsed = schema.safeParse(raw.value);
  if (parsed.success) return parsed.data;
  const issues: Record<string, string> = {};
  for (const issue of parsed.error.issues) issues[issue.path.join('.') || '_'] ??= issue.message;
  // The first field's own message says more than "some fields": a form can show it as it is.
  return problem(422, Object.values(issues)[0] ?? 'Some fields need attention.', issues);
}

/** The JSON answer for a refusal a service (or better-auth under it) threw; anything else is rethrown. */
export function refusal(e: unknown): Response {
  if (e instanceof ServiceError) return problem(e.status, e.message, e.issues);
  // better-auth refuses in its own terms: an address taken a moment ago, a member it will not change.
  if (isAPIError(e) && e.statusCode >= 400 && e.statusCode < 500) return problem(e.statusCode, e.body?.message ?? e.message);
  throw e;
}

/** Runs a service call, turning its refusals into their JSON answers. */
export async function run<T>(work: () => Promise<T>, status = 200): Promise<Response> {
  try {
    return json(await work(), status);
  } catch (e) {
    return refusal(e);
  }
}
