// A fitting photo's thumbnail (WebP), or a placeholder tile when none could be made (HEIC).
import { route } from '@/lib/server/route';
import { servePhoto } from '@/services/serve-photo';

export const prerender = false;

/** The small copy, to members of the photo's shop only. */
export const GET = route(
  { summary: "The photo's thumbnail (WebP), or a placeholder tile when none could be made.", permission: ['photos', 'read'], answer: 'image/*' },
  ({ context, params }) => servePhoto(context.locals, params.id!, 'thumb'),
);
