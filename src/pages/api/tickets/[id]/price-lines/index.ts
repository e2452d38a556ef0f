// A ticket's price lines: read them, or add one from the list or an adjustment with its reason.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { lineInput } from '@/lib/counter-request';
import { addLine, listLines } from '@/services/counter/prices';

export const prerender = false;

/** The ticket's lines. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['prices', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => listLines(actor, params.id ?? ''));
};

/** Adds a line from the list, or an adjustment with its reason. */
export const POST: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['prices', 'adjust']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, lineInput);
  if (input instanceof Response) return input;
  return run(() => addLine(actor, params.id ?? '', input), 201);
};
