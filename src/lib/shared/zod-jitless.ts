// zod as the browser gets it (astro.config.mjs points the islands' `zod` here): configured
// "jitless" before any schema is built. Otherwise zod probes `new Function("")` once, which the
// page's Content-Security-Policy (no 'unsafe-eval') reports as a violation, caught or not.
import * as zod from 'zod';

zod.config({ jitless: true });

export * from 'zod';
export { default } from 'zod';
