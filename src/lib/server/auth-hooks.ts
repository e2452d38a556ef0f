// Narrows what better-auth answers over HTTP to what Cuffwright uses, as a plugin of hooks:
// - its organization endpoints are closed to browsers: the app reaches members, invitations and
//   roles through its own routes (/api/staff…), which check the role; better-auth's would hand any
//   member the staff list with e-mails (the app's services still call them server-side);
// - a password change always ends the person's other sessions, whatever the client asks;
// - the session token stays in its HttpOnly cookie: never in a JSON body a script can read;
// - update-user takes only a name, with the same rules as sign-up.
import type { BetterAuthPlugin } from 'better-auth';
import { APIError, createAuthMiddleware } from 'better-auth/api';
import { shopSignUpInput } from '../shared/account-inputs';

const updateUserInput = shopSignUpInput.pick({ name: true }).strict();

/** Paths whose JSON answers may carry the session token (top level or under `session`). */
const TOKEN_PATHS = new Set(['/sign-in/email', '/sign-up/email', '/change-password', '/get-session', '/list-sessions']);

type Ctx = { path?: string; request?: Request };
/** An HTTP request from outside, as opposed to a call the server makes through auth.api. */
const fromHttp = (ctx: Ctx) => ctx.request !== undefined;

function withoutToken(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(withoutToken);
  if (!value || typeof value !== 'object') return value;
  const { token: _token, ...rest } = value as Record<string, unknown>;
  if (rest.session && typeof rest.session === 'object') {
    const { token: _sessionToken, ...session } = rest.session as Record<string, unknown>;
    rest.session = session;
  }
  return rest;
}

/** The plugin; add it to better-auth's plugins. */
export function appAuthHooks() {
  return {
    id: 'cuffwright-auth-hooks',
    hooks: {
      before: [
        {
          matcher: (ctx: Ctx) => fromHttp(ctx) && (ctx.path ?? '').startsWith('/organization/'),
          handler: createAuthMiddleware(async () => {
            const message = 'Not found: shops and staff are managed through the app.';
            throw new APIError('NOT_FOUND', { message, error: message });
          }),
        },
        {
          matcher: (ctx: Ctx) => ctx.path === '/change-password',
          handler: createAuthMiddleware(async (ctx) => {
            const body = ctx.body && typeof ctx.body === 'object' ? ctx.body : {};
            return { context: { body: { ...body, revokeOtherSessions: true } } };
          }),
        },
        {
          matcher: (ctx: Ctx) => ctx.path === '/update-user',
          handler: createAuthMiddleware(async (ctx) => {
            const parsed = updateUserInput.safeParse(ctx.body);
            if (!parsed.success) {
              const issues: Record<string, string> = {};
              for (const issue of parsed.error.issues) issues[issue.path.join('.') || '_'] ??= issue.message;
              const message = Object.values(issues)[0] ?? 'Some fields need attention.';
              throw new APIError('UNPROCESSABLE_ENTITY', { message, error: message, issues });
            }
            return { context: { body: parsed.data } };
          }),
        },
      ],
      after: [
        {
          matcher: (ctx: Ctx) => fromHttp(ctx) && TOKEN_PATHS.has(ctx.path ?? ''),
          handler: createAuthMiddleware(async (ctx) => {
            const returned = ctx.context.returned;
            if (!returned || returned instanceof Response || returned instanceof Error) return;
            return ctx.json(withoutToken(returned) as Record<string, unknown>);
          }),
        },
      ],
    },
  } satisfies BetterAuthPlugin;
}
