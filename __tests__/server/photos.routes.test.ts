import { randomUUID } from 'node:crypto';
import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import express, { type Express } from 'express';
import sharp from 'sharp';
import request from 'supertest';
import type { Config } from '../../server/config';
import { RouteTable } from '../../server/middleware/access';
import { errorHandler } from '../../server/middleware/errorHandler';
import { Photo } from '../../server/models/Photo';
import { photosRouter } from '../../server/routes/photos';
import { photoUploadMiddleware, photoUrls, requireUploadedPhoto, storeUploadedPhoto, type PhotoDeps } from '../../server/services/photos';
import { LocalDiskStorage } from '../../server/storage';
import { createRacer } from '../support/accounts';
import * as images from '../support/images';
import { buildTestApp, memoryLogger, type TestApp } from '../support/testApp';

let t: TestApp;
let root: string;
let ownerId: number;

/**
 * The photos router and an upload route like the setups router's, on one small app with the real
 * error handler: the setups upload route is not wired yet.
 */
function photoApp(photos: Partial<Config['photos']> = {}): { app: Express; deps: PhotoDeps; routes: RouteTable } {
  const deps: PhotoDeps = { db: t.db, storage: new LocalDiskStorage(root), config: { photos: { ...t.config.photos, ...photos } } };
  const routes = new RouteTable();
  const app = express();
  app.use('/api/photos', photosRouter({ ...deps, routes }));
  app.post('/upload', photoUploadMiddleware(deps.config), async (req, res) => {
    const photo = await storeUploadedPhoto(deps, ownerId, requireUploadedPhoto(req));
    res.status(201).json(photoUrls(photo));
  });
  app.use(errorHandler(memoryLogger().logger));
  return { app, deps, routes };
}

beforeAll(async () => {
  t = buildTestApp();
  if (!t.db.sequelize.isDefined('Photo')) Photo.initModel(t.db.sequelize);
  ownerId = (await createRacer(t.db)).user.id;
  root = await mkdtemp(path.join(os.tmpdir(), 'tunefork-photos-'));
});
afterAll(async () => {
  await rm(root, { recursive: true, force: true });
  await t.close();
});

describe('GET /api/photos/:key', () => {
  it('is declared public in the route table', () => {
    expect(photoApp().routes.routes).toEqual([{ method: 'GET', path: '/api/photos/:key', access: 'public' }]);
  });

  it('serves both variants as immutable, inline, nosniff JPEGs at URLs made from the random key, not the id', async () => {
    const { app, deps } = photoApp();
    const photo = await storeUploadedPhoto(deps, ownerId, { buffer: await images.jpegWithGps({ width: 2000, height: 1000 }), originalname: 'a.jpg', mimetype: 'image/jpeg' });
    const { url, thumbUrl } = photoUrls(photo);
    expect(url).toMatch(/^\/api\/photos\/p-[0-9a-f-]{36}\.jpg$/);
    expect(thumbUrl).toBe(url.replace('/p-', '/t-'));
    expect(url).not.toContain(`/${photo.id}`);
    for (const [u, width] of [[url, 1600], [thumbUrl, 400]] as const) {
      const res = await request(app).get(u).buffer(true).expect(200);
      expect(res.headers).toMatchObject({
        'content-type': 'image/jpeg',
        'x-content-type-options': 'nosniff',
        'cache-control': 'public, max-age=31536000, immutable',
        'content-disposition': 'inline',
        'content-security-policy': "default-src 'none'; sandbox",
      });
      expect((await sharp(res.body as Buffer).metadata()).width).toBe(width);
    }
  });

  it.each([
    ['a well-formed key that was never stored', () => `p-${randomUUID()}.jpg`],
    ['the sequential id', () => '1'],
    ['an encoded traversal', () => '..%2F..%2Fetc%2Fpasswd'],
    ['a folder that is not ours', () => `x-${randomUUID()}.jpg`],
  ])('answers 404 JSON for %s', async (_what, key) => {
    const res = await request(photoApp().app).get(`/api/photos/${key()}`).expect(404);
    expect(res.body).toEqual({ error: { code: 'not_found', message: 'That photo was not found.' } });
  });

  it('answers 404 for both variants of a photo hidden by moderation', async () => {
    const { app, deps } = photoApp();
    const photo = await storeUploadedPhoto(deps, ownerId, { buffer: await images.plainJpeg(), originalname: 'a.jpg', mimetype: 'image/jpeg' });
    await request(app).get(photoUrls(photo).url).expect(200);
    await photo.update({ hiddenAt: new Date() });
    for (const u of Object.values(photoUrls(photo))) {
      expect((await request(app).get(u).expect(404)).body.error.code).toBe('not_found');
    }
  });
});

describe('GET /api/photos/:key when storage lost the file', () => {
  it('answers 404 rather than an error when the row exists but the file does not', async () => {
    const { app, deps } = photoApp();
    const photo = await storeUploadedPhoto(deps, ownerId, { buffer: await images.plainJpeg(), originalname: 'a.jpg', mimetype: 'image/jpeg' });
    await deps.storage.delete(photo.thumbKey);
    await request(app).get(photoUrls(photo).url).expect(200);
    expect((await request(app).get(photoUrls(photo).thumbUrl).expect(404)).body.error.code).toBe('not_found');
  });
});

describe('the upload middleware (multipart field "photo")', () => {
  it('stores a photo sent under any name and type and answers its URLs', async () => {
    const { app } = photoApp();
    const res = await request(app).post('/upload').attach('photo', await images.webpImage(), { filename: 'x.gif', contentType: 'image/gif' }).expect(201);
    expect(res.body.url).toMatch(/^\/api\/photos\/p-[0-9a-f-]{36}\.jpg$/);
    expect((await request(app).get(res.body.thumbUrl).expect(200)).headers['content-type']).toBe('image/jpeg');
  });

  it('turns multer’s size limit into 413 photo_too_large naming the limit', async () => {
    const res = await request(photoApp({ maxBytes: 100 * 1024 }).app).post('/upload').attach('photo', await images.noisyJpeg(), 'big.jpg');
    expect(res.status).toBe(413);
    expect(res.body.error).toEqual({ code: 'photo_too_large', message: 'That photo is larger than the 100 KB limit. Export it smaller and try again.', details: { maxBytes: 102400 } });
  });

  it('answers 400 photo_unexpected_field for a file under another field name', async () => {
    const res = await request(photoApp().app).post('/upload').attach('image', await images.plainJpeg(), 'a.jpg').expect(400);
    expect(res.body.error.code).toBe('photo_unexpected_field');
  });

  it('answers 400 photo_too_many_files for two photos in one upload', async () => {
    const jpeg = await images.plainJpeg();
    const res = await request(photoApp().app).post('/upload').attach('photo', jpeg, 'a.jpg').attach('photo', jpeg, 'b.jpg').expect(400);
    expect(res.body.error).toEqual({ code: 'photo_too_many_files', message: 'Upload one photo at a time.' });
  });

  it('answers 400 photo_missing when no file is sent', async () => {
    const res = await request(photoApp().app).post('/upload').field('caption', 'no photo').expect(400);
    expect(res.body.error).toEqual({ code: 'photo_missing', message: 'Choose a photo to upload.' });
  });

  it('refuses a GIF sent as photo.jpg with image/jpeg through the whole route', async () => {
    const res = await request(photoApp().app).post('/upload').attach('photo', await images.gifImage(), { filename: 'photo.jpg', contentType: 'image/jpeg' }).expect(415);
    expect(res.body.error.message).toBe('That file is a GIF; upload a JPEG, PNG or WebP photo.');
  });
});
