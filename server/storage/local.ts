import { randomBytes } from 'node:crypto';
import { promises as fs } from 'node:fs';
import path from 'node:path';
import type { StorageAdapter } from './index';
import { assertStorageKey } from './key';

/** Files under `dir`, which must lie outside any folder Express serves statically. */
export function createLocalStorage(dir: string): StorageAdapter {
  const root = path.resolve(dir);

  function resolveKey(key: string): string {
    assertStorageKey(key);
    const target = path.resolve(root, key);
    // Belt and braces beside the key check: the target must stay inside the root.
    if (!target.startsWith(root + path.sep))
      throw new Error(`Storage key escapes its folder: ${key}`);
    return target;
  }

  return {
    async put(key, body) {
      const target = resolveKey(key);
      await fs.mkdir(path.dirname(target), { recursive: true });
      // Write beside the target and rename, so a reader never sees half a file.
      const temp = `${target}.${randomBytes(6).toString('hex')}.tmp`;
      try {
        await fs.writeFile(temp, body, { flag: 'wx' });
        await fs.rename(temp, target);
      } catch (err) {
        await fs.rm(temp, { force: true });
        throw err;
      }
    },

    async get(key) {
      try {
        return await fs.readFile(resolveKey(key));
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw err;
      }
    },

    async delete(key) {
      await fs.rm(resolveKey(key), { force: true });
    },
  };
}
