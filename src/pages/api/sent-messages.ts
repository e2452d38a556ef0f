// The messages this shop sent (lead), where mail goes to the local capture; absent elsewhere.
import { MAIL_CAPTURE_DIR } from 'astro:env/server';
import { route } from '@/lib/server/route';
import { listSentMail } from '@/services/sent-mail';
import { sentMessageJson } from '@/lib/server/answers/site';
import { z } from 'zod';

/** The shop's own sent messages, newest first; 404 when mail goes to a real SMTP host. */
export const GET = route(
  {
    summary: "The shop's sent messages, newest first (only where mail goes to the local capture; 404 elsewhere).",
    permission: ['messages', 'read'],
    // Without the capture the route does not exist, for anyone.
    available: () => Boolean(MAIL_CAPTURE_DIR),
    responses: { 200: z.array(sentMessageJson) },
  },
  ({ actor }) => listSentMail(actor.shopId, MAIL_CAPTURE_DIR!),
);
