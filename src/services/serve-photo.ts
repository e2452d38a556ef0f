// How a stored photo is answered: its own type, kept private, never sniffed into something else.
import { guard, problem } from '@/lib/server/api';
import { ServiceError } from './errors';
import { readPhoto } from './photos';

/** The photo's bytes for a member of its shop; 404 to everyone else. */
export async function servePhoto(locals: App.Locals, id: string, size: 'full' | 'thumb'): Promise<Response> {
  const actor = guard(locals, ['photos', 'read']);
  if (actor instanceof Response) return actor;
  try {
    const photo = await readPhoto(actor, id, size);
    return new Response(photo.bytes as BodyInit, {
      headers: {
        'content-type': photo.mimeType,
        'content-length': String(photo.bytes.byteLength),
        'cache-control': 'private, max-age=3600',
        'x-content-type-options': 'nosniff',
        'content-disposition': `inline; filename="${photo.name.replace(/[^\x20-\x7e]|["\\]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(photo.name)}`,
        'content-security-policy': "default-src 'none'; sandbox",
      },
    });
  } catch (e) {
    if (e instanceof ServiceError) return problem(e.status, e.message);
    throw e;
  }
}
