// The development outbox: mail the local capture received for this shop's people (lead).
import type { APIRoute } from 'astro';
import { MAIL_CAPTURE_DIR } from 'astro:env/server';
import { guard, problem, run } from '@/lib/api';
import { listCapturedMail } from '@/services/outbox';
import { shopAddresses } from '@/services/shop-addresses';

/** Captured messages to the shop's staff, invitees and customers, newest first. */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['outbox', 'read']);
  if (actor instanceof Response) return actor;
  if (!MAIL_CAPTURE_DIR) return problem(404, 'No mail capture here: mail goes to a real SMTP host.');
  return run(async () => listCapturedMail(MAIL_CAPTURE_DIR!, await shopAddresses(actor.shopId)));
};
