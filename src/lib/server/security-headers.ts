// The security headers every answer carries, set in one place (src/middleware.ts).
// Pages get a Content-Security-Policy whose only inline allowances are the exact hashes of what
// Astro itself inlines for island hydration (its island runtime, the client directives and the
// island style): taken from Astro's own modules, so an Astro upgrade keeps them in step.
import { createHash } from 'node:crypto';
import islandScript from 'astro/runtime/server/astro-island.prebuilt.js';
import islandScriptDev from 'astro/runtime/server/astro-island.prebuilt-dev.js';
import { ISLAND_STYLES } from 'astro/runtime/server/astro-island-styles.js';
import idleDirective from 'astro/runtime/client/idle.prebuilt.js';
import loadDirective from 'astro/runtime/client/load.prebuilt.js';
import mediaDirective from 'astro/runtime/client/media.prebuilt.js';
import onlyDirective from 'astro/runtime/client/only.prebuilt.js';
import visibleDirective from 'astro/runtime/client/visible.prebuilt.js';

const hash = (text: string) => `'sha256-${createHash('sha256').update(text).digest('base64')}'`;

// Astro picks the dev island script when NODE_ENV is "development" at run time.
const inlineScripts = [islandScript, islandScriptDev, idleDirective, loadDirective, mediaDirective, onlyDirective, visibleDirective];

/** The policy for HTML pages. */
export const PAGE_CSP = [
  "default-src 'self'",
  `script-src 'self' ${inlineScripts.map(hash).join(' ')}`,
  `style-src 'self' ${hash(ISLAND_STYLES)}`,
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join('; ');

/** Headers for every answer. "same-origin" keeps reset and invitation links out of other sites'
 * logs, and still lets same-site POSTs carry their Origin (the cross-site check needs it). */
const EVERY: Record<string, string> = {
  'x-content-type-options': 'nosniff',
  'referrer-policy': 'same-origin',
};

/** Headers for HTML pages only: a PDF or photo opened in a tab keeps the browser's own viewer. */
const PAGES: Record<string, string> = {
  'content-security-policy': PAGE_CSP,
  'x-frame-options': 'DENY',
};

/** The response with the security headers set (copied when its headers are immutable).
 * `csp: false` leaves the CSP out: Vite's dev server inlines scripts of its own. */
export function withSecurityHeaders(response: Response, { csp = true } = {}): Response {
  const html = (response.headers.get('content-type') ?? '').startsWith('text/html') || (response.status >= 300 && response.status < 400);
  const set = { ...EVERY, ...(html && csp ? PAGES : html ? { 'x-frame-options': 'DENY' } : {}) };
  try {
    for (const [name, value] of Object.entries(set)) response.headers.set(name, value);
    return response;
  } catch {
    // Response.redirect() and fetch() answers have immutable headers.
    const copy = new Response(response.body, response);
    for (const [name, value] of Object.entries(set)) copy.headers.set(name, value);
    return copy;
  }
}
