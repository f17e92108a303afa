// The disk store and the S3 store (against s3rver, a local S3-compatible server) pass the same
// FileStore contract; then what only S3 can get wrong: prefixes, refused credentials, the
// choice by configuration.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/config.ts';
import { fileStoreFor } from '../../server/modules/storage/choose-file-store.ts';
import { diskFileStore } from '../../server/modules/storage/disk-file-store.ts';
import type { FileStore } from '../../server/modules/storage/file-store.ts';
import { s3FileStore } from '../../server/modules/storage/s3-file-store.ts';
import { startFakeS3, type FakeS3 } from '../helpers/fake-s3.ts';
import { fileStoreContract } from './file-store-contract.ts';

let dir: string;
let disk: FileStore;
let s3: FakeS3;
let bucket: FileStore;
beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'latchet-files-'));
  disk = diskFileStore(dir);
  s3 = await startFakeS3();
  bucket = s3FileStore(s3);
});
afterAll(async () => {
  await s3?.close();
  rmSync(dir, { recursive: true, force: true });
});

fileStoreContract('disk', () => disk);
fileStoreContract('S3 (s3rver)', () => bucket);

describe('S3 file store', () => {
  it('when two stores share a bucket under different prefixes, then neither sees the other\'s files', async () => {
    const a = s3FileStore({ ...s3, prefix: 'shop-a/' });
    const b = s3FileStore({ ...s3, prefix: 'shop-b/' });
    await a.put('photos/1/p.jpg', Buffer.from('from a'), 'image/jpeg');
    expect(await b.get('photos/1/p.jpg')).toBeNull();
    expect((await a.get('photos/1/p.jpg'))?.body.toString()).toBe('from a');
  });

  it('when the access key is unknown to the service, then put fails loudly instead of pretending to store', async () => {
    const wrong = s3FileStore({ ...s3, accessKeyId: 'NOT-A-KEY' });
    await expect(wrong.put('photos/1/q.jpg', Buffer.from('x'), 'image/jpeg')).rejects.toThrow(/access key/i);
    expect(await bucket.get('photos/1/q.jpg')).toBeNull();
  });

  it('when the bucket does not exist, then get fails rather than answering "no such file"', async () => {
    const missing = s3FileStore({ ...s3, bucket: 'no-such-bucket' });
    await expect(missing.get('photos/1/p.jpg')).rejects.toThrow(/bucket/i);
  });
});

describe('choosing the store', () => {
  it('when S3_BUCKET is set, then uploads go to the bucket; without it, to UPLOAD_DIR on disk', async () => {
    const env = { DATABASE_FILE: join(dir, 'db.sqlite3'), UPLOAD_DIR: join(dir, 'uploads') };
    const viaS3 = fileStoreFor(loadConfig({ ...env, S3_BUCKET: s3.bucket, S3_ENDPOINT: s3.endpoint, S3_ACCESS_KEY_ID: s3.accessKeyId, S3_SECRET_ACCESS_KEY: s3.secretAccessKey }));
    await viaS3.put('photos/9/chosen.jpg', Buffer.from('in the bucket'), 'image/jpeg');
    expect((await bucket.get('photos/9/chosen.jpg'))?.body.toString()).toBe('in the bucket');

    const viaDisk = fileStoreFor(loadConfig(env));
    await viaDisk.put('photos/9/chosen.jpg', Buffer.from('on disk'), 'image/jpeg');
    expect((await diskFileStore(join(dir, 'uploads')).get('photos/9/chosen.jpg'))?.body.toString()).toBe('on disk');
  });
});
