// The shop's overview per day as a CSV download (lead).
import type { APIRoute } from 'astro';
import { guard, problem, refusal } from '@/lib/api';
import { overviewCsv, overviewCsvName } from '@/lib/overview/overview-csv';
import { readPeriod } from '@/lib/overview/period-request';
import { shopOverview } from '@/services/overview';

/** text/csv for `?period=week|4w`, named after the period's first and last day. */
export const GET: APIRoute = async ({ locals, url }) => {
  const actor = guard(locals, ['overview', 'read']);
  if (actor instanceof Response) return actor;
  const query = readPeriod(url);
  if ('error' in query) return problem(422, 'Some fields need attention.', { period: query.error });
  try {
    const o = await shopOverview(actor.shopId, query.period);
    return new Response(overviewCsv(o), {
      headers: {
        'content-type': 'text/csv; charset=utf-8',
        'content-disposition': `attachment; filename="${overviewCsvName(o)}"`,
        'cache-control': 'no-store',
      },
    });
  } catch (e) {
    return refusal(e);
  }
};
