// The overview's query (`?period=week|4w`), shared by the page, its JSON and its CSV.
import { z } from 'zod';
import { PERIODS } from './shop-days';

/** The period asked for; this week when not said. */
export const periodQuery = z.object({
  period: z.enum(PERIODS, { error: 'Choose the period: week (this week) or 4w (the last four weeks).' }).default('week'),
});

/** The period in a URL's query, or the 422 message when it names none. */
export function readPeriod(url: URL): { period: z.output<typeof periodQuery>['period'] } | { error: string } {
  const parsed = periodQuery.safeParse({ period: url.searchParams.get('period') ?? undefined });
  return parsed.success ? parsed.data : { error: parsed.error.issues[0]?.message ?? 'Choose the period.' };
}
