// The messages this shop sent (lead), where mail goes to the local capture; absent elsewhere.
import type { APIRoute } from 'astro';
import { MAIL_CAPTURE_DIR } from 'astro:env/server';
import { guard, problem, run } from '@/lib/api';
import { listSentMail } from '@/services/sent-mail';

/** The shop's own sent messages, newest first; 404 when mail goes to a real SMTP host. */
export const GET: APIRoute = async ({ locals }) => {
  // Checked first: without the capture the route does not exist, for anyone.
  if (!MAIL_CAPTURE_DIR) return problem(404, 'Not found.');
  const actor = guard(locals, ['messages', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => listSentMail(actor.shopId, MAIL_CAPTURE_DIR!));
};
