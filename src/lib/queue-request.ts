// The query of GET /api/garments (the queue): view=open (the default: everything not yet
// collected, all of it) or view=history (collected garments, newest taken in first, `limit` a page,
// the next page by `after=<cursor>` from the answer's X-Next-Cursor or Link header).
import { z } from 'zod';
import { text } from './text';

/** Rows per history page unless `limit` says otherwise, and the most one page may hold. */
export const HISTORY_PAGE = { size: 50, max: 200 } as const;

/** view=open|history, after=<cursor>, limit=1…200. */
export const queueQuery = z.object({
  view: z.enum(['open', 'history'], { error: 'Choose view=open or view=history.' }).default('open'),
  after: text().min(1).max(200, 'The page cursor is not one this queue gave out.').optional(),
  limit: z.coerce
    .number({ error: `Give limit as a whole number from 1 to ${HISTORY_PAGE.max}.` })
    .int(`Give limit as a whole number from 1 to ${HISTORY_PAGE.max}.`)
    .min(1, `Give limit as a whole number from 1 to ${HISTORY_PAGE.max}.`)
    .max(HISTORY_PAGE.max, `Give limit as a whole number from 1 to ${HISTORY_PAGE.max}.`)
    .default(HISTORY_PAGE.size),
});
