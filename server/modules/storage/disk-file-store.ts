// FileStore on the local disk: files under one folder outside the web root (config
// UPLOAD_DIR, default data/uploads), each beside a small ".type" file holding its content
// type. Writes go to a temporary name and are renamed, so a crash never leaves half a photo
// under a real key.
import { randomBytes } from 'node:crypto';
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import { dirname, join, resolve, sep } from 'node:path';
import { checkKey, type FileStore } from './file-store.ts';

export function diskFileStore(rootDir: string): FileStore {
  const root = resolve(rootDir);
  const pathOf = (key: string) => {
    const p = resolve(join(root, checkKey(key)));
    if (!p.startsWith(root + sep)) throw new Error(`file store: key outside the folder: ${key}`);
    return p;
  };
  const isMissing = (e: unknown) => (e as NodeJS.ErrnoException).code === 'ENOENT';

  return {
    async put(key, body, contentType) {
      const p = pathOf(key);
      await mkdir(dirname(p), { recursive: true });
      const tmp = `${p}.${randomBytes(6).toString('hex')}.tmp`;
      await writeFile(`${p}.type`, contentType);
      await writeFile(tmp, body);
      await rename(tmp, p);
    },
    async get(key) {
      const p = pathOf(key);
      try {
        const [body, contentType] = await Promise.all([readFile(p), readFile(`${p}.type`, 'utf8')]);
        return { body, contentType };
      } catch (e) {
        if (isMissing(e)) return null;
        throw e;
      }
    },
    async delete(key) {
      const p = pathOf(key);
      await rm(p, { force: true });
      await rm(`${p}.type`, { force: true });
    },
  };
}
