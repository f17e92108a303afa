import { useRef, useState } from 'react';
import type { UseMutationResult } from '@tanstack/react-query';
import type { PhotoView } from '@shared/schemas/order-views.ts';
import { PHOTO_TYPES } from '@shared/schemas/orders.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { isApiError } from '@/lib/api-client.ts';

/** What an upload sends: the file, its caption, and where to report progress (0..1). */
export interface PhotoUpload {
  file: File;
  caption: string;
  onProgress: (fraction: number) => void;
}

export interface PhotoPanelProps {
  /** Makes the file input's id unique on the page (e.g. "order-12"). */
  ownerKey: string;
  photos: PhotoView[];
  canUpload: boolean;
  canDelete: boolean;
  /** The owner's upload and delete mutations (orders and patterns post to their own routes). */
  upload: UseMutationResult<unknown, Error, PhotoUpload>;
  remove: UseMutationResult<unknown, Error, number>;
  /** Test id of the thumbnail list. */
  listTestId?: string;
  /** 'column' (default) fills a side column; 'wide' is for a full-width panel: small thumbnails
   *  in as many columns as fit, and an upload form that does not stretch across the page. */
  layout?: 'column' | 'wide';
}

/** Words for the refusals a person can fix (the server's message says the limit). */
function uploadError(err: unknown): string {
  if (isApiError(err, 415)) return `${err.message} Choose a JPEG, PNG or WebP photo.`;
  if (isApiError(err, 413)) return `${err.message} Choose a smaller photo.`;
  return err instanceof Error ? err.message : 'The photo did not upload.';
}

/** Photos of an order or a pattern: upload with progress, thumbnails that open the full photo, delete after asking. */
export function PhotoPanel({ ownerKey, photos, canUpload, canDelete, upload, remove, listTestId, layout = 'column' }: PhotoPanelProps) {
  const fileInput = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [caption, setCaption] = useState('');
  const [progress, setProgress] = useState(0);
  const [asking, setAsking] = useState<number | null>(null);

  const send = () => {
    if (!file) return;
    setProgress(0);
    upload.mutate(
      { file, caption, onProgress: setProgress },
      {
        onSuccess: () => {
          setFile(null);
          setCaption('');
          if (fileInput.current) fileInput.current.value = '';
        },
      },
    );
  };

  return (
    <div className="grid gap-4">
      {photos.length === 0 ? (
        <p className="text-sm text-hide-600">No photos yet.</p>
      ) : (
        <ul className={layout === 'wide' ? 'grid grid-cols-[repeat(auto-fill,minmax(8.5rem,1fr))] gap-3' : 'grid grid-cols-2 gap-3 sm:grid-cols-3'} data-testid={listTestId}>
          {photos.map((p) => (
            <li key={p.id} className="grid gap-1">
              <a href={p.url} target="_blank" rel="noreferrer" className="block overflow-hidden rounded-md border border-hide-200 bg-white">
                <img src={p.thumbUrl} alt={p.caption || `Photo ${p.id}`} className="aspect-square w-full object-cover" loading="lazy" />
              </a>
              {p.caption && <p className="truncate text-xs text-hide-700">{p.caption}</p>}
              {canDelete &&
                (asking === p.id ? (
                  <div className="flex flex-wrap gap-1" role="group" aria-label="Delete this photo?">
                    <Button size="sm" variant="danger" className="h-7 px-2 text-xs" busy={remove.isPending} onClick={() => remove.mutate(p.id, { onSettled: () => setAsking(null) })}>
                      Delete photo
                    </Button>
                    <Button size="sm" variant="ghost" className="h-7 px-2 text-xs" onClick={() => setAsking(null)}>
                      Keep
                    </Button>
                  </div>
                ) : (
                  <Button size="sm" variant="ghost" className="h-7 justify-start px-2 text-xs" onClick={() => setAsking(p.id)} aria-label={`Delete photo ${p.caption || p.id}`}>
                    Delete…
                  </Button>
                ))}
            </li>
          ))}
        </ul>
      )}
      {remove.isError && (
        <Notice tone="danger" role="alert" title="The photo was not deleted">
          {remove.error.message}
        </Notice>
      )}
      {canUpload && (
        <div className={layout === 'wide' ? 'grid max-w-xl gap-3 border-t border-hide-100 pt-3' : 'grid gap-3 border-t border-hide-100 pt-3'}>
          <div className="flex flex-col gap-1">
            <label htmlFor={`photo-file-${ownerKey}`} className="text-sm font-medium text-hide-900">
              Photo <span className="font-normal text-hide-600">(JPEG, PNG or WebP)</span>
            </label>
            <input
              id={`photo-file-${ownerKey}`}
              ref={fileInput}
              type="file"
              accept={PHOTO_TYPES.join(',')}
              className="block w-full min-w-0 text-sm file:mr-3 file:rounded-md file:border-0 file:bg-hide-100 file:px-3 file:py-2 file:text-hide-900"
              onChange={(e) => {
                upload.reset();
                setFile(e.target.files?.[0] ?? null);
              }}
            />
          </div>
          <TextField label="Caption" value={caption} maxLength={200} onChange={(e) => setCaption(e.target.value)} />
          <div className="flex flex-wrap items-center gap-3">
            <Button variant="secondary" disabled={!file} busy={upload.isPending} onClick={send}>
              Upload photo
            </Button>
            {upload.isPending && (
              <div className="flex min-w-40 flex-1 items-center gap-2">
                <progress className="h-2 w-full accent-hide-700" max={1} value={progress} aria-label="Upload progress" />
                <span className="text-xs tabular-nums text-hide-700">{Math.round(progress * 100)} %</span>
              </div>
            )}
            {upload.isSuccess && (
              <p role="status" className="text-sm text-moss-700">
                Photo added.
              </p>
            )}
          </div>
          {upload.isError && (
            <Notice tone="danger" role="alert" title="The photo was not added">
              {uploadError(upload.error)}
            </Notice>
          )}
        </div>
      )}
    </div>
  );
}
