import { randomUUID } from 'node:crypto';

/**
 * The only shape a storage key may have: a short lower-case folder, a slash, a random id and a
 * known image extension, e.g. `p/0b9c…e1.jpg`. No dots other than the extension's, no second
 * slash, no backslash: nothing a file system or an object store could read as another place.
 */
export const STORAGE_KEY_PATTERN = /^[a-z]{1,8}\/[A-Za-z0-9_-]{8,80}\.(jpg|png|webp|avif)$/;

const CONTENT_TYPES: Record<string, string> = {
  jpg: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
  avif: 'image/avif',
};

/** Thrown for a key the server did not generate: a bug or an attack, never a user mistake. */
export class InvalidStorageKeyError extends Error {
  constructor(key: string) {
    super(`invalid storage key ${JSON.stringify(key.slice(0, 120))}`);
    this.name = 'InvalidStorageKeyError';
  }
}

/** Throws InvalidStorageKeyError unless `key` matches STORAGE_KEY_PATTERN. */
export function assertStorageKey(key: string): void {
  if (typeof key !== 'string' || !STORAGE_KEY_PATTERN.test(key)) throw new InvalidStorageKeyError(String(key));
}

/** The content type a key's extension stands for (the local driver stores no side files). */
export function contentTypeForKey(key: string): string {
  assertStorageKey(key);
  return CONTENT_TYPES[key.slice(key.lastIndexOf('.') + 1)];
}

/** A fresh, unguessable key: `folder/<uuid>.ext` (122 random bits). */
export function newStorageKey(folder: string, ext: string, id: string = randomUUID()): string {
  const key = `${folder}/${id}.${ext}`;
  assertStorageKey(key);
  return key;
}
