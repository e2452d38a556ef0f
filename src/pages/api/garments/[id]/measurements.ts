// A garment's fitting measurements per leg: read them with their history; save both legs.
import type { APIRoute } from 'astro';
import { guard, problem, readBody, run } from '@/lib/api';
import { measurementsRequest } from '@/lib/measurement-request';
import { fittingOf, readLengths, saveMeasurements } from '@/services/measurements';

/** Both legs as saved and every change to them, newest first. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['measurements', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => fittingOf(actor, params.id ?? ''));
};

/** Saves both legs; a length the engine cannot read is 422 with a message for that field. */
export const PUT: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['measurements', 'update']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, measurementsRequest);
  if (input instanceof Response) return input;
  const read = readLengths(input);
  if (!read.ok) return problem(422, 'Some lengths could not be read.', read.issues);
  return run(() => saveMeasurements(actor, params.id ?? '', input, read.legs));
};
