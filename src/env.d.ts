/// <reference types="astro/client" />

declare namespace App {
  /** What src/middleware.ts resolves for every request. */
  interface Locals {
    /** The signed-in person, or null. */
    user: { id: string; name: string; email: string } | null;
    /** Their membership in the active shop, or null (signed out, or in no shop). */
    member: import('@/services/members').Membership | null;
  }
}

/** A worker_threads entry built beside the server (scripts/vite-node-worker.mjs); null in dev and tests. */
declare module '*?node-worker' {
  const url: string | null;
  export default url;
}
