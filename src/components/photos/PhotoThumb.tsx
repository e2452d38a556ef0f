import { useState } from 'react';
import { dateTimeText } from '@/lib/shared/date-text';
import type { PhotoView } from '@/lib/shared/photo-view';

/** One thumbnail linking to the full photo, with a remove button when allowed. */
export function PhotoThumb({ photo, onRemove }: { photo: PhotoView; onRemove?: () => void }) {
  const [broken, setBroken] = useState(false);
  const taken = dateTimeText(photo.createdAt);
  return (
    <li className="flex flex-col gap-1 rounded-md border-2 border-rule bg-card p-2">
      <a href={photo.url} target="_blank" rel="noopener" className="block aspect-[4/3] overflow-hidden rounded bg-paper">
        {broken ? (
          <span className="flex h-full items-center justify-center p-2 text-center text-sm text-muted">{photo.name} (open to view)</span>
        ) : (
          <img
            src={photo.thumbUrl}
            alt={photo.hasThumb ? `Fitting photo ${photo.name}` : `Fitting photo ${photo.name}: no preview here, open to view`}
            loading="lazy"
            onError={() => setBroken(true)}
            className={`h-full w-full ${photo.hasThumb ? 'object-cover' : 'object-contain'}`}
          />
        )}
      </a>
      <span className="truncate text-sm" title={photo.name}>
        {photo.name}
      </span>
      {!photo.hasThumb && <span className="text-sm font-semibold">No preview on this screen: open it on a device that reads HEIC.</span>}
      <span className="text-xs text-muted">
        {taken}
        {photo.uploadedBy ? ` · ${photo.uploadedBy}` : ''}
      </span>
      {onRemove && (
        <button
          type="button"
          aria-label={`Remove: ${photo.name}`}
          onClick={onRemove}
          className="min-h-11 rounded border-2 border-cut px-3 font-semibold text-cut"
        >
          Remove
        </button>
      )}
    </li>
  );
}
