// A garment's fitting photos: the list, and uploading from a phone or tablet (multipart form).
import type { APIRoute } from 'astro';
import { PHOTO_MAX_BYTES } from 'astro:env/server';
import { guard, json, problem, refusal, run } from '@/lib/api';
import { BodyRefused, readLimited } from '@/lib/body';
import type { PhotoList } from '@/lib/photo-view';
import { addPhotos, garmentInShop, listPhotos, UploadRefused, type Upload } from '@/services/photos';

export const prerender = false;

/** At most this many photos in one upload. */
const MAX_FILES = 12;
// Room for the multipart boundaries and headers around the files.
const FORM_SLACK = 256 * 1024;

/** The garment's photos and the size limit. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['photos', 'read']);
  if (actor instanceof Response) return actor;
  return run(async (): Promise<PhotoList> => ({ photos: await listPhotos(actor, params.id ?? ''), maxBytes: PHOTO_MAX_BYTES }));
};

/** Adds the photos in the form's `photos` fields; every file is checked before any is kept. */
export const POST: APIRoute = async ({ locals, params, request }) => {
  const actor = guard(locals, ['photos', 'upload']);
  if (actor instanceof Response) return actor;
  try {
    // No need to read megabytes for a garment that is not there.
    await garmentInShop(actor, params.id ?? '');
  } catch (e) {
    return refusal(e);
  }
  const tooBig = `An upload may carry at most ${MAX_FILES} photos of ${Math.floor(PHOTO_MAX_BYTES / (1024 * 1024))} MB each.`;
  // Counted as it arrives (never held past the limit) and given up when it stops arriving.
  let body: Uint8Array;
  try {
    body = await readLimited(request, PHOTO_MAX_BYTES * MAX_FILES + FORM_SLACK);
  } catch (e) {
    if (e instanceof BodyRefused) return problem(e.status, e.status === 413 ? tooBig : e.message);
    throw e;
  }
  let form: FormData;
  try {
    form = await new Response(body as BodyInit, { headers: { 'content-type': request.headers.get('content-type') ?? '' } }).formData();
  } catch {
    return problem(400, 'Send the photos as a multipart form with one or more "photos" fields.');
  }
  const entries = form.getAll('photos').filter((v): v is File => typeof v !== 'string');
  if (entries.length > MAX_FILES) return problem(413, tooBig);
  const uploads: Upload[] = await Promise.all(entries.map(async (f) => ({ name: f.name, bytes: new Uint8Array(await f.arrayBuffer()) })));
  try {
    return json(await addPhotos(actor, params.id ?? '', uploads, PHOTO_MAX_BYTES), 201);
  } catch (e) {
    if (e instanceof UploadRefused) return problem(e.status, e.message, { photos: e.message });
    return refusal(e);
  }
};
