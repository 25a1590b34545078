import { mkdtemp, readdir, readFile, rm, stat } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { createStorage, InvalidStorageKeyError, LocalDiskStorage, newStorageKey, S3Storage } from '../../server/storage';
import { startFakeS3, type FakeS3 } from '../support/fakeS3';

const KEY = 'p/0b6f3c2e-5a41-4c1e-9d7a-2f4c8e9a1b3d.jpg';
const BYTES = Buffer.from([0xff, 0xd8, 0xff, 0xdb, 1, 2, 3, 4, 0xff, 0xd9]);

/** Keys a caller could try to sneak past the pattern; none may reach the file system. */
const HOSTILE_KEYS = [
  '../../etc/passwd',
  'p/../../escape.jpg',
  '/etc/passwd',
  'p/0b6f3c2e-5a41-4c1e-9d7a-2f4c8e9a1b3d.jpg/../../../escape.jpg',
  'p\\..\\..\\escape.jpg',
  'p/..%2f..%2fescape.jpg',
  'p/0b6f3c2e-5a41-4c1e-9d7a-2f4c8e9a1b3d.html',
  'p/short.jpg',
  'p/0b6f3c2e-5a41-4c1e-9d7a-2f4c8e9a1b3d.jpg\0.png',
  '',
];

describe('local disk storage', () => {
  let root: string;
  let storage: LocalDiskStorage;
  beforeEach(async () => {
    root = await mkdtemp(path.join(os.tmpdir(), 'tunefork-photos-'));
    storage = new LocalDiskStorage(path.join(root, 'store'));
  });
  afterEach(async () => {
    await rm(root, { recursive: true, force: true });
  });

  it('writes into a created folder, reads back the same bytes with the type of the extension, and deletes', async () => {
    await storage.put(KEY, BYTES, 'image/jpeg');
    expect(await readFile(path.join(root, 'store', KEY))).toEqual(BYTES);
    expect(await storage.get(KEY)).toEqual({ body: BYTES, contentType: 'image/jpeg' });
    await storage.delete(KEY);
    expect(await storage.get(KEY)).toBeNull();
  });

  it('leaves no temporary file behind after a write (temp file + rename)', async () => {
    await storage.put(KEY, BYTES, 'image/jpeg');
    await storage.put(KEY, Buffer.from('second version'), 'image/jpeg');
    expect(await readdir(path.join(root, 'store', 'p'))).toEqual([path.basename(KEY)]);
    expect((await storage.get(KEY))?.body.toString()).toBe('second version');
  });

  it('answers null for a missing key and deletes a missing key without complaint', async () => {
    expect(await storage.get(KEY)).toBeNull();
    await expect(storage.delete(KEY)).resolves.toBeUndefined();
  });

  it('refuses a content type that contradicts the key extension', async () => {
    await expect(storage.put(KEY, BYTES, 'text/html')).rejects.toThrow(/does not match/);
    await expect(stat(path.join(root, 'store', KEY))).rejects.toMatchObject({ code: 'ENOENT' });
  });

  it.each(HOSTILE_KEYS)('refuses the key %j for put, get and delete and touches no file', async (key) => {
    await expect(storage.put(key, BYTES, 'image/jpeg')).rejects.toBeInstanceOf(InvalidStorageKeyError);
    await expect(storage.get(key)).rejects.toBeInstanceOf(InvalidStorageKeyError);
    await expect(storage.delete(key)).rejects.toBeInstanceOf(InvalidStorageKeyError);
    expect(await readdir(root)).toEqual([]);
  });

  it('generates keys that pass its own pattern and never repeat', () => {
    const keys = new Set(Array.from({ length: 200 }, () => newStorageKey('p', 'jpg')));
    expect(keys.size).toBe(200);
    for (const key of keys) expect(key).toMatch(/^p\/[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}\.jpg$/);
  });
});

describe('S3-compatible storage against a local s3rver', () => {
  let s3: FakeS3;
  let storage: S3Storage;
  beforeAll(async () => {
    s3 = await startFakeS3();
    storage = new S3Storage(s3.settings);
  });
  afterAll(async () => {
    storage.destroy();
    await s3.stop();
  });

  it('puts, gets (same bytes and content type) and deletes an object', async () => {
    const key = newStorageKey('t', 'jpg');
    await storage.put(key, BYTES, 'image/jpeg');
    expect(await storage.get(key)).toEqual({ body: BYTES, contentType: 'image/jpeg' });
    await storage.delete(key);
    expect(await storage.get(key)).toBeNull();
  });

  it('answers null for a key never written and deletes it without complaint', async () => {
    const key = newStorageKey('p', 'jpg');
    expect(await storage.get(key)).toBeNull();
    await expect(storage.delete(key)).resolves.toBeUndefined();
  });

  it('refuses a hostile key before any request is sent', async () => {
    await expect(storage.put('../outside.jpg', BYTES, 'image/jpeg')).rejects.toBeInstanceOf(InvalidStorageKeyError);
    await expect(storage.get('p/../../x.jpg')).rejects.toBeInstanceOf(InvalidStorageKeyError);
  });

  it('is the driver createStorage picks for driver "s3", and local disk for driver "local"', () => {
    const fromS3 = createStorage(s3.settings);
    expect(fromS3).toBeInstanceOf(S3Storage);
    (fromS3 as S3Storage).destroy();
    expect(createStorage({ driver: 'local', directory: os.tmpdir() })).toBeInstanceOf(LocalDiskStorage);
  });
});
