// Fitting photos of a garment: checked by their bytes, kept in the storage under a random key, a
// WebP thumbnail beside each, and handed out only to members of the garment's shop.
import { randomUUID } from 'node:crypto';
import { and, asc, eq } from 'drizzle-orm';
import sharp from 'sharp';
import { db } from '@/db';
import { files, garments, user, type StoredFile } from '@/db/schema';
import type { Actor } from '@/lib/api';
import type { PhotoView } from '@/lib/photo-view';
import { fileStorage } from '@/lib/storage';
import { isPathLike, safeName } from '@/lib/storage/safe-name';
import { sniffImage, type ImageType } from '@/lib/storage/sniff-image';
import { ServiceError } from './errors';
import { audit } from './audit';
import { garmentVisibleTo, isUuid } from './garments';

const THUMB_PX = 480;

/** An upload refused for what it is: 413 too large, 415 not an image we take, 422 a bad name. */
export class UploadRefused extends Error {
  constructor(
    public status: 413 | 415 | 422,
    message: string,
    public fileName: string,
  ) {
    super(message);
  }
}

/** One file as it arrived: the name the browser gave and its bytes. */
export interface Upload {
  name: string;
  bytes: Uint8Array;
}

function viewOf(row: StoredFile & { uploadedBy?: string | null }): PhotoView {
  return {
    id: row.id,
    name: row.originalName ?? 'photo',
    mimeType: row.mimeType,
    bytes: row.bytes,
    url: `/api/photos/${row.id}`,
    thumbUrl: `/api/photos/${row.id}/thumb`,
    hasThumb: row.thumbPath !== null,
    uploadedBy: row.uploadedBy ?? null,
    createdAt: row.createdAt.toISOString(),
  };
}

/** The garment when the actor may see it, else a 404 (checked before an upload is read). */
export async function garmentInShop(actor: Actor, garmentId: string) {
  if (!isUuid(garmentId)) throw new ServiceError(404, 'No such garment in this shop.');
  const [g] = await db
    .select({ id: garments.id, ticketId: garments.ticketId })
    .from(garments)
    // The queue's rule: an apprentice sees only garments given to them or to nobody.
    .where(and(eq(garments.id, garmentId), garmentVisibleTo(actor)));
  if (!g) throw new ServiceError(404, 'No such garment in this shop.');
  return g;
}

/** The garment's fitting photos, oldest first. */
export async function listPhotos(actor: Actor, garmentId: string): Promise<PhotoView[]> {
  await garmentInShop(actor, garmentId);
  const rows = await db
    .select({ file: files, uploadedBy: user.name })
    .from(files)
    .leftJoin(user, eq(user.id, files.uploadedById))
    .where(and(eq(files.shopId, actor.shopId), eq(files.garmentId, garmentId), eq(files.kind, 'fitting-photo')))
    .orderBy(asc(files.createdAt));
  return rows.map((r) => viewOf({ ...r.file, uploadedBy: r.uploadedBy }));
}

/** Refuses the first file that is not an image we take, too large, or named like a path. */
export function checkUploads(uploads: Upload[], maxBytes: number): (Upload & { type: ImageType; name: string })[] {
  return uploads.map((u) => {
    if (isPathLike(u.name)) throw new UploadRefused(422, `The file name "${safeName(u.name)}" points at a folder: rename the photo and try again.`, u.name);
    const name = safeName(u.name);
    if (u.bytes.byteLength > maxBytes) {
      throw new UploadRefused(413, `${name} is larger than ${Math.floor(maxBytes / (1024 * 1024))} MB: send a smaller photo.`, name);
    }
    const type = sniffImage(u.bytes);
    if (!type) throw new UploadRefused(415, `${name} is not a photo we take: send a JPEG, PNG, WebP or HEIC image.`, name);
    return { ...u, name, type };
  });
}

