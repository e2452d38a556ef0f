// One preset's kept edits: who changed which field, when, old → new.
import { route } from '@/lib/server/route';
import { presetHistory } from '@/services/presets';

export const prerender = false;

/** The preset's history, newest first; 404 for a preset the caller cannot see (another shop's, a colleague's own). */
export const GET = route(
  { summary: "One preset's kept edits, newest first: who changed which field, when, old → new.", permission: ['presets', 'read'] },
  ({ actor, params }) => presetHistory(actor, params.id!),
);
