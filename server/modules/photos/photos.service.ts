// Photos of orders and patterns: checked by their bytes, stored through the FileStore under
// generated names with a thumbnail, listed and served to the shop's members (and to the
// order's proof link), deleted with a record in the audit trail and the order's history.
import { randomBytes } from 'node:crypto';
import { writeTransaction } from '../../db/write-transaction.ts';
import { HttpError, notFound } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import type { OrdersDeps } from '../orders/orders.service.ts';
import { createOrdersRepository, type ListedOrderRow } from '../orders/orders.repository.ts';
import { idParam, patternOr404 } from '../patterns/pattern-access.ts';
import type { FileStore } from '../storage/file-store.ts';
import { checkPhoto } from './photo-check.ts';
import { photoView } from './photo-view.ts';
import { createPhotosRepository, type PhotoOwner } from './photos.repository.ts';

export type PhotoTarget = 'orders' | 'patterns';

export function createPhotosService(deps: OrdersDeps & { fileStore: FileStore }, orderOr404: (shopId: number, raw: string | undefined) => Promise<ListedOrderRow>) {
  const { db, now, fileStore, config, repos } = deps;
  const photos = createPhotosRepository(db);
  const orders = createOrdersRepository(db);

  /** The order or pattern of the asker's shop the photo belongs to (404 otherwise). */
  async function ownerOf(auth: AuthContext, target: PhotoTarget, raw: string | undefined): Promise<PhotoOwner & { label: string }> {
    if (target === 'orders') {
      const o = await orderOr404(auth.shop.id, raw);
      return { orderId: o.id, label: `order ${o.number}` };
    }
    const p = await patternOr404(repos.patterns, raw, auth.shop.id);
    return { patternId: p.id, label: p.name };
  }
  async function photoOr404(owner: PhotoOwner, raw: string | undefined) {
    const id = idParam(raw);
    const row = id === null ? undefined : await photos.one(owner, id);
    if (!row) throw notFound('photo');
    return row;
  }

  return {
    async list(auth: AuthContext, target: PhotoTarget, raw: string | undefined) {
      const owner = await ownerOf(auth, target, raw);
      return { items: (await photos.list(owner)).map((p) => photoView(p)) };
    },

    async upload(auth: AuthContext, target: PhotoTarget, raw: string | undefined, file: Buffer, caption: string) {
      const owner = await ownerOf(auth, target, raw);
      if ((await photos.count(owner)) >= config.photosPerItemMax) {
        throw new HttpError(409, 'too_many_photos', `This ${target === 'orders' ? 'order' : 'pattern'} has ${config.photosPerItemMax} photos already, the most it may have; delete one first.`, { file: `At most ${config.photosPerItemMax} photos` });
      }
      const checked = await checkPhoto(file);
      const name = randomBytes(16).toString('hex');
      const key = `photos/${auth.shop.id}/${name}.${checked.ext}`;
      const thumbKey = `photos/${auth.shop.id}/${name}-thumb.jpg`;
      try {
        await fileStore.put(key, checked.body, checked.contentType);
        await fileStore.put(thumbKey, checked.thumb, 'image/jpeg');
        const id = await writeTransaction(db, async (trx) => {
          const t = now();
          const photoId = await photos.insert(trx, {
            shop_id: auth.shop.id,
            order_id: 'orderId' in owner ? owner.orderId : null,
            pattern_id: 'patternId' in owner ? owner.patternId : null,
            storage_key: key,
            thumb_key: thumbKey,
            content_type: checked.contentType,
            byte_size: checked.body.length,
            width_px: checked.widthPx,
            height_px: checked.heightPx,
            caption,
            created_by: auth.user.id,
            created_at: t,
          });
          if ('orderId' in owner) await orders.record(trx, { order_id: owner.orderId, user_id: auth.user.id, kind: 'photo-added', summary: `Photo added${caption ? `: ${caption}` : ''}.`, at: t });
          else await repos.audit.record(trx, { shopId: auth.shop.id, patternId: owner.patternId, userId: auth.user.id, action: 'photo.added', detail: { photoId } });
          return photoId;
        });
        return { photo: photoView((await photos.one(owner, id))!) };
      } catch (err) {
        // Nothing stays behind when a file or the row could not be written.
        await fileStore.delete(key).catch(() => undefined);
        await fileStore.delete(thumbKey).catch(() => undefined);
        throw err;
      }
    },

    /** The photo's bytes (or its thumbnail's) for a member of the shop. */
    async file(auth: AuthContext, target: PhotoTarget, raw: string | undefined, rawPhoto: string | undefined, thumb: boolean) {
      const owner = await ownerOf(auth, target, raw);
      return this.fileOf(owner, rawPhoto, thumb);
    },

    /** The photo's bytes when it belongs to `owner` (also used by proof links for their order). */
    async fileOf(owner: PhotoOwner, rawPhoto: string | undefined, thumb: boolean) {
      const row = await photoOr404(owner, rawPhoto);
      const stored = await fileStore.get(thumb ? row.thumb_key : row.storage_key);
      if (!stored) throw notFound('photo');
      const ext = thumb ? 'jpg' : row.storage_key.split('.').pop();
      return { ...stored, fileName: `photo-${row.id}${thumb ? '-thumb' : ''}.${ext}` };
    },

    async remove(auth: AuthContext, target: PhotoTarget, raw: string | undefined, rawPhoto: string | undefined) {
      const owner = await ownerOf(auth, target, raw);
      const row = await photoOr404(owner, rawPhoto);
      await writeTransaction(db, async (trx) => {
        const t = now();
        await photos.remove(trx, row.id);
        await repos.audit.record(trx, { shopId: auth.shop.id, patternId: row.pattern_id, userId: auth.user.id, action: 'photo.deleted', detail: { photoId: row.id, orderId: row.order_id, caption: row.caption } });
        if ('orderId' in owner) await orders.record(trx, { order_id: owner.orderId, user_id: auth.user.id, kind: 'photo-deleted', summary: `Photo deleted${row.caption ? `: ${row.caption}` : ''}.`, at: t });
      });
      // After commit: a crash here leaves an unreferenced file, never a row without its file.
      await fileStore.delete(row.storage_key);
      await fileStore.delete(row.thumb_key);
    },
  };
}
export type PhotosService = ReturnType<typeof createPhotosService>;
