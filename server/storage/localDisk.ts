import { randomBytes } from 'node:crypto';
import { mkdir, open, readFile, rename, rm } from 'node:fs/promises';
import path from 'node:path';
import { assertStorageKey, contentTypeForKey, InvalidStorageKeyError } from './keys';
import type { BlobStorage, StoredBlob } from './types';

function isMissing(err: unknown): boolean {
  return (err as NodeJS.ErrnoException).code === 'ENOENT';
}

/**
 * Files under one folder on the local disk. The content type is implied by the key's extension,
 * so there are no side files to keep in step.
 */
export class LocalDiskStorage implements BlobStorage {
  private readonly root: string;

  constructor(directory: string) {
    this.root = path.resolve(directory);
  }

  /** The file for `key`; the pattern already forbids traversal, the prefix check is a second lock. */
  private pathFor(key: string): string {
    assertStorageKey(key);
    const file = path.resolve(this.root, key);
    if (!file.startsWith(this.root + path.sep)) throw new InvalidStorageKeyError(key);
    return file;
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    const file = this.pathFor(key);
    if (contentTypeForKey(key) !== contentType) {
      throw new Error(`content type ${contentType} does not match the extension of ${key}`);
    }
    await mkdir(path.dirname(file), { recursive: true });
    // Write beside the target, flush, then rename: a reader sees the old file or the whole new
    // one, never a half-written photo, even if the process dies mid-write.
    const temp = `${file}.${randomBytes(6).toString('hex')}.tmp`;
    try {
      const handle = await open(temp, 'wx', 0o644);
      try {
        await handle.writeFile(body);
        await handle.sync();
      } finally {
        await handle.close();
      }
      await rename(temp, file);
    } catch (err) {
      await rm(temp, { force: true });
      throw err;
    }
  }

  async get(key: string): Promise<StoredBlob | null> {
    const file = this.pathFor(key);
    try {
      return { body: await readFile(file), contentType: contentTypeForKey(key) };
    } catch (err) {
      if (isMissing(err)) return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathFor(key), { force: true });
  }
}
