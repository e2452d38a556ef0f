// One preset: change it or remove it. House presets are the lead's; your own are yours.
import { problem } from '@/lib/server/api';
import { presetUpdateInput } from '@/lib/shared/preset-settings';
import { demand, route } from '@/lib/server/route';
import type { Actor } from '@/lib/server/api';
import type { Permission } from '@/lib/shared/roles';
import { deletePreset, presetScope, settingsIssues, updatePreset } from '@/services/presets';
import { presetViewJson, presetDeletedJson } from '@/lib/server/answers/people';

export const prerender = false;

// Either permission lets the caller look; the preset's scope decides which one it needs.
const CHANGERS: Permission[] = [
  ['presets', 'create-own'],
  ['presets', 'manage-house'],
];

/** Refuses unless the actor may change this preset: a house preset is the lead's (404 when not the shop's). */
async function mayChange(actor: Actor, id: string): Promise<Response | null> {
  const scope = await presetScope(actor, id);
  if (!scope) return problem(404, 'No such preset.');
  demand(actor, ['presets', scope === 'house' ? 'manage-house' : 'create-own']);
  return null;
}

/** Renames it, changes its settings, or makes it the house default. */
export const PATCH = route(
  {
    summary: 'Renames a preset, changes its settings, or makes a house preset the default (house presets: the lead).',
    permission: CHANGERS,
    body: presetUpdateInput,
    examples: [{ summary: 'A new name', body: { name: 'Deep cuff' } }],
    responses: { 200: presetViewJson },
  },
  async ({ actor, params, body }) => {
    const refused = await mayChange(actor, params.id!);
    if (refused) return refused;
    const issues = body.settings ? settingsIssues(body.settings) : {};
    if (Object.keys(issues).length) return problem(422, Object.values(issues)[0]!, issues);
    return updatePreset(actor, params.id!, body);
  },
);

/** Removes it. */
export const DELETE = route(
  { summary: 'Removes a preset (house presets: the lead).', permission: CHANGERS, responses: { 200: presetDeletedJson } },
  async ({ actor, params }) => {
    const refused = await mayChange(actor, params.id!);
    if (refused) return refused;
    return deletePreset(actor, params.id!);
  },
);
