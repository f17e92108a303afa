// What every FileStore (server/modules/storage/file-store.ts) must do, as one suite that each
// implementation's test file runs against its own store: same answers on disk and in S3.
import { randomBytes } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import type { FileStore } from '../../server/modules/storage/file-store.ts';

export function fileStoreContract(name: string, store: () => FileStore): void {
  describe(`${name}: the FileStore contract`, () => {
    it('when a file is put, then get returns the same bytes and content type', async () => {
      const bytes = Buffer.from(Array.from({ length: 256 }, (_, i) => i)); // every byte value, NUL included
      await store().put('photos/1/every-byte.jpg', bytes, 'image/jpeg');
      const got = await store().get('photos/1/every-byte.jpg');
      expect(got?.contentType).toBe('image/jpeg');
      expect(got?.body.equals(bytes)).toBe(true);
    });

    it('when a 3 MB photo is put, then it comes back byte for byte', async () => {
      const big = randomBytes(3 * 1024 * 1024);
      await store().put('photos/2/large.png', big, 'image/png');
      expect((await store().get('photos/2/large.png'))?.body.equals(big)).toBe(true);
    });

    it('when a key was never put, then get answers null', async () => {
      expect(await store().get('photos/3/never-there.jpg')).toBeNull();
    });

    it('when the same key is put twice, then the second file and type replace the first', async () => {
      await store().put('photos/4/a.jpg', Buffer.from('first'), 'image/jpeg');
      await store().put('photos/4/a.jpg', Buffer.from('second'), 'image/webp');
      const got = await store().get('photos/4/a.jpg');
      expect(got?.body.toString()).toBe('second');
      expect(got?.contentType).toBe('image/webp');
    });

    it('when a file is deleted, then get answers null and its neighbours stay', async () => {
      await store().put('photos/5/a.jpg', Buffer.from('a'), 'image/jpeg');
      await store().put('photos/5/a-thumb.jpg', Buffer.from('t'), 'image/jpeg');
      await store().delete('photos/5/a.jpg');
      expect(await store().get('photos/5/a.jpg')).toBeNull();
      expect((await store().get('photos/5/a-thumb.jpg'))?.body.toString()).toBe('t');
    });

    it('when a key that was never put is deleted, then nothing fails', async () => {
      await expect(store().delete('photos/6/missing.jpg')).resolves.toBeUndefined();
    });

    it.each(['../outside.jpg', '/etc/passwd', 'photos/../../x.jpg', 'Photos/Upper.JPG', 'photos//double.jpg', ''])(
      'when the key is %j, then put, get and delete refuse it before touching storage',
      async (key) => {
        await expect(store().put(key, Buffer.from('x'), 'image/jpeg')).rejects.toThrow(/refused key/);
        await expect(store().get(key)).rejects.toThrow(/refused key/);
        await expect(store().delete(key)).rejects.toThrow(/refused key/);
      },
    );
  });
}
