import type { PhotoView } from '@shared/schemas/order-views.ts';
import { PhotoPanel as SharedPhotoPanel } from '@/components/photos/photo-panel.tsx';
import { useDeletePhoto, useUploadPhoto } from '../../api/mutations.ts';

/** The order's photos: the shared photo panel wired to the order's photo routes. */
export function PhotoPanel({ orderId, photos, canUpload, canDelete }: { orderId: number; photos: PhotoView[]; canUpload: boolean; canDelete: boolean }) {
  const upload = useUploadPhoto(orderId);
  const remove = useDeletePhoto(orderId);
  return <SharedPhotoPanel ownerKey={`order-${orderId}`} photos={photos} canUpload={canUpload} canDelete={canDelete} upload={upload} remove={remove} listTestId="order-photos" />;
}
