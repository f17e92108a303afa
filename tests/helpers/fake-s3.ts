// A local S3-compatible server (s3rver) on 127.0.0.1 and a free port, keeping its objects in a
// temporary folder, with one empty bucket: for the S3 file store's tests. It knows one access
// key id (S3RVER) and refuses others; it does not verify SigV4 signatures themselves.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';

export interface FakeS3 {
  endpoint: string;
  bucket: string;
  region: string;
  /** s3rver's fixed credentials. */
  accessKeyId: string;
  secretAccessKey: string;
  close(): Promise<void>;
}

export async function startFakeS3(bucket = 'latchet-test-uploads'): Promise<FakeS3> {
  const directory = mkdtempSync(join(tmpdir(), 'latchet-s3-'));
  const server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory, configureBuckets: [{ name: bucket }] });
  const { port } = await server.run();
  return {
    endpoint: `http://127.0.0.1:${port}`,
    bucket,
    region: 'us-east-1',
    accessKeyId: 'S3RVER',
    secretAccessKey: 'S3RVER',
    async close() {
      await server.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}
