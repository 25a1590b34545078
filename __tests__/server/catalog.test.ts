import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { kitListSchema, trackListSchema } from '../../shared/types/catalog';
import { seedDemoWorld, isDatabaseEmpty } from '../../server/seeders';
import { DEMO_KITS, DEMO_TRACKS } from '../../server/seeders/demoWorld';
import { LocalDiskStorage } from '../../server/storage';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

describe('demo world and catalog', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = buildTestApp();
    await resetDatabase(t.db);
  });
  afterAll(async () => {
    await t.close();
  });

  it('lists nothing on an empty database', async () => {
    expect(await isDatabaseEmpty(t.db)).toBe(true);
    const res = await request(t.app).get('/api/kits');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ kits: [] });
  });

  it('seeds the demo world idempotently: a second run adds nothing', async () => {
    await seedDemoWorld(t.db, { bcryptCost: 4 });
    await seedDemoWorld(t.db, { bcryptCost: 4 });
    expect(await t.db.models.Kit.count()).toBe(DEMO_KITS.length);
    expect(await t.db.models.Track.count()).toBe(DEMO_TRACKS.length);
    expect(await isDatabaseEmpty(t.db)).toBe(false);
  });

  it('lists kits with their maker, ordered by maker then name', async () => {
    const res = await request(t.app).get('/api/kits');
    const { kits } = kitListSchema.parse(res.body);
    expect(kits).toHaveLength(DEMO_KITS.length);
    const labels = kits.map((k) => `${k.makerName} ${k.name}`);
    expect(labels).toEqual([...labels].sort((a, b) => a.localeCompare(b)));
    expect(kits.find((k) => k.slug === 'ottervale-stoat-8n')).toMatchObject({
      makerName: 'Ottervale Kitworks',
      vehicleClass: 'buggy-1-8-nitro',
    });
  });

  it('lists tracks with a surface from the fixed list', async () => {
    const { tracks } = trackListSchema.parse((await request(t.app).get('/api/tracks')).body);
    expect(tracks.map((tr) => tr.slug).sort()).toEqual(DEMO_TRACKS.map((tr) => tr.slug).sort());
  });

  it('treats handles as unique regardless of case', async () => {
    await t.db.models.User.create({ handle: 'Grid_Walker', displayName: 'A' });
    await expect(t.db.models.User.create({ handle: 'grid_walker', displayName: 'B' })).rejects.toThrow();
  });

  it('draws one photo for each styled public demo setup, idempotently, and serves it', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tunefork-demo-photos-'));
    const storage = new LocalDiskStorage(dir);
    try {
      await seedDemoWorld(t.db, { bcryptCost: 4, photos: { storage, config: t.config } });
      await seedDemoWorld(t.db, { bcryptCost: 4, photos: { storage, config: t.config } });
      const { rows } = await t.db.pool.query('SELECT s.title, count(*)::int AS n FROM setup_photos sp JOIN setups s ON s.id = sp.setup_id GROUP BY s.title ORDER BY s.title');
      expect(rows).toEqual([
        { title: 'Brackwater rough-track truggy', n: 1 },
        { title: 'Hollow Pines — loose and dusty', n: 1 },
        { title: 'Saltmarsh hard-pack nitro', n: 1 },
      ]);
      const photo = await t.db.models.Photo.findOne();
      const stored = await storage.get(photo!.storageKey);
      expect(stored?.contentType).toBe('image/jpeg');
      expect(photo).toMatchObject({ width: 1200, height: 800 });
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
