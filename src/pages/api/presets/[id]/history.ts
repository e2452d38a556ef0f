// One preset's kept edits: who changed which field, when, old → new.
import { route } from '@/lib/server/route';
import { presetHistory } from '@/services/presets';
import { presetChangeJson } from '@/lib/server/answers/people';
import { z } from 'zod';

export const prerender = false;

/** The preset's history, newest first; 404 for a preset the caller cannot see (another shop's, a colleague's own). */
export const GET = route(
  {
    summary: "One preset's kept edits, newest first: who changed which field, when, old → new.",
    permission: ['presets', 'read'],
    responses: { 200: z.array(presetChangeJson) },
  },
  ({ actor, params }) => presetHistory(actor, params.id!),
);
