// For a load balancer or a deploy script: 200 when this server's database answers, its
// migrations are current and its start-up work (the demo seed included) is done, 503 otherwise;
// no session needed, no shop data in it.
import { json } from '@/lib/server/api';
import { route } from '@/lib/server/route';
import { health } from '@/services/health';
import { startedUp } from '@/services/startup';
import { healthJson } from '@/lib/server/answers/site';

/** The server's health (see services/health.ts). */
export const GET = route(
  {
    summary: "This server's health: 200 when its database answers, its migrations are current and its start-up work is done; 503 otherwise.",
    permission: 'public',
    responses: { 200: healthJson, 503: healthJson },
  },
  async () => {
    const started = startedUp();
    const report = await health();
    const ok = report.ok && started;
    const res = json({ ...report, ok, started }, ok ? 200 : 503);
    res.headers.set('cache-control', 'no-store');
    return res;
  },
);
