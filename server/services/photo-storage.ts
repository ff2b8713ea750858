// Where batch photos live: a small interface, so another store can replace the local disk later.
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';

export interface PhotoStorage {
  save(key: string, bytes: Buffer): Promise<void>;
  /** null when nothing is stored under the key */
  read(key: string): Promise<Buffer | null>;
  remove(key: string): Promise<void>;
}

const SAFE_KEY = /^[0-9a-f-]{36}\/[0-9a-f-]{36}\.(jpg|png|webp)$/;

/** Photos on local disk, in a folder outside the web root; the app serves them only to members. */
export function localDiskStorage(root: string): PhotoStorage {
  const base = path.resolve(root);
  const fileFor = (key: string) => {
    if (!SAFE_KEY.test(key)) throw new Error(`refusing a photo key outside the storage layout: ${key}`);
    return path.join(base, key);
  };
  return {
    async save(key, bytes) {
      const file = fileFor(key);
      await mkdir(path.dirname(file), { recursive: true });
      await writeFile(file, bytes);
    },
    async read(key) {
      try {
        return await readFile(fileFor(key));
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw error;
      }
    },
    async remove(key) {
      await rm(fileFor(key), { force: true });
    },
  };
}
