import { useQuery } from '@tanstack/react-query';
import { PhotoPanel } from '@/components/photos/photo-panel.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { patternPhotosQueryOptions, useDeletePatternPhoto, useUploadPatternPhoto } from '../api/photos.ts';

/**
 * Photos of pieces made from this pattern. Everyone in the shop sees them; who may add or
 * delete follows the permission table (the caller passes what `can` says).
 */
export function PatternPhotos({ patternId, canUpload, canDelete }: { patternId: number; canUpload: boolean; canDelete: boolean }) {
  const list = useQuery(patternPhotosQueryOptions(patternId));
  const upload = useUploadPatternPhoto(patternId);
  const remove = useDeletePatternPhoto(patternId);
  const photos = list.data ?? [];
  return (
    <Panel title={list.data ? `Photos (${photos.length})` : 'Photos'}>
      {list.isPending ? (
        <p className="text-sm text-hide-600">Loading photos…</p>
      ) : list.isError ? (
        <Notice tone="danger" role="alert" title="The photos could not be loaded">
          {list.error.message}
        </Notice>
      ) : (
        <PhotoPanel ownerKey={`pattern-${patternId}`} photos={photos} canUpload={canUpload} canDelete={canDelete} upload={upload} remove={remove} listTestId="pattern-photos" layout="wide" />
      )}
    </Panel>
  );
}
