// Multipart uploads for the photo tests (the JSON client cannot send files), and sample images.
import sharp from 'sharp';
import { inject } from 'vitest';
import { call, type Answer } from './client';

/** A real JPEG of the given size, made here (no image files in the repository). */
export async function sampleJpeg(width = 800, height = 600): Promise<Uint8Array> {
  const img = sharp({ create: { width, height, channels: 3, background: { r: 120, g: 110, b: 96 } } });
  return new Uint8Array(await img.jpeg().toBuffer());
}

/** Posts the files as the form's `photos` fields, as a browser would. */
export async function upload(cookie: string | undefined, garmentId: string, photos: { name: string; bytes: Uint8Array; type?: string }[]): Promise<Answer> {
  const base = inject('baseURL');
  const form = new FormData();
  for (const p of photos) form.append('photos', new Blob([p.bytes as BlobPart], { type: p.type ?? 'image/jpeg' }), p.name);
  const headers: Record<string, string> = { origin: base };
  if (cookie) headers.cookie = cookie;
  const res = await fetch(`${base}/api/garments/${garmentId}/photos`, { method: 'POST', headers, body: form, redirect: 'manual' });
  const text = await res.text();
  let body: unknown = text;
  try {
    body = JSON.parse(text);
  } catch {
    /* not JSON */
  }
  return { status: res.status, body, headers: res.headers };
}

/** A garment given to nobody (every role of the shop sees it) from the holder of the cookie's queue. */
export async function someGarment(cookie: string): Promise<string> {
  const list = await call('GET', '/api/garments', { cookie });
  const open = list.status === 200 ? (list.body as { id: string; assigneeId: string | null }[]).find((g) => !g.assigneeId) : undefined;
  if (!open) throw new Error(`no unassigned garment to attach photos to: ${list.status}`);
  return open.id;
}
