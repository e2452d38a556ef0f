// Sends photos as a multipart form (fetchJson is JSON only); the server's message on refusal.
import { ApiError } from '@/lib/fetch-json';
import type { PhotoView } from '@/lib/photo-view';

/** Uploads the files to the garment; throws ApiError with the server's message. */
export async function uploadPhotos(garmentId: string, photos: File[]): Promise<PhotoView[]> {
  const form = new FormData();
  for (const p of photos) form.append('photos', p, p.name);
  const response = await fetch(`/api/garments/${encodeURIComponent(garmentId)}/photos`, { method: 'POST', body: form, credentials: 'same-origin' });
  const data = (await response.json().catch(() => ({}))) as Record<string, unknown>;
  if (!response.ok) throw new ApiError(response.status, String(data.error ?? `The server answered ${response.status}.`));
  return data as unknown as PhotoView[];
}
