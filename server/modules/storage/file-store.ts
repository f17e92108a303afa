// One storage module for uploaded files (photos and their thumbnails), so object storage can
// replace the disk without touching the code that uploads or serves. Keys are names we
// generate ("photos/12/3f9c...e1.jpg"); never a name a person typed.

/** Where uploaded files live: the disk (disk-file-store.ts) or an S3-compatible bucket. */
export interface FileStore {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<{ body: Buffer; contentType: string } | null>;
  delete(key: string): Promise<void>;
}

/** Keys are lower-case letters, digits, '-', '_', '.', and '/' between parts; no '..', no leading '/'. */
export function checkKey(key: string): string {
  if (!/^[a-z0-9_-]+(?:\.[a-z0-9]+)?(?:\/[a-z0-9_-]+(?:\.[a-z0-9]+)?)*$/.test(key) || key.length > 200) {
    throw new Error(`file store: refused key ${JSON.stringify(key)}`);
  }
  return key;
}
