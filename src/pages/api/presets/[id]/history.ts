// One preset's kept edits: who changed which field, when, old → new.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { presetHistory } from '@/services/presets';

export const prerender = false;

/** The preset's history, newest first; 404 for a preset the caller cannot see (another shop's, a colleague's own). */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['presets', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => presetHistory(actor, params.id ?? ''));
};
