// The shop's bench settings: the measuring scale and its own names for the steps.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { settingsRequest } from '@/lib/bench-requests';
import { benchSettings, saveBenchSettings } from '@/services/shop-settings';

/** The shop's scale and step names (everyone at the bench reads them). */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['tickets', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => benchSettings(actor.shopId));
};

/** Saves the shop's scale and step names (the lead). */
export const PUT: APIRoute = async ({ locals, request }) => {
  const actor = guard(locals, ['settings', 'update']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, settingsRequest);
  if (input instanceof Response) return input;
  return run(() => saveBenchSettings(actor, input));
};
