import { mkdtemp, readdir, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import * as ExifReader from 'exifreader';
import sharp from 'sharp';
import { Photo } from '../../server/models/Photo';
import { deletePhoto, storeUploadedPhoto, type PhotoDeps } from '../../server/services/photos';
import { LocalDiskStorage } from '../../server/storage';
import { createRacer } from '../support/accounts';
import * as images from '../support/images';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
let root: string;
let deps: PhotoDeps;
let ownerId: number;

beforeAll(async () => {
  t = buildTestApp();
  // Until server/models/index.ts registers Photo, register it here; afterwards this is a no-op.
  if (!t.db.sequelize.isDefined('Photo')) Photo.initModel(t.db.sequelize);
  ownerId = (await createRacer(t.db)).user.id;
});
beforeEach(async () => {
  root = await mkdtemp(path.join(os.tmpdir(), 'tunefork-photos-'));
  deps = { db: t.db, storage: new LocalDiskStorage(root), config: t.config };
});
afterEach(async () => {
  await rm(root, { recursive: true, force: true });
});
afterAll(async () => {
  await t.close();
});

const upload = (buffer: Buffer, originalname = 'photo.jpg', mimetype = 'image/jpeg') => ({ buffer, originalname, mimetype });

async function storedFiles(): Promise<string[]> {
  const folders = await readdir(root);
  const files = await Promise.all(folders.map(async (f) => (await readdir(path.join(root, f))).map((n) => `${f}/${n}`)));
  return files.flat().sort();
}

async function readStored(key: string): Promise<Buffer> {
  const blob = await deps.storage.get(key);
  if (!blob) throw new Error(`nothing stored under ${key}`);
  return blob.body;
}

describe('the GPS-tagged test photo (checked before trusting the stripping tests)', () => {
  it('really carries GPS position, camera EXIF, XMP and a comment', async () => {
    const source = await images.jpegWithGps();
    const tags = ExifReader.load(source, { expanded: true });
    expect(tags.gps?.Latitude).toBeCloseTo(images.INVENTED_PLACE.latitude, 4);
    expect(tags.gps?.Longitude).toBeCloseTo(images.INVENTED_PLACE.longitude, 4);
    expect(tags.exif?.Make?.description).toBe(images.CAMERA.make);
    expect(tags.xmp?._raw).toContain(images.SECRET_NOTE);
    expect(images.jpegMarkers(source)).toEqual(expect.arrayContaining([0xe1, 0xfe]));
  });
});

describe('storing an uploaded photo', () => {
  it('strips every metadata segment: no EXIF, GPS, XMP, ICC, IPTC or comment in either stored variant', async () => {
    const photo = await storeUploadedPhoto(deps, ownerId, upload(await images.jpegWithGps()));
    for (const key of [photo.storageKey, photo.thumbKey]) {
      const stored = await readStored(key);
      const tags = ExifReader.load(stored, { expanded: true });
      expect(Object.keys(tags)).toEqual(['file']);
      expect(tags.gps).toBeUndefined();
      // Only quantisation/Huffman tables and the frame header before the pixels (ITU-T T.81 B.1).
      expect(images.jpegMarkers(stored).filter((m) => (m >= 0xe0 && m <= 0xef) || m === 0xfe)).toEqual([]);
      expect(stored.includes(images.SECRET_NOTE)).toBe(false);
      expect(stored.includes(images.CAMERA.make)).toBe(false);
    }
  });

  it('turns the photo upright by its EXIF orientation, so the red corner moves from top-left to top-right', async () => {
    const photo = await storeUploadedPhoto(deps, ownerId, upload(await images.jpegWithGps({ width: 640, height: 480, orientation: 6 })));
    expect([photo.width, photo.height]).toEqual([480, 640]);
    const { data, info } = await sharp(await readStored(photo.storageKey)).raw().toBuffer({ resolveWithObject: true });
    const pixel = (x: number, y: number) => [...data.subarray((y * info.width + x) * 3, (y * info.width + x) * 3 + 3)];
    const [r, g, b] = pixel(info.width - 20, 20);
    expect(r).toBeGreaterThan(200);
    expect(g + b).toBeLessThan(80);
    expect(pixel(20, 20)[0] - pixel(20, 20)[1]).toBeLessThan(100);
  });

  it('stores a display variant of at most 1600 px and a 400 px thumbnail, and records the row', async () => {
    const photo = await storeUploadedPhoto(deps, ownerId, upload(await images.jpegWithGps({ width: 3200, height: 2400 })), { caption: '  Rear shocks, new oil  ' });
    const display = await sharp(await readStored(photo.storageKey)).metadata();
    const thumb = await sharp(await readStored(photo.thumbKey)).metadata();
    expect([display.format, display.width, display.height]).toEqual(['jpeg', 1600, 1200]);
    expect([thumb.format, thumb.width, thumb.height]).toEqual(['jpeg', 400, 300]);
    const row = await Photo.findByPk(photo.id, { rejectOnEmpty: true });
    expect(row.toJSON()).toMatchObject({ ownerId, contentType: 'image/jpeg', width: 1600, height: 1200, caption: 'Rear shocks, new oil', hiddenAt: null });
    expect(row.bytes).toBe((await readStored(photo.storageKey)).length);
    expect(row.storageKey).toMatch(/^p\/[0-9a-f-]{36}\.jpg$/);
    expect(row.thumbKey).toBe(row.storageKey.replace(/^p\//, 't/'));
    expect(await storedFiles()).toEqual([row.storageKey, row.thumbKey].sort());
  });

  it('never enlarges a small photo', async () => {
    const photo = await storeUploadedPhoto(deps, ownerId, upload(await images.plainJpeg(320, 200)));
    expect([photo.width, photo.height]).toEqual([320, 200]);
    expect((await sharp(await readStored(photo.thumbKey)).metadata()).width).toBe(320);
  });

  it('converts a Display P3 photo to sRGB before dropping its ICC profile, so colours stay as shot', async () => {
    const colour = { r: 40, g: 200, b: 40 };
    const source = await images.displayP3Jpeg(colour);
    const [fileR] = (await sharp(source, { ignoreIcc: true }).raw().toBuffer()).subarray(0, 1);
    expect(fileR).toBeGreaterThan(80); // the raw numbers in the file are P3, not the colour itself
    const photo = await storeUploadedPhoto(deps, ownerId, upload(source));
    const stored = await readStored(photo.storageKey);
    expect((await sharp(stored).metadata()).hasProfile).toBe(false);
    const means = (await sharp(stored).stats()).channels.map((c) => c.mean);
    means.forEach((mean, i) => expect(Math.abs(mean - [colour.r, colour.g, colour.b][i])).toBeLessThanOrEqual(3));
  });

  it('flattens a transparent PNG onto white in the stored JPEG', async () => {
    const photo = await storeUploadedPhoto(deps, ownerId, upload(await images.pngImage({ alpha: true }), 'shot.png', 'image/png'));
    const stats = await sharp(await readStored(photo.storageKey)).stats();
    expect(stats.channels.map((c) => Math.round(c.mean))).toEqual([255, 255, 255]);
    expect(photo.contentType).toBe('image/jpeg');
  });

  it.each([
    ['WebP', () => images.webpImage(500, 500), [500, 500]],
    ['AVIF (sharp decodes AV1 here)', () => images.avifImage(320, 240), [320, 240]],
  ])('accepts %s and stores it as JPEG', async (_name, make, size) => {
    const photo = await storeUploadedPhoto(deps, ownerId, upload(await make(), 'upload.bin', 'application/octet-stream'));
    expect([photo.width, photo.height]).toEqual(size);
    expect((await sharp(await readStored(photo.storageKey)).metadata()).format).toBe('jpeg');
  });

  it('removes both stored files again when the row cannot be inserted', async () => {
    const noSuchOwner = 2_000_000_000;
    await expect(storeUploadedPhoto(deps, noSuchOwner, upload(await images.plainJpeg()))).rejects.toThrow(/foreign key/i);
    expect(await storedFiles()).toEqual([]);
  });
});

describe('deleting a photo', () => {
  it('removes the row and both stored files', async () => {
    const photo = await storeUploadedPhoto(deps, ownerId, upload(await images.plainJpeg()));
    expect(await storedFiles()).toHaveLength(2);
    await deletePhoto(deps, photo);
    expect(await storedFiles()).toEqual([]);
    expect(await Photo.findByPk(photo.id)).toBeNull();
  });
});
