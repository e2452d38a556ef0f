// For a load balancer or a deploy script: 200 when this server's database answers and its
// migrations are current, 503 otherwise; no session needed, no shop data in it.
import type { APIRoute } from 'astro';
import { json } from '@/lib/api';
import { health } from '@/services/health';

/** The server's health (see services/health.ts). */
export const GET: APIRoute = async () => {
  const report = await health();
  const res = json(report, report.ok ? 200 : 503);
  res.headers.set('cache-control', 'no-store');
  return res;
};
