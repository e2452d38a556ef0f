import { fetchJson } from '@/lib/shared/fetch-json';
import type { PhotoView } from '@/lib/shared/photo-view';

/** Uploads the files to the garment as a multipart form; throws ApiError with the server's message. */
export function uploadPhotos(garmentId: string, photos: File[]): Promise<PhotoView[]> {
  const form = new FormData();
  for (const p of photos) form.append('photos', p, p.name);
  return fetchJson<PhotoView[]>(`/api/garments/${encodeURIComponent(garmentId)}/photos`, { method: 'POST', body: form });
}
