// The shop's price list and counter settings: everyone at the counter reads it, the lead keeps it.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { priceListInput } from '@/lib/counter-request';
import { getPriceList, savePriceList } from '@/services/counter/prices';

export const prerender = false;

/** The price list with currency, hours and the automatic-notice setting. */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['prices', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => getPriceList(actor));
};

/** Saves the whole list and the settings. */
export const PUT: APIRoute = async ({ locals, request }) => {
  const actor = guard(locals, ['prices', 'update']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, priceListInput);
  if (input instanceof Response) return input;
  return run(() => savePriceList(actor, input));
};
