import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { S3StorageSettings } from '../../server/storage/s3';

/** s3rver ships no type declarations; this is the part used here. */
type S3rverInstance = { run(): Promise<{ port: number }>; close(): Promise<void> };
type S3rverClass = new (options: Record<string, unknown>) => S3rverInstance;
// eslint-disable-next-line @typescript-eslint/no-require-imports
const S3rver: S3rverClass = require('s3rver');

export type FakeS3 = { settings: S3StorageSettings; directory: string; stop(): Promise<void> };

/**
 * A local S3-compatible server (s3rver) on 127.0.0.1 and a port the system picks, storing into a
 * fresh temp folder, with one empty bucket. Signed requests need its fixed key pair, S3RVER/S3RVER.
 */
export async function startFakeS3(bucket = 'tunefork-test-photos'): Promise<FakeS3> {
  const directory = await mkdtemp(path.join(os.tmpdir(), 'tunefork-s3-'));
  const server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory, configureBuckets: [{ name: bucket, configs: [] }] });
  const { port } = await server.run();
  return {
    directory,
    settings: {
      driver: 's3',
      endpoint: `http://127.0.0.1:${port}`,
      region: 'us-east-1',
      bucket,
      accessKeyId: 'S3RVER',
      secretAccessKey: 'S3RVER',
    },
    async stop() {
      await server.close();
      await rm(directory, { recursive: true, force: true });
    },
  };
}
