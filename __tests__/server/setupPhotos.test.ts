import ExifReader from 'exifreader';
import request from 'supertest';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { gifImage, jpegWithGps } from '../support/images';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
let owner: SessionAgent;
let other: SessionAgent;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  const [a, b] = await Promise.all([createRacer(t.db), createRacer(t.db)]);
  owner = await signIn(t.app, a.handle, a.password);
  other = await signIn(t.app, b.handle, b.password);
});
afterAll(async () => {
  await t.close();
});

function upload(s: SessionAgent, setupId: number, file: Buffer, name: string) {
  return s.agent.post(`/api/setups/${setupId}/photos`).set('X-CSRF-Token', s.csrf).field('caption', 'Rear end, side view').attach('photo', file, name);
}

describe('setup photos', () => {
  it('uploads a photo to my setup, serves it as a JPEG with no location data left in it', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n, { visibility: 'public' });
    const source = await jpegWithGps({ width: 2400, height: 1600 });
    expect(ExifReader.load(source).GPSLatitude).toBeDefined();
    const res = await upload(owner, setup.id, source, 'IMG_0001.jpg').expect(201);
    expect(res.body.setup.photos).toHaveLength(1);
    const photo = res.body.setup.photos[0];
    expect(photo).toMatchObject({ width: 1600, height: 1067, caption: 'Rear end, side view' });
    const served = await request(t.app).get(photo.url).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    const tags = ExifReader.load(served.body as Buffer);
    expect(tags.GPSLatitude).toBeUndefined();
    expect(tags.GPSLongitude).toBeUndefined();
    expect(served.headers['set-cookie']).toBeUndefined();
  });

  it('refuses a GIF with a clear message and stores nothing', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const before = await t.db.models.Photo.count();
    const res = await upload(owner, setup.id, await gifImage(), 'looks-like.jpg');
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/GIF/);
    expect(await t.db.models.Photo.count()).toBe(before);
  });

  it('will not take a photo for someone else\u2019s setup', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n, { visibility: 'public' });
    const res = await upload(other, setup.id, await jpegWithGps(), 'mine.jpg');
    expect(res.status).toBe(404);
  });

  it('needs the CSRF token for an upload', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const res = await owner.agent.post(`/api/setups/${setup.id}/photos`).attach('photo', await jpegWithGps(), 'x.jpg');
    expect(res.status).toBe(403);
  });

  it('deletes a photo: gone from the setup and its address answers 404', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const up = await upload(owner, setup.id, await jpegWithGps(), 'a.jpg').expect(201);
    const photo = up.body.setup.photos[0];
    const res = await owner.agent.delete(`/api/setups/${setup.id}/photos/${photo.id}`).set('X-CSRF-Token', owner.csrf).expect(200);
    expect(res.body.setup.photos).toEqual([]);
    expect((await request(t.app).get(photo.url)).status).toBe(404);
    expect((await request(t.app).get(photo.thumbUrl)).status).toBe(404);
  });
});
