// The shop's week at a glance as JSON (lead): the figures behind /overview.
import type { APIRoute } from 'astro';
import { guard, problem, run } from '@/lib/api';
import { readPeriod } from '@/lib/overview/period-request';
import { shopOverview } from '@/services/overview';

/** The overview for `?period=week|4w` (this week when not said); 422 for another period. */
export const GET: APIRoute = async ({ locals, url }) => {
  const actor = guard(locals, ['overview', 'read']);
  if (actor instanceof Response) return actor;
  const query = readPeriod(url);
  if ('error' in query) return problem(422, 'Some fields need attention.', { period: query.error });
  return run(() => shopOverview(actor.shopId, query.period));
};
