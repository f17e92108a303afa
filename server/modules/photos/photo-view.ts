// Photo rows -> PhotoView, with URLs under the route that may serve them (the order's, the
// pattern's, or a proof link's own).
import type { PhotoView } from '@shared/schemas/order-views.ts';
import { iso } from '../patterns/views.ts';
import type { PhotoRow } from './photos.repository.ts';

/** Where a photo is served from: `/api/orders/3/photos`, `/api/patterns/5/photos` or `/api/proof/<token>/photos`. */
export const photoBase = (row: PhotoRow) => (row.order_id !== null ? `/api/orders/${row.order_id}/photos` : `/api/patterns/${row.pattern_id}/photos`);

export function photoView(row: PhotoRow, base = photoBase(row)): PhotoView {
  return {
    id: row.id,
    caption: row.caption,
    contentType: row.content_type,
    byteSize: row.byte_size,
    widthPx: row.width_px,
    heightPx: row.height_px,
    createdAt: iso(row.created_at),
    by: row.created_by !== null ? { id: row.created_by, name: row.created_by_name ?? '' } : null,
    url: `${base}/${row.id}`,
    thumbUrl: `${base}/${row.id}/thumb`,
  };
}