/** A WebP thumbnail, or null when this server cannot decode the type (HEIC); throws on a broken image. */
async function thumbnail(bytes: Uint8Array, type: ImageType, name: string): Promise<Uint8Array | null> {
  if (type.mime === 'image/heic') return null;
  try {
    const out = await sharp(bytes, { failOn: 'error' })
      .rotate()
      .resize({ width: THUMB_PX, height: THUMB_PX, fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 72 })
      .toBuffer();
    return new Uint8Array(out);
  } catch {
    throw new UploadRefused(415, `${name} could not be read as an image: take the photo again.`, name);
  }
}

/** Checks every file first, then stores them all; any refusal stores none. */
export async function addPhotos(actor: Actor, garmentId: string, uploads: Upload[], maxBytes: number): Promise<PhotoView[]> {
  const garment = await garmentInShop(actor, garmentId);
  if (uploads.length === 0) throw new UploadRefused(422, 'Choose at least one photo.', '');
  const checked = checkUploads(uploads, maxBytes);
  const thumbs = await Promise.all(checked.map((u) => thumbnail(u.bytes, u.type, u.name)));
  const storage = fileStorage();
  const added: PhotoView[] = [];
  for (const [i, u] of checked.entries()) {
    const id = randomUUID();
    const path = `${actor.shopId}/${id}.${u.type.ext}`;
    const thumbPath = thumbs[i] ? `${actor.shopId}/${id}-thumb.webp` : null;
    await storage.put(path, u.bytes, u.type.mime);
    if (thumbPath) await storage.put(thumbPath, thumbs[i]!, 'image/webp');
    try {
      const [row] = await db
        .insert(files)
        .values({
          id,
          shopId: actor.shopId,
          ticketId: garment.ticketId,
          garmentId,
          kind: 'fitting-photo',
          path,
          thumbPath,
          mimeType: u.type.mime,
          bytes: u.bytes.byteLength,
          originalName: u.name,
          uploadedById: actor.userId,
        })
        .returning();
      added.push(viewOf({ ...row!, uploadedBy: actor.userName }));
    } catch (e) {
      await storage.delete(path);
      if (thumbPath) await storage.delete(thumbPath);
      throw e;
    }
    await audit(actor.shopId, actor.userId, 'photo.added', id, { garmentId, name: u.name, bytes: u.bytes.byteLength, type: u.type.mime });
  }
  return added;
}

async function photoInShop(actor: Actor, id: string): Promise<StoredFile> {
  if (!isUuid(id)) throw new ServiceError(404, 'No such photo in this shop.');
  const [found] = await db
    .select({ file: files })
    .from(files)
    .innerJoin(garments, eq(garments.id, files.garmentId))
    .where(and(eq(files.id, id), eq(files.shopId, actor.shopId), eq(files.kind, 'fitting-photo'), garmentVisibleTo(actor)));
  if (!found) throw new ServiceError(404, 'No such photo in this shop.');
  return found.file;
}

/** The photo's bytes and type (the thumbnail when asked and there is one). */
export async function readPhoto(actor: Actor, id: string, size: 'full' | 'thumb' = 'full') {
  const row = await photoInShop(actor, id);
  const thumb = size === 'thumb' && row.thumbPath !== null;
  const bytes = await fileStorage().get(thumb ? row.thumbPath! : row.path);
  if (!bytes) throw new ServiceError(404, 'This photo is missing from the storage.');
  return { bytes, mimeType: thumb ? 'image/webp' : row.mimeType, name: row.originalName ?? 'photo' };
}

/** Removes a photo and its thumbnail. */
export async function deletePhoto(actor: Actor, id: string): Promise<{ id: string; deleted: true }> {
  const row = await photoInShop(actor, id);
  await db.delete(files).where(and(eq(files.id, id), eq(files.shopId, actor.shopId)));
  const storage = fileStorage();
  await storage.delete(row.path);
  if (row.thumbPath) await storage.delete(row.thumbPath);
  await audit(actor.shopId, actor.userId, 'photo.deleted', id, { garmentId: row.garmentId, name: row.originalName });
  return { id, deleted: true };
}
