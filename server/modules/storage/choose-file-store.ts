// Which FileStore the app uses: an S3-compatible bucket when S3_BUCKET is set, else the disk.
import type { Config } from '../../config.ts';
import { diskFileStore } from './disk-file-store.ts';
import type { FileStore } from './file-store.ts';
import { s3FileStore } from './s3-file-store.ts';

export function fileStoreFor(config: Pick<Config, 's3' | 'uploadDir'>): FileStore {
  return config.s3 ? s3FileStore(config.s3) : diskFileStore(config.uploadDir);
}
