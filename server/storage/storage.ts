import { randomBytes } from 'node:crypto';
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';

/**
 * Where uploaded bytes live. One interface (PRODUCT.md §7); the default keeps files on local disk under
 * data/uploads; another backend (an object store) implements the same three calls.
 */
export interface FileStorage {
  put(key: string, data: Buffer): Promise<void>;
  /** null when there is no such file. */
  get(key: string): Promise<Buffer | null>;
  /** Deleting a missing key is not an error. */
  delete(key: string): Promise<void>;
}

/** Keys are made by the server, never from a file name: lower-case letters, digits and dashes, one dot. */
const KEY = /^[a-z0-9][a-z0-9-]{0,150}(\.[a-z0-9]{1,8})?$/;

export function newStorageKey(prefix: string, extension: string): string {
  return `${prefix}-${randomBytes(16).toString('hex')}.${extension}`;
}

export function assertStorageKey(key: string): void {
  if (!KEY.test(key)) throw new Error(`invalid storage key "${key}"`);
}

/** Files on local disk; a key is a file name directly under `root` (no folders, so no path can escape it). */
export class LocalDiskStorage implements FileStorage {
  constructor(readonly root: string) {}

  private pathOf(key: string): string {
    assertStorageKey(key);
    return path.join(this.root, key);
  }

  async put(key: string, data: Buffer): Promise<void> {
    const file = this.pathOf(key);
    await mkdir(this.root, { recursive: true });
    // Written beside, then renamed: a reader never sees half a file.
    const tmp = `${file}.${randomBytes(6).toString('hex')}.part`;
    await writeFile(tmp, data, { mode: 0o600 });
    await rename(tmp, file);
  }

  async get(key: string): Promise<Buffer | null> {
    try {
      return await readFile(this.pathOf(key));
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }
}

/** In memory: for tests and apps built without a disk. */
export class MemoryStorage implements FileStorage {
  private readonly files = new Map<string, Buffer>();

  async put(key: string, data: Buffer): Promise<void> {
    assertStorageKey(key);
    this.files.set(key, Buffer.from(data));
  }
  async get(key: string): Promise<Buffer | null> {
    assertStorageKey(key);
    return this.files.get(key) ?? null;
  }
  async delete(key: string): Promise<void> {
    this.files.delete(key);
  }
  get size(): number {
    return this.files.size;
  }
}
