// The shop's overview per day as a CSV download (lead).
import { overviewCsv, overviewCsvName } from '@/lib/shared/overview/overview-csv';
import { periodQuery } from '@/lib/shared/overview/period-request';
import { route } from '@/lib/server/route';
import { shopOverview } from '@/services/overview';

/** text/csv for `?period=week|4w`, named after the period's first and last day. */
export const GET = route(
  {
    summary: "The shop's overview per day as a CSV file, for this week or the last four weeks.",
    permission: ['overview', 'read'],
    query: periodQuery,
    answer: 'text/csv',
    examples: [{ summary: 'This week', query: { period: 'week' } }],
  },
  async ({ actor, query }) => {
    const o = await shopOverview(actor.shopId, query.period);
    return new Response(overviewCsv(o), {
      headers: {
        'content-type': 'text/csv; charset=utf-8',
        'content-disposition': `attachment; filename="${overviewCsvName(o)}"`,
        'cache-control': 'no-store',
      },
    });
  },
);
