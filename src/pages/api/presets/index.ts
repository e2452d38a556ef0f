// Presets: the shop's house presets and your own; adding one.
import type { APIRoute } from 'astro';
import { guard, problem, readBody, run } from '@/lib/api';
import { presetCreateInput } from '@/lib/preset-settings';
import { createPreset, listPresets, settingsIssues } from '@/services/presets';

export const prerender = false;

/** House presets (the default first) and the caller's own. */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['presets', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => listPresets(actor));
};

/** Adds a house preset (lead only) or a personal one; lengths are read by the engine (422 per field). */
export const POST: APIRoute = async ({ locals, request }) => {
  const input = await readBody(request.clone(), presetCreateInput);
  const house = !(input instanceof Response) && input.scope === 'house';
  const actor = guard(locals, ['presets', house ? 'manage-house' : 'create-own']);
  if (actor instanceof Response) return actor;
  if (input instanceof Response) return input;
  const issues = settingsIssues(input.settings);
  if (Object.keys(issues).length) return problem(422, Object.values(issues)[0]!, issues);
  return run(() => createPreset(actor, input), 201);
};
