// @ts-check
import { defineConfig, envField } from 'astro/config';
import node from '@astrojs/node';
import react from '@astrojs/react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';
import { nodeWorker } from './scripts/vite-node-worker.mjs';
import { precompress } from './scripts/precompress.mjs';
import { icuCatalog, icuParserOffInBrowser } from './scripts/vite-icu-catalog.mjs';

/** In the browser, `zod` resolves to src/lib/shared/zod-jitless.ts (zod configured not to probe eval,
 * which the CSP forbids); the server keeps zod's faster compiled parsers. */
function zodJitlessInBrowser() {
  const shim = fileURLToPath(new URL('./src/lib/shared/zod-jitless.ts', import.meta.url));
  return {
    name: 'cuffwright:zod-jitless-in-browser',
    enforce: /** @type {const} */ ('pre'),
    /** @param {string} id @param {string | undefined} importer @param {{ ssr?: boolean }} [options] */
    resolveId(id, importer, options) {
      if (id !== 'zod' || options?.ssr || importer === shim) return null;
      return shim;
    },
  };
}

/** The built server begins loading the app (middleware, auth, and the database: PGlite opens on
 * import) as soon as it starts listening, instead of at the first request, so PGlite's start
 * overlaps the rest of the start-up. A failure here is left to the first request to report. */
function appLoadsAtStart() {
  return {
    name: 'cuffwright:app-loads-at-start',
    /** @param {string} code @param {string} id */
    transform(code, id) {
      if (id !== '\0@astrojs-ssr-virtual-entry' || !code.includes('const _manifest')) return null;
      return `${code}\n_manifest.middleware?.().catch(() => {});\n`;
    },
  };
}

/** Packages the server build carries in its own chunks instead of loading from node_modules. */
export const SERVER_BUNDLED = ['drizzle-orm', 'drizzle-zod'];

