// The shop's time zone, where its days begin and end (the overview counts by them).
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { timeZoneRequest } from '@/lib/time-zone-request';
import { saveShopTimeZone, shopTimeZone } from '@/services/shop-time-zone';

/** The shop's time zone and whether it was chosen (every member reads it). */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['tickets', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => shopTimeZone(actor.shopId));
};

/** Saves the shop's time zone (the lead); 422 for a name Intl does not know. */
export const PUT: APIRoute = async ({ locals, request }) => {
  const actor = guard(locals, ['settings', 'update']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, timeZoneRequest);
  if (input instanceof Response) return input;
  return run(() => saveShopTimeZone(actor, input.timeZone));
};
