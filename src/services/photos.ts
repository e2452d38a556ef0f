// Fitting photos of a garment: checked by their bytes, kept in the storage under a random key, a
// WebP thumbnail beside each, and handed out only to members of the garment's shop.
import { randomUUID } from 'node:crypto';
import { and, asc, eq } from 'drizzle-orm';
import sharp from 'sharp';
import { db } from '@/db';
import { files, garments, user, type StoredFile } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import type { PhotoView } from '@/lib/shared/photo-view';
import { fileStorage } from '@/lib/server/storage';
import { readHeifImage, stripHeifMetadata } from '@/lib/server/storage/heif-metadata';
import { PLACEHOLDER_THUMB } from '@/lib/server/storage/placeholder-thumb';
import { isPathLike, safeName } from '@/lib/server/storage/safe-name';
import { sniffImage, type ImageType } from '@/lib/server/storage/sniff-image';
import { ServiceError } from './errors';
import { audit } from './audit';
import { garmentVisibleTo, isUuid } from './garments';

const THUMB_PX = 480;
/** The most pixels a photo may have (a 48 MP phone camera fits): read from its header, before any
 * decoding, since a few KB of PNG can declare 16,000 × 16,000 pixels and cost 100s of MB to open. */
export const MAX_PIXELS = 50_000_000;

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

/** Refuses a file whose header does not describe a picture we take, or one of too many pixels. */
export async function checkPicture(bytes: Uint8Array, type: ImageType, name: string): Promise<void> {
  let size: { width: number; height: number } | null;
  if (type.mime === 'image/heic') {
    // Its picture is never decoded here: its boxes must show one, with its size (ispe).
    size = readHeifImage(bytes);
    if (!size)
      throw new UploadRefused(
        415,
        `${name} could not be read as a HEIC photo, so its location could not be removed: send it as a JPEG or take it again.`,
        name,
      );
  } else {
    try {
      // metadata() reads the header only.
      const m = await sharp(bytes, { limitInputPixels: false }).metadata();
      size = m.width && m.height ? { width: m.width, height: m.height * (m.pages ?? 1) } : null;
    } catch {
      size = null;
    }
    if (!size) throw new UploadRefused(415, `${name} could not be read as an image: take the photo again.`, name);
  }
  if (size.width * size.height > MAX_PIXELS) {
    throw new UploadRefused(413, `${name} is ${size.width} × ${size.height} pixels: send a photo of at most ${MAX_PIXELS / 1_000_000} megapixels.`, name);
  }
}

/** What is kept of one upload: the picture without its metadata, and a WebP thumbnail. */
interface Prepared {
  bytes: Uint8Array;
  thumb: Uint8Array | null;
}

// Phones write where and when a photo was taken (EXIF GPS, XMP) into the file; a fitting photo of
// a customer's legs keeps none of that. The EXIF orientation is applied first (rotate()), as sharp
// drops all metadata, orientation included, from what it writes unless asked to keep it.
async function prepare(bytes: Uint8Array, type: ImageType, name: string): Promise<Prepared> {
  // This server's sharp cannot decode HEIC: its EXIF and XMP items are zeroed in place instead, and
  // it is served with a placeholder thumbnail. One whose boxes cannot be read is not kept at all.
  if (type.mime === 'image/heic') {
    const stripped = stripHeifMetadata(bytes);
    if (!stripped)
      throw new UploadRefused(
        415,
        `${name} could not be read as a HEIC photo, so its location could not be removed: send it as a JPEG or take it again.`,
        name,
      );
    return { bytes: stripped.bytes, thumb: null };
  }
  try {
    const upright = sharp(bytes, { failOn: 'error', limitInputPixels: MAX_PIXELS }).rotate();
    const clean = type.mime === 'image/jpeg' ? upright.jpeg({ quality: 92 }) : type.mime === 'image/png' ? upright.png() : upright.webp({ quality: 92 });
    const stored = await clean.toBuffer();
    const thumb = await sharp(stored).resize({ width: THUMB_PX, height: THUMB_PX, fit: 'inside', withoutEnlargement: true }).webp({ quality: 72 }).toBuffer();
    return { bytes: new Uint8Array(stored), thumb: new Uint8Array(thumb) };
  } catch {
    throw new UploadRefused(415, `${name} could not be read as an image: take the photo again.`, name);
  }
}

