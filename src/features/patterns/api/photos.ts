import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { PhotoView } from '@shared/schemas/order-views.ts';
import type { PhotoUpload } from '@/components/photos/photo-panel.tsx';
import { api } from '@/lib/api-client.ts';
import { uploadWithProgress } from '@/lib/upload-with-progress.ts';
import { patternKeys } from './queries.ts';

/** Under the pattern's detail key, so anything that refreshes the pattern refreshes these too. */
const photoKey = (patternId: number) => [...patternKeys.detail(patternId), 'photos'] as const;

export const patternPhotosQueryOptions = (patternId: number) =>
  queryOptions({
    queryKey: photoKey(patternId),
    queryFn: async () => (await api.get<{ items: PhotoView[] }>(`/api/patterns/${patternId}/photos`)).items,
  });

/** Uploads one photo of a finished piece to the pattern, reporting progress while it goes. */
export function useUploadPatternPhoto(patternId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, caption, onProgress }: PhotoUpload) => {
      const body = new FormData();
      body.append('caption', caption);
      body.append('file', file);
      return uploadWithProgress<{ photo: PhotoView }>(`/api/patterns/${patternId}/photos`, body, onProgress);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: photoKey(patternId) }),
  });
}

export function useDeletePatternPhoto(patternId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: number) => api.delete<unknown>(`/api/patterns/${patternId}/photos/${photoId}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: photoKey(patternId) }),
  });
}
