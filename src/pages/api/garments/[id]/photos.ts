// A garment's fitting photos: the list, and uploading from a phone or tablet (multipart form).
import { PHOTO_MAX_BYTES } from 'astro:env/server';
import { json, problem } from '@/lib/server/api';
import { BodyRefused, readLimited } from '@/lib/server/body';
import type { PhotoList } from '@/lib/shared/photo-view';
import { route } from '@/lib/server/route';
import { addPhotos, garmentInShop, listPhotos, UploadRefused, type Upload } from '@/services/photos';
import { photoListJson, photoJson } from '@/lib/server/answers/site';
import { z } from 'zod';

export const prerender = false;

/** At most this many photos in one upload. */
const MAX_FILES = 12;
// Room for the multipart boundaries and headers around the files.
const FORM_SLACK = 256 * 1024;

/** The garment's photos and the size limit. */
export const GET = route(
  { summary: "The garment's fitting photos and the size limit of one.", permission: ['photos', 'read'], responses: { 200: photoListJson } },
  async ({ actor, params }): Promise<PhotoList> => ({ photos: await listPhotos(actor, params.id!), maxBytes: PHOTO_MAX_BYTES }),
);

/** Adds the photos in the form's `photos` fields; every file is checked before any is kept. */
export const POST = route(
  {
    summary: 'Adds photos: a multipart form with one or more "photos" file fields (JPEG, PNG, WebP or HEIC); every file is checked before any is kept.',
    description: `At most ${MAX_FILES} photos in one upload.`,
    permission: ['photos', 'upload'],
    rawBody: { type: 'multipart/form-data' },
    status: 201,
    responses: { 201: z.array(photoJson) },
  },
  async ({ actor, params, request }) => {
    // No need to read megabytes for a garment that is not there.
    await garmentInShop(actor, params.id!);
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
      return json(await addPhotos(actor, params.id!, uploads, PHOTO_MAX_BYTES), 201);
    } catch (e) {
      if (e instanceof UploadRefused) return problem(e.status, e.message, { photos: e.message });
      throw e;
    }
  },
);
