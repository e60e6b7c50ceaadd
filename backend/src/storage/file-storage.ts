import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import fsp from 'node:fs/promises';
import path from 'node:path';
import type { Readable } from 'node:stream';

/**
 * Where uploaded files live. Metadata stays in PostgreSQL; only bytes go here, under keys the caller chooses,
 * so an object store can replace the local folder without touching the services.
 */
export interface FileStorage {
  /** Stores the bytes atomically: a reader never sees half a file under the key. */
  put(key: string, data: Uint8Array): Promise<void>;
  read(key: string): Promise<Buffer>;
  stream(key: string): Readable;
  exists(key: string): Promise<boolean>;
  /** Removes the file; a missing one is not an error. */
  remove(key: string): Promise<void>;
}

const SAFE_KEY = /^[a-z0-9][a-z0-9/_.-]{0,199}$/;

/** Files in a local folder (git-ignored under .data/ by default). */
export function localFileStorage(root: string): FileStorage {
  const resolve = (key: string) => {
    // Keys are ours (hashes), but a path outside the root must never be reachable even by mistake.
    if (!SAFE_KEY.test(key) || key.includes('..')) throw new Error(`Unsafe storage key "${key}"`);
    return path.join(root, key);
  };
  return {
    async put(key, data) {
      const target = resolve(key);
      await fsp.mkdir(path.dirname(target), { recursive: true });
      const temp = `${target}.${randomUUID()}.part`;
      try {
        await fsp.writeFile(temp, data);
        await fsp.rename(temp, target);
      } catch (err) {
        await fsp.rm(temp, { force: true });
        throw err;
      }
    },
    read: (key) => fsp.readFile(resolve(key)),
    stream: (key) => fs.createReadStream(resolve(key)),
    async exists(key) {
      return fsp.access(resolve(key)).then(
        () => true,
        () => false,
      );
    },
    async remove(key) {
      await fsp.rm(resolve(key), { force: true });
    },
  };
}
