// The settings a service test runs with in place of astro:env/server: the schema's defaults
// (astro.config.mjs), no payment or SMS provider, the local app address; a file gives only what
// it changes. vi.mock('astro:env/server', async () => (await import('./server-env')).serverEnv({ … })).

/** astro:env/server as the service tests see it, with `changes` over the defaults. */
export function serverEnv(changes: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    BODY_IDLE_SECONDS: 20,
    NOTICE_LEASE_SECONDS: 180,
    PAYMENTS_API_KEY: undefined,
    PAYMENTS_API_BASE: undefined,
    PAYMENTS_WEBHOOK_SECRET: undefined,
    SMS_ACCOUNT_SID: undefined,
    SMS_AUTH_TOKEN: undefined,
    SMS_FROM: undefined,
    SMS_API_BASE: undefined,
    BETTER_AUTH_URL: 'http://localhost:4321',
    ...changes,
  };
}
