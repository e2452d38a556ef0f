// One fitting photo: the full picture, or removing it.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { servePhoto } from '@/services/serve-photo';
import { deletePhoto } from '@/services/photos';

export const prerender = false;

/** The photo as kept (upright, without its metadata), to members of its shop only. */
export const GET: APIRoute = ({ locals, params }) => servePhoto(locals, params.id ?? '', 'full');

/** Removes the photo and its thumbnail. */
export const DELETE: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['photos', 'delete']);
  if (actor instanceof Response) return actor;
  return run(() => deletePhoto(actor, params.id ?? ''));
};
