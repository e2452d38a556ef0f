// The queue: every garment the role may see, with its ticket number, customer and assignee.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { listQueue } from '@/services/garments';

/** The garments of the queue (an apprentice sees their own and unassigned). */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['tickets', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => listQueue(actor));
};
