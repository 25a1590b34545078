import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';
import type { Config } from '../config';
import { assertStorageKey } from './keys';
import type { BlobStorage, StoredBlob } from './types';

export type S3StorageSettings = Extract<Config['storage'], { driver: 's3' }>;

function isMissing(err: unknown): boolean {
  if (err instanceof S3ServiceException) return err.name === 'NoSuchKey' || err.$metadata.httpStatusCode === 404;
  return false;
}

/** Objects in one bucket of an S3-compatible store (a cloud bucket or a self-hosted one). */
export class S3Storage implements BlobStorage {
  readonly client: S3Client;

  constructor(private readonly settings: S3StorageSettings) {
    const { endpoint, region, accessKeyId, secretAccessKey } = settings;
    this.client = new S3Client({
      region,
      // Self-hosted stores answer on one host name, so the bucket goes in the path, not the host.
      ...(endpoint ? { endpoint, forcePathStyle: true } : {}),
      // Without explicit keys the SDK's default chain applies (environment, instance role, …).
      ...(accessKeyId && secretAccessKey ? { credentials: { accessKeyId, secretAccessKey } } : {}),
      // Checksums only where S3 demands them: several S3-compatible stores reject the newer
      // default checksum headers, and our bodies are small buffers sent in one request.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    assertStorageKey(key);
    // S3 writes are atomic per object: a reader never sees a partial upload.
    await this.client.send(
      new PutObjectCommand({ Bucket: this.settings.bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }),
    );
  }

  async get(key: string): Promise<StoredBlob | null> {
    assertStorageKey(key);
    try {
      const res = await this.client.send(new GetObjectCommand({ Bucket: this.settings.bucket, Key: key }));
      if (!res.Body) return null;
      const bytes = await res.Body.transformToByteArray();
      return { body: Buffer.from(bytes), contentType: res.ContentType ?? 'application/octet-stream' };
    } catch (err) {
      if (isMissing(err)) return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    assertStorageKey(key);
    // DeleteObject succeeds for a missing key, which is what the interface promises.
    await this.client.send(new DeleteObjectCommand({ Bucket: this.settings.bucket, Key: key }));
  }

  /** Closes the client's sockets (tests and shutdown). */
  destroy(): void {
    this.client.destroy();
  }
}
