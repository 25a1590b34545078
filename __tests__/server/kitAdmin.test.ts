import request from 'supertest';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
let admin: SessionAgent;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  const a = await createRacer(t.db, { role: 'admin' });
  admin = await signIn(t.app, a.handle, a.password);
});
afterAll(async () => {
  await t.close();
});

describe('admin-managed kits', () => {
  it('adds a kit under a new maker and lists it', async () => {
    const res = await admin.agent
      .post('/api/admin/kits')
      .set('X-CSRF-Token', admin.csrf)
      .send({ makerName: 'Fernhollow Models', name: 'Kite 8T', vehicleClass: 'truggy-1-8-electric', releasedYear: 2027 })
      .expect(201);
    expect(res.body.kit).toMatchObject({ slug: 'fernhollow-models-kite-8t', makerName: 'Fernhollow Models', vehicleClass: 'truggy-1-8-electric' });
    const kits = await request(t.app).get('/api/kits').expect(200);
    expect(kits.body.kits.map((k: { name: string }) => k.name)).toContain('Kite 8T');
    const again = await admin.agent.post('/api/admin/kits').set('X-CSRF-Token', admin.csrf).send({ makerName: 'Fernhollow Models', name: 'Kite 8T', vehicleClass: 'truggy-1-8-electric' });
    expect(again.status).toBe(409);
  });

  /** A fresh 1/8 nitro kit per test, so the shared demo kits are never changed under other tests. */
  async function newNitroKit(name: string): Promise<number> {
    const res = await admin.agent.post('/api/admin/kits').set('X-CSRF-Token', admin.csrf).send({ makerName: 'Fernhollow Models', name, vehicleClass: 'buggy-1-8-nitro' }).expect(201);
    return res.body.kit.id;
  }

  it('sets a stock sheet checked against the class template, with in-box options', async () => {
    const id = await newNitroKit('Kite 8N');
    const current = (await request(t.app).get(`/api/kits/${await kitId(t.db, 'ottervale-stoat-8n')}/stock`)).body.stock;
    const values = { ...current.values, 'gear.clutch-bell': 14 };
    const res = await admin.agent.put(`/api/admin/kits/${id}/stock`).set('X-CSRF-Token', admin.csrf).send({ values, inBox: current.inBox }).expect(200);
    expect(res.body.stock.values['gear.clutch-bell']).toBe(14);
  });

  it('refuses out-of-range stock values and in-box options the field does not have', async () => {
    const id = await newNitroKit('Kite 8N Pro');
    const current = (await request(t.app).get(`/api/kits/${await kitId(t.db, 'ottervale-stoat-8n')}/stock`)).body.stock;
    const badValue = await admin.agent
      .put(`/api/admin/kits/${id}/stock`)
      .set('X-CSRF-Token', admin.csrf)
      .send({ values: { ...current.values, 'shock.rear.oil': 1 }, inBox: current.inBox });
    expect(badValue.status).toBe(400);
    expect(Object.keys(badValue.body.error.details)).toEqual(['shock.rear.oil']);
    const badOption = await admin.agent
      .put(`/api/admin/kits/${id}/stock`)
      .set('X-CSRF-Token', admin.csrf)
      .send({ values: current.values, inBox: { ...current.inBox, 'chassis.front-brace': ['titanium'] } });
    expect(badOption.status).toBe(400);
    expect(badOption.body.error.details['inBox.chassis.front-brace']).toMatch(/Pick options from/);
  });
});
