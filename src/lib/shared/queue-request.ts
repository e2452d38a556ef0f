// The query of GET /api/garments (the queue): view=open (the default: everything not yet
// collected, all of it) or view=history (collected garments, newest taken in first, `limit` a page,
// the next page by `after=<cursor>` from the answer's X-Next-Cursor or Link header).
import { z } from 'zod';
import { isUuid } from './ids';
import { text } from './text';

/** A history cursor: the last row's intake time (as the database prints it, to the microsecond) and id. */
export interface QueueCursor {
  createdAt: string;
  id: string;
}

/** The cursor as sent in X-Next-Cursor and read back from `after`. */
export function encodeCursor(c: QueueCursor): string {
  return Buffer.from(`${c.createdAt}|${c.id}`).toString('base64url');
}

/** The cursor in `after`, or null when it is not one the queue gave out. */
export function decodeCursor(cursor: string): QueueCursor | null {
  const [createdAt = '', id = ''] = Buffer.from(cursor, 'base64url').toString().split('|');
  return /^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d(\.\d{1,6})?[+-]\d\d(:\d\d)?$/.test(createdAt) && isUuid(id) ? { createdAt, id } : null;
}

/** Rows per history page unless `limit` says otherwise, and the most one page may hold. */
export const HISTORY_PAGE = { size: 50, max: 200 } as const;

/** view=open|history, after=<cursor>, limit=1…200. */
export const queueQuery = z.object({
  view: z.enum(['open', 'history'], { error: 'Choose view=open or view=history.' }).default('open'),
  after: text()
    .max(200)
    .transform(
      (a, ctx) =>
        decodeCursor(a) ??
        (ctx.addIssue({ code: 'custom', message: 'The page cursor is not one this queue gave out; start again from the first page.' }), z.NEVER),
    )
    .optional(),
  limit: z.coerce
    .number({ error: `Give limit as a whole number from 1 to ${HISTORY_PAGE.max}.` })
    .int(`Give limit as a whole number from 1 to ${HISTORY_PAGE.max}.`)
    .min(1, `Give limit as a whole number from 1 to ${HISTORY_PAGE.max}.`)
    .max(HISTORY_PAGE.max, `Give limit as a whole number from 1 to ${HISTORY_PAGE.max}.`)
    .default(HISTORY_PAGE.size),
});
