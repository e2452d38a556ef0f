// The shop's week at a glance as JSON (lead): the figures behind /overview.
import { periodQuery } from '@/lib/shared/overview/period-request';
import { route } from '@/lib/server/route';
import { overviewJson } from '@/lib/server/answers/counter';
import { shopOverview } from '@/services/overview';

/** The overview for `?period=week|4w` (this week when not said); 422 for another period. */
export const GET = route(
  {
    summary: "The shop's figures per day: intake, hand-overs, due work, takings (this week unless period=4w).",
    permission: ['overview', 'read'],
    query: periodQuery,
    examples: [{ summary: 'The last four weeks', query: { period: '4w' } }],
    responses: { 200: overviewJson },
  },
  ({ actor, query }) => shopOverview(actor.shopId, query.period),
);
