// One preset: change it or remove it. House presets are the lead's; your own are yours.
import type { APIContext, APIRoute } from 'astro';
import { guard, problem, readBody, run, type Actor } from '@/lib/api';
import { presetUpdateInput } from '@/lib/preset-settings';
import { deletePreset, presetScope, settingsIssues, updatePreset } from '@/services/presets';

export const prerender = false;

/** The actor allowed to change this preset, or the 401/403/404 answer. */
async function changer({ locals, params }: APIContext): Promise<Actor | Response> {
  const reader = guard(locals, ['presets', 'read']);
  if (reader instanceof Response) return reader;
  const scope = await presetScope(reader, params.id ?? '');
  if (!scope) return problem(404, 'No such preset.');
  return guard(locals, ['presets', scope === 'house' ? 'manage-house' : 'create-own']);
}

/** Renames it, changes its settings, or makes it the house default. */
export const PATCH: APIRoute = async (context) => {
  const actor = await changer(context);
  if (actor instanceof Response) return actor;
  const input = await readBody(context.request, presetUpdateInput);
  if (input instanceof Response) return input;
  const issues = input.settings ? settingsIssues(input.settings) : {};
  if (Object.keys(issues).length) return problem(422, Object.values(issues)[0]!, issues);
  return run(() => updatePreset(actor, context.params.id ?? '', input));
};

/** Removes it. */
export const DELETE: APIRoute = async (context) => {
  const actor = await changer(context);
  if (actor instanceof Response) return actor;
  return run(() => deletePreset(actor, context.params.id ?? ''));
};
