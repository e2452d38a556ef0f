// Presets: the shop's house presets and your own; adding one.
import { problem } from '@/lib/server/api';
import { presetCreateInput } from '@/lib/shared/preset-settings';
import { demand, route } from '@/lib/server/route';
import { createPreset, listPresets, settingsIssues } from '@/services/presets';
import { presetViewJson } from '@/lib/server/answers/people';
import { z } from 'zod';

export const prerender = false;

/** House presets (the default first) and the caller's own. */
export const GET = route(
  {
    summary: "The shop's house presets (the default first) and the caller's own.",
    permission: ['presets', 'read'],
    responses: { 200: z.array(presetViewJson) },
  },
  ({ actor }) => listPresets(actor),
);

/** Adds a house preset (lead only) or a personal one; lengths are read by the engine (422 per field). */
export const POST = route(
  {
    summary: 'Adds a personal preset, or a house preset (the lead); lengths are read as the calculator reads them.',
    permission: [
      ['presets', 'create-own'],
      ['presets', 'manage-house'],
    ],
    body: presetCreateInput,
    status: 201,
    examples: [
      { summary: 'My usual cuff', body: { name: 'My 1 1/2 in cuff', scope: 'personal', settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2' } } },
    ],
    responses: { 201: presetViewJson },
  },
  ({ actor, body }) => {
    demand(actor, ['presets', body.scope === 'house' ? 'manage-house' : 'create-own']);
    const issues = settingsIssues(body.settings);
    if (Object.keys(issues).length) return problem(422, Object.values(issues)[0]!, issues);
    return createPreset(actor, body);
  },
);
