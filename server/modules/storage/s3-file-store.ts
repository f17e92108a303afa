// FileStore in an S3-compatible bucket (AWS S3, or MinIO, Garage, R2... through S3_ENDPOINT),
// for shops that run more than one server or keep no local disk. Same keys as the disk store,
// optionally under a prefix; the content type travels as the object's Content-Type.
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';
import { checkKey, type FileStore } from './file-store.ts';

export interface S3FileStoreOptions {
  bucket: string;
  region: string;
  /** Only for services other than AWS: their address (requests then use path-style URLs). */
  endpoint?: string | undefined;
  /** Without them the SDK's usual sources apply (AWS_* environment, instance or task role). */
  accessKeyId?: string | undefined;
  secretAccessKey?: string | undefined;
  /** Put every key under this folder of the bucket, e.g. "latchet/". */
  prefix?: string;
}

/** The object is not there; a missing bucket (also 404) is a setup fault and must throw. */
function isMissing(err: unknown): boolean {
  return err instanceof S3ServiceException && err.name === 'NoSuchKey';
}

export function s3FileStore(options: S3FileStoreOptions): FileStore {
  const client = new S3Client({
    region: options.region,
    ...(options.endpoint
      ? {
          endpoint: options.endpoint,
          forcePathStyle: true,
          // Many S3-compatible services do not accept the SDK's newer default checksums
          // (CRC32 headers on every upload); ask for them only where S3 requires them.
          requestChecksumCalculation: 'WHEN_REQUIRED' as const,
          responseChecksumValidation: 'WHEN_REQUIRED' as const,
        }
      : {}),
    ...(options.accessKeyId && options.secretAccessKey
      ? { credentials: { accessKeyId: options.accessKeyId, secretAccessKey: options.secretAccessKey } }
      : {}),
  });
  const Bucket = options.bucket;
  const keyOf = (key: string) => `${options.prefix ?? ''}${checkKey(key)}`;

  return {
    async put(key, body, contentType) {
      // S3 replaces an object whole or not at all: a failed upload never leaves half a photo.
      await client.send(new PutObjectCommand({ Bucket, Key: keyOf(key), Body: body, ContentType: contentType, ContentLength: body.length }));
    },
    async get(key) {
      try {
        const res = await client.send(new GetObjectCommand({ Bucket, Key: keyOf(key) }));
        const bytes = await res.Body!.transformToByteArray();
        return { body: Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength), contentType: res.ContentType ?? 'application/octet-stream' };
      } catch (err) {
        if (isMissing(err)) return null;
        throw err;
      }
    },
    async delete(key) {
      // S3 answers 204 for a key that is not there, like the disk store's rm --force.
      await client.send(new DeleteObjectCommand({ Bucket, Key: keyOf(key) }));
    },
  };
}
