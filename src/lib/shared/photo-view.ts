// What the photos API answers with, shared by the server and the photo island.

/** One fitting photo as listed. */
export interface PhotoView {
  id: string;
  /** the sanitised name it arrived with, for people only */
  name: string;
  mimeType: string;
  bytes: number;
  url: string;
  thumbUrl: string;
  /** false when no smaller copy could be made here (HEIC): the thumbnail is a placeholder tile */
  hasThumb: boolean;
  uploadedBy: string | null;
  createdAt: string;
}

/** GET /api/garments/[id]/photos. */
export interface PhotoList {
  photos: PhotoView[];
  maxBytes: number;
}

/** The image types the upload takes, for the file picker's accept list. */
export const PHOTO_ACCEPT = 'image/jpeg,image/png,image/webp,image/heic,image/heif';
