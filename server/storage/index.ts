import type { Config } from '../config';
import { LocalDiskStorage } from './localDisk';
import { S3Storage } from './s3';
import type { BlobStorage } from './types';

export type { BlobStorage, StoredBlob } from './types';
export { assertStorageKey, contentTypeForKey, InvalidStorageKeyError, newStorageKey, STORAGE_KEY_PATTERN } from './keys';
export { LocalDiskStorage } from './localDisk';
export { S3Storage } from './s3';

/** The storage driver chosen by STORAGE_DRIVER: the local disk or an S3-compatible bucket. */
export function createStorage(settings: Config['storage']): BlobStorage {
  return settings.driver === 's3' ? new S3Storage(settings) : new LocalDiskStorage(settings.directory);
}