export default defineConfig({
  output: 'server',
  // Tests build into their own folder so a running `npm start` keeps its dist/.
  outDir: process.env.ASTRO_OUT_DIR || './dist',
  adapter: node({ mode: 'standalone' }),
  // precompress: .br and .gz beside each /_astro/ script and stylesheet, served by Accept-Encoding.
  integrations: [react(), precompress()],
  server: { port: 4321, host: '127.0.0.1' },
  // Without this Astro ignores the Host header: Astro.url loses the port and same-site POSTs get 403.
  // Astro's own origin check refuses every form POST without a matching Origin, the SMS service's
  // signed status callback (/api/sms/status) included; src/middleware.ts refuses cross-site writes
  // itself (crossSite: a foreign Origin, or no Origin with the session cookie).
  security: { allowedDomains: [{ hostname: 'localhost' }, { hostname: '127.0.0.1' }], checkOrigin: false },
  env: {
    // All 'secret': Astro inlines 'public' server variables at build time, and these must be read
    // when the server starts (tests and scripts set them per run).
    schema: {
      // Unset: the app's own data/ folder (src/db/app-paths.ts), wherever the server is started from.
      DATA_DIR: envField.string({ context: 'server', access: 'secret', optional: true }),
      // postgres://… switches from the embedded PGlite in DATA_DIR to a PostgreSQL server.
      DATABASE_URL: envField.string({ context: 'server', access: 'secret', optional: true }),
      BETTER_AUTH_URL: envField.string({ context: 'server', access: 'secret', default: 'http://localhost:4321' }),
      // Without it a random secret is kept in DATA_DIR/auth-secret (fine for one machine); required
      // with DATABASE_URL (src/lib/server/deployment.ts).
      BETTER_AUTH_SECRET: envField.string({ context: 'server', access: 'secret', optional: true }),
      SMTP_HOST: envField.string({ context: 'server', access: 'secret', default: '127.0.0.1' }),
      SMTP_PORT: envField.number({ context: 'server', access: 'secret', default: 1025 }),
      SMTP_SECURE: envField.boolean({ context: 'server', access: 'secret', default: false }),
      SMTP_USER: envField.string({ context: 'server', access: 'secret', optional: true }),
      SMTP_PASS: envField.string({ context: 'server', access: 'secret', optional: true }),
      MAIL_FROM: envField.string({ context: 'server', access: 'secret', default: 'Cuffwright <no-reply@cuffwright.test>' }),
      // The invented demo shop on the first start of an empty database: 'on' or 'off'; unset, it is
      // on for the embedded database only (never on a PostgreSQL server unless asked).
      DEMO_DATA: envField.enum({ context: 'server', access: 'secret', values: ['on', 'off'], optional: true }),
      // Set by npm start / npm run dev / the tests: the folder the local capture writes; enables /outbox.
      MAIL_CAPTURE_DIR: envField.string({ context: 'server', access: 'secret', optional: true }),
      // Largest fitting photo accepted, in bytes (10 MB: a phone's full-size photo fits).
      PHOTO_MAX_BYTES: envField.number({ context: 'server', access: 'secret', default: 10 * 1024 * 1024 }),
      // Online payment links through the payment service's SDK; PAYMENTS_API_BASE points it at the
      // local fake (http://127.0.0.1:port) and is left unset for the real service.
      PAYMENTS_API_KEY: envField.string({ context: 'server', access: 'secret', optional: true }),
      PAYMENTS_API_BASE: envField.string({ context: 'server', access: 'secret', optional: true }),
      PAYMENTS_WEBHOOK_SECRET: envField.string({ context: 'server', access: 'secret', optional: true }),
      // Text messages through the SMS service's SDK (account id, token, sending number); SMS_API_BASE
      // points it at the local fake (http://127.0.0.1:port) and is left unset for the real service.
      // Without an account id and token, notices go by e-mail and the counter is told why.
      SMS_ACCOUNT_SID: envField.string({ context: 'server', access: 'secret', optional: true }),
      SMS_AUTH_TOKEN: envField.string({ context: 'server', access: 'secret', optional: true }),
      SMS_FROM: envField.string({ context: 'server', access: 'secret', optional: true }),
      SMS_API_BASE: envField.string({ context: 'server', access: 'secret', optional: true }),
      // A request body (JSON or an upload) that sends nothing for this long is answered 408.
      BODY_IDLE_SECONDS: envField.number({ context: 'server', access: 'secret', default: 20 }),
      // How often the server retries failed notices and sends automatic ready notices.
      NOTICE_TICK_SECONDS: envField.number({ context: 'server', access: 'secret', default: 30 }),
      // How long a server's claim on sending a notice lasts before another server may send it.
      NOTICE_LEASE_SECONDS: envField.number({ context: 'server', access: 'secret', default: 180, min: 1 }),
      // How many reverse proxies in front of the server append to X-Forwarded-For (0: none, the
      // client is the TCP peer). The limits take the client's address from it (README: Security).
      TRUSTED_PROXY_HOPS: envField.number({ context: 'server', access: 'secret', default: 0, int: true, min: 0 }),
      // 'json': one JSON line per request on stdout (npm run serve sets it); 'off' otherwise.
      REQUEST_LOG: envField.enum({ context: 'server', access: 'secret', values: ['json', 'off'], default: 'off' }),
      // Where fitting photos are kept: 'disk' (DATA_DIR/files, one machine) or 's3' (an S3-compatible
      // object store shared by several servers; README: Running several servers).
      STORAGE: envField.enum({ context: 'server', access: 'secret', values: ['disk', 's3'], default: 'disk' }),
      S3_BUCKET: envField.string({ context: 'server', access: 'secret', optional: true }),
      S3_PREFIX: envField.string({ context: 'server', access: 'secret', optional: true }),
      S3_REGION: envField.string({ context: 'server', access: 'secret', optional: true }),
      // A non-AWS store (or the local fake): its URL; path-style addressing is then the default.
      S3_ENDPOINT: envField.string({ context: 'server', access: 'secret', optional: true }),
      S3_ACCESS_KEY_ID: envField.string({ context: 'server', access: 'secret', optional: true }),
      S3_SECRET_ACCESS_KEY: envField.string({ context: 'server', access: 'secret', optional: true }),
      S3_FORCE_PATH_STYLE: envField.boolean({ context: 'server', access: 'secret', optional: true }),
      // Set by the HTTP tests: anonymous cut sheets say which thread drew them (X-Rendered-By: worker or main).
      SHEET_RENDER_TRACE: envField.boolean({ context: 'server', access: 'secret', default: false }),
      // off: none of the PDF speed patches (src/lib/server/pdf-platform). Read there from process.env, as
      // the sheet worker and the benchmarks have no astro:env; declared here so a typo is refused.
      PDF_SPEED_PATCHES: envField.enum({ context: 'server', access: 'secret', values: ['on', 'off'], default: 'on' }),
    },
  },
  vite: {
    // nodeWorker: `?node-worker` imports (the thread that renders strangers' cut sheets).
    // appLoadsAtStart: the built server loads the middleware and opens the database at start.
    plugins: [tailwindcss(), zodJitlessInBrowser(), icuCatalog(), icuParserOffInBrowser(), nodeWorker(), appLoadsAtStart()],
    // Heavy server-only libraries are never bundled for the browser. drizzle-orm (and drizzle-zod) are
    // bundled into the server: loaded from node_modules drizzle-orm was 113 files for Node to resolve,
    // read and link before the first answer. zod stays external: bundled, better-auth's own copy came
    // beside it, about 40 MB more while a batch of 500 sheets printed (over the 600 MB goal).
    ssr: { external: ['@electric-sql/pglite'], noExternal: SERVER_BUNDLED },
  },
});
