// One fitting photo: the full picture, or removing it.
import { route } from '@/lib/server/route';
import { servePhoto } from '@/services/serve-photo';
import { deletePhoto } from '@/services/photos';
import { photoDeletedJson } from '@/lib/server/answers/site';

export const prerender = false;

/** The photo as kept (upright, without its metadata), to members of its shop only. */
export const GET = route(
  { summary: 'The photo as kept (upright, without its metadata).', permission: ['photos', 'read'], answer: 'image/*' },
  ({ context, params }) => servePhoto(context.locals, params.id!, 'full'),
);

/** Removes the photo and its thumbnail. */
export const DELETE = route(
  { summary: 'Removes the photo and its thumbnail.', permission: ['photos', 'delete'], responses: { 200: photoDeletedJson } },
  ({ actor, params }) => deletePhoto(actor, params.id!),
);
