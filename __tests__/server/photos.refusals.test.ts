import { mkdtemp, readdir, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { Config } from '../../server/config';
import { ApiError } from '../../server/errors';
import { Photo } from '../../server/models/Photo';
import { storeUploadedPhoto, type PhotoDeps } from '../../server/services/photos';
import { LocalDiskStorage } from '../../server/storage';
import { createRacer } from '../support/accounts';
import * as images from '../support/images';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
let root: string;
let ownerId: number;

beforeAll(async () => {
  t = buildTestApp();
  if (!t.db.sequelize.isDefined('Photo')) Photo.initModel(t.db.sequelize);
  ownerId = (await createRacer(t.db)).user.id;
});
beforeEach(async () => {
  root = await mkdtemp(path.join(os.tmpdir(), 'tunefork-photos-'));
});
afterEach(async () => {
  await rm(root, { recursive: true, force: true });
});
afterAll(async () => {
  await t.close();
});

const ACCEPTED_HINT = 'upload a JPEG, PNG or WebP photo.';

/** Uploads under a name and declared type that both claim a JPEG, and returns the refusal. */
async function refusal(buffer: Buffer, photos: Partial<Config['photos']> = {}): Promise<ApiError> {
  const deps: PhotoDeps = { db: t.db, storage: new LocalDiskStorage(root), config: { photos: { ...t.config.photos, ...photos } } };
  const before = await Photo.count({ where: { ownerId } });
  const err = await storeUploadedPhoto(deps, ownerId, { buffer, originalname: 'photo.jpg', mimetype: 'image/jpeg' }).then(
    () => new Error('the upload was accepted'),
    (e: unknown) => e,
  );
  if (!(err instanceof ApiError)) throw err;
  // A refused upload leaves nothing behind: no row, no file.
  expect(await Photo.count({ where: { ownerId } })).toBe(before);
  expect(await readdir(root)).toEqual([]);
  return err;
}

describe('uploads that are refused, whatever their name (photo.jpg) and declared type (image/jpeg) say', () => {
  it('refuses a GIF and names what it really is', async () => {
    const err = await refusal(await images.gifImage());
    expect([err.status, err.code, err.message]).toEqual([415, 'photo_type_not_allowed', `That file is a GIF; ${ACCEPTED_HINT}`]);
  });

  it('refuses an HTML page renamed photo.jpg', async () => {
    const err = await refusal(images.HTML_PAGE);
    expect([err.status, err.code]).toEqual([415, 'photo_type_not_allowed']);
    expect(err.message).toBe(`That file is a web page or drawing (text), not a photo; ${ACCEPTED_HINT}`);
  });

  it('refuses an SVG drawing with a script inside', async () => {
    const err = await refusal(images.SVG_DRAWING);
    expect([err.status, err.code]).toEqual([415, 'photo_type_not_allowed']);
    expect(err.message).toMatch(/web page or drawing/);
  });

  it('refuses a real JPEG with a web page appended (a polyglot)', async () => {
    const err = await refusal(await images.jpegWithHtmlAppended());
    expect([err.status, err.code, err.details]).toEqual([415, 'photo_type_not_allowed', { detected: 'jpg' }]);
    expect(err.message).toMatch(/web page code hidden inside it/);
  });

  it('refuses JPEG magic bytes followed by nothing but a web page', async () => {
    const err = await refusal(images.jpegMagicThenHtml());
    expect([err.status, err.code]).toEqual([415, 'photo_type_not_allowed']);
  });

  it('refuses HEIC (sharp here has no HEVC decoder) and tells the racer how to get a JPEG', async () => {
    const err = await refusal(images.heicHeader());
    expect([err.status, err.code, err.details]).toEqual([415, 'photo_type_not_allowed', { detected: 'heic' }]);
    expect(err.message).toMatch(/HEIC format.*export the photo as JPEG/);
  });

  it('refuses an empty file', async () => {
    const err = await refusal(Buffer.alloc(0));
    expect([err.status, err.code, err.message]).toEqual([400, 'photo_empty', 'That file is empty; choose a photo and try again.']);
  });

  it('refuses a file over config.photos.maxBytes with 413, naming its size and the limit', async () => {
    const noisy = await images.noisyJpeg(800, 800);
    expect(noisy.length).toBeGreaterThan(500 * 1024);
    const err = await refusal(noisy, { maxBytes: 200 * 1024 });
    expect([err.status, err.code]).toEqual([413, 'photo_too_large']);
    expect(err.message).toBe(`That photo is ${Math.ceil(noisy.length / 1024)} KB; the limit is 200 KB. Export it smaller and try again.`);
  });

  it('refuses a tiny JPEG whose header claims 30000 × 30000 pixels before decoding it', async () => {
    const bomb = await images.jpegClaimingSize(30_000, 30_000);
    expect(bomb.length).toBeLessThan(1_000);
    const err = await refusal(bomb);
    expect([err.status, err.code, err.details]).toEqual([413, 'photo_too_many_pixels', { width: 30_000, height: 30_000, maxPixels: 40_000_000 }]);
    expect(err.message).toBe('That photo is 30000 × 30000 pixels (900 megapixels); the limit is 40 megapixels. Resize it and try again.');
  });

  it('refuses a real photo over a lowered pixel limit', async () => {
    const err = await refusal(await images.plainJpeg(200, 100), { maxPixels: 10_000 });
    expect([err.status, err.code]).toEqual([413, 'photo_too_many_pixels']);
    expect(err.message).toBe('That photo is 200 × 100 pixels (20,000 pixels); the limit is 10,000 pixels. Resize it and try again.');
  });

  it('refuses a JPEG cut off halfway as unreadable', async () => {
    const jpeg = await images.plainJpeg(640, 480);
    const err = await refusal(jpeg.subarray(0, Math.floor(jpeg.length / 2)));
    expect([err.status, err.code]).toEqual([400, 'photo_unreadable']);
    expect(err.message).toMatch(/could not read that photo/);
  });

  it('refuses a caption over 200 characters before touching the photo', async () => {
    const deps: PhotoDeps = { db: t.db, storage: new LocalDiskStorage(root), config: t.config };
    const file = { buffer: await images.plainJpeg(), originalname: 'a.jpg', mimetype: 'image/jpeg' };
    await expect(storeUploadedPhoto(deps, ownerId, file, { caption: 'x'.repeat(201) })).rejects.toMatchObject({
      status: 400,
      code: 'validation_failed',
      details: { caption: 'Keep the caption under 200 characters.' },
    });
    expect(await readdir(root)).toEqual([]);
  });
});