/** Checks every file first, then stores them all; any refusal stores none. */
export async function addPhotos(actor: Actor, garmentId: string, uploads: Upload[], maxBytes: number): Promise<PhotoView[]> {
  const garment = await garmentInShop(actor, garmentId);
  if (uploads.length === 0) throw new UploadRefused(422, 'Choose at least one photo.', '');
  const checked = checkUploads(uploads, maxBytes);
  for (const u of checked) await checkPicture(u.bytes, u.type, u.name);
  // One at a time: each decode holds a full-size picture in memory, and the machine has two cores.
  const prepared: Prepared[] = [];
  for (const u of checked) prepared.push(await prepare(u.bytes, u.type, u.name));
  const storage = fileStorage();
  const added: PhotoView[] = [];
  for (const [i, u] of checked.entries()) {
    const { bytes, thumb } = prepared[i]!;
    const id = randomUUID();
    const path = `${actor.shopId}/${id}.${u.type.ext}`;
    const thumbPath = thumb ? `${actor.shopId}/${id}-thumb.webp` : null;
    await storage.put(path, bytes, u.type.mime);
    if (thumb && thumbPath) await storage.put(thumbPath, thumb, 'image/webp');
    try {
      const [row] = await db.transaction(async (tx) => {
        const inserted = await tx
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
            bytes: bytes.byteLength,
            originalName: u.name,
            uploadedById: actor.userId,
          })
          .returning();
        await audit(tx, actor.shopId, actor.userId, 'photo.added', id, { garmentId, name: u.name, bytes: bytes.byteLength, type: u.type.mime });
        return inserted;
      });
      added.push(viewOf({ ...row!, uploadedBy: actor.userName }));
    } catch (e) {
      await removeStored(id, [path, thumbPath]);
      throw e;
    }
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

/** The photo's bytes and type: the thumbnail when asked, a placeholder tile when none could be made. */
export async function readPhoto(actor: Actor, id: string, size: 'full' | 'thumb' = 'full') {
  const row = await photoInShop(actor, id);
  const name = row.originalName ?? 'photo';
  if (size === 'thumb' && row.thumbPath === null) return { ...PLACEHOLDER_THUMB, name };
  const thumb = size === 'thumb';
  const bytes = await fileStorage().get(thumb ? row.thumbPath! : row.path);
  if (!bytes) throw new ServiceError(404, 'This photo is missing from the storage.');
  return { bytes, mimeType: thumb ? 'image/webp' : row.mimeType, name };
}

/** Removes a photo's row, then its file and thumbnail from the storage. */
export async function deletePhoto(actor: Actor, id: string): Promise<{ id: string; deleted: true }> {
  const row = await photoInShop(actor, id);
  await db.transaction(async (tx) => {
    const [gone] = await tx
      .delete(files)
      .where(and(eq(files.id, id), eq(files.shopId, actor.shopId)))
      .returning({ id: files.id });
    if (!gone) throw new ServiceError(404, 'No such photo in this shop.');
    await audit(tx, actor.shopId, actor.userId, 'photo.deleted', id, { garmentId: row.garmentId, name: row.originalName });
  });
  // The row is gone for good: a file the storage will not remove now is only logged (an orphan to
  // sweep later), never a reason to answer as if the photo were still there.
  await removeStored(id, [row.path, row.thumbPath]);
  return { id, deleted: true };
}

async function removeStored(photoId: string, keys: (string | null)[]): Promise<void> {
  const storage = fileStorage();
  for (const key of keys) {
    if (!key) continue;
    try {
      await storage.delete(key);
    } catch (e) {
      console.warn(`Photo ${photoId}: could not remove ${key} from the storage: ${(e as Error).message}`);
    }
  }
}
