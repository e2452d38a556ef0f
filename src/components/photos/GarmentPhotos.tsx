// Fitting photos of one garment: thumbnails, and taking or choosing more from a phone or tablet.
import { QueryClientContext, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useContext, useId, type ChangeEvent } from 'react';
import { FormMessage } from '@/components/Field';
import { withQuery } from '@/components/WithQuery';
import { fetchJson } from '@/lib/shared/fetch-json';
import { PHOTO_ACCEPT, type PhotoList } from '@/lib/shared/photo-view';
import { PhotoThumb } from './PhotoThumb';
import { uploadPhotos } from './upload-photos';

interface Props {
  garmentId: string;
  /** shows the camera, file and remove buttons */
  canUpload: boolean;
}

const PICK =
  'inline-flex min-h-11 cursor-pointer items-center justify-center rounded-md border-2 px-4 text-lg font-semibold has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent';

function Photos({ garmentId, canUpload }: Props) {
  const key = ['photos', garmentId];
  const client = useQueryClient();
  const list = useQuery({ queryKey: key, queryFn: () => fetchJson<PhotoList>(`/api/garments/${encodeURIComponent(garmentId)}/photos`) });
  const upload = useMutation({ mutationFn: (files: File[]) => uploadPhotos(garmentId, files), onSuccess: () => client.invalidateQueries({ queryKey: key }) });
  const remove = useMutation({
    mutationFn: (id: string) => fetchJson(`/api/photos/${id}`, { method: 'DELETE' }),
    onSuccess: () => client.invalidateQueries({ queryKey: key }),
  });
  const ids = useId();
  const chosen = (e: ChangeEvent<HTMLInputElement>) => {
    const files = [...(e.target.files ?? [])];
    e.target.value = '';
    if (files.length) upload.mutate(files);
  };
  const maxMb = list.data ? Math.floor(list.data.maxBytes / (1024 * 1024)) : null;
  return (
    <section aria-labelledby={`${ids}-h`} className="flex flex-col gap-3">
      <h2 id={`${ids}-h`} className="text-2xl font-extrabold">
        Fitting photos
      </h2>
      {list.isPending && <p className="text-muted">Loading photos…</p>}
      {list.isError && <FormMessage kind="error">Photos could not be loaded: {list.error.message}</FormMessage>}
      {list.data && list.data.photos.length === 0 && <p className="text-muted">No photos of this garment yet.</p>}
      {list.data && list.data.photos.length > 0 && (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4">
          {list.data.photos.map((p) => (
            <PhotoThumb key={p.id} photo={p} onRemove={canUpload ? () => window.confirm(`Remove ${p.name}?`) && remove.mutate(p.id) : undefined} />
          ))}
        </ul>
      )}
      {canUpload && (
        <div className="flex flex-col gap-2">
          <div className="flex flex-wrap gap-3">
            <label className={`${PICK} border-accent bg-accent text-white`}>
              Take a photo
              <input type="file" accept="image/*" capture="environment" multiple onChange={chosen} className="sr-only" />
            </label>
            <label className={`${PICK} border-ink bg-card text-ink`}>
              Choose photos
              <input type="file" accept={PHOTO_ACCEPT} multiple onChange={chosen} className="sr-only" />
            </label>
          </div>
          <p className="text-sm text-muted">
            JPEG, PNG, WebP or HEIC{maxMb ? `, up to ${maxMb} MB each` : ''}. Photos are kept without the location and other details the camera writes into
            them. HEIC photos get no preview here (a tile says so): open them on a device that reads HEIC.
          </p>
          {upload.isPending && (
            <p role="status" className="font-semibold">
              Uploading…
            </p>
          )}
          {upload.isError && <FormMessage kind="error">{upload.error.message}</FormMessage>}
          {upload.isSuccess && <FormMessage kind="ok">{upload.data.length === 1 ? 'Photo added.' : `${upload.data.length} photos added.`}</FormMessage>}
          {remove.isError && <FormMessage kind="error">{remove.error.message}</FormMessage>}
        </div>
      )}
    </section>
  );
}

const PhotosWithOwnClient = withQuery(Photos);

/** A garment's fitting photos; works inside another island's query client or on its own. */
export function GarmentPhotos(props: Props) {
  const client = useContext(QueryClientContext);
  return client ? <Photos {...props} /> : <PhotosWithOwnClient {...props} />;
}

export default GarmentPhotos;
