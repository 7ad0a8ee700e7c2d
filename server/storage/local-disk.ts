import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { FileStorage } from './storage';

/** Files under a folder outside the web root; the content type travels in a sidecar file. */
export function localDiskStorage(root: string): FileStorage {
  const base = path.resolve(root);
  const fileOf = (key: string) => {
    const file = path.resolve(base, key);
    if (!file.startsWith(base + path.sep)) throw new Error(`storage key escapes the upload folder: ${key}`);
    return file;
  };
  return {
    async put(key, body, contentType) {
      const file = fileOf(key);
      await mkdir(path.dirname(file), { recursive: true });
      await writeFile(file, body);
      await writeFile(`${file}.type`, contentType);
    },
    async get(key) {
      const file = fileOf(key);
      try {
        const [body, contentType] = await Promise.all([readFile(file), readFile(`${file}.type`, 'utf8')]);
        return { body, contentType };
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw error;
      }
    },
    async delete(key) {
      const file = fileOf(key);
      await rm(file, { force: true });
      await rm(`${file}.type`, { force: true });
    },
  };
}
