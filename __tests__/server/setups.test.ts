import request from 'supertest';
import { garageSchema, setupDetailResponseSchema } from '../../shared/types/setups';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
let owner: SessionAgent;
let other: SessionAgent;
let stoat8e: number;
let wren10: number;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  stoat8e = await kitId(t.db, 'ottervale-stoat-8e');
  wren10 = await kitId(t.db, 'marrowby-wren-10');
  const [a, b] = await Promise.all([createRacer(t.db), createRacer(t.db)]);
  owner = await signIn(t.app, a.handle, a.password);
  other = await signIn(t.app, b.handle, b.password);
});
afterAll(async () => {
  await t.close();
});

describe('garage and new setups', () => {
  it('starts a setup from the kit stock sheet as revision 1 and lists it under its car', async () => {
    const { carId, setup } = await carWithStockSetup(owner, stoat8e, { title: 'Stock baseline' });
    const kit = await t.db.models.Kit.findByPk(stoat8e);
    expect(setup.currentRevision.number).toBe(1);
    expect(setup.currentRevision.values).toEqual(kit!.stockValues);
    const garage = garageSchema.parse((await owner.agent.get('/api/garage').expect(200)).body);
    const car = garage.cars.find((c) => c.id === carId)!;
    expect(car).toMatchObject({ kitName: 'Stoat 8E', vehicleClass: 'buggy-1-8-electric' });
    expect(car.setups.map((s) => s.title)).toEqual(['Stock baseline']);
  });

  it('copies one of my setups for the same class, and refuses a copy across classes', async () => {
    const { carId, setup } = await carWithStockSetup(owner, stoat8e);
    const copy = await owner.agent
      .post('/api/setups')
      .set('X-CSRF-Token', owner.csrf)
      .send({ carId, title: 'Variant', startFrom: { kind: 'copy', setupId: setup.id } })
      .expect(201);
    expect(copy.body.setup.currentRevision.values).toEqual(setup.currentRevision.values);
    const wrenCar = await owner.agent.post('/api/cars').set('X-CSRF-Token', owner.csrf).send({ kitId: wren10, nickname: 'Wren' }).expect(201);
    const across = await owner.agent
      .post('/api/setups')
      .set('X-CSRF-Token', owner.csrf)
      .send({ carId: wrenCar.body.car.id, title: 'Nope', startFrom: { kind: 'copy', setupId: setup.id } });
    expect(across.status).toBe(400);
    expect(across.body.error.details.startFrom).toMatch(/another class/);
  });

  it('will not put a setup on someone else\u2019s car', async () => {
    const { carId } = await carWithStockSetup(owner, stoat8e);
    const res = await other.agent.post('/api/setups').set('X-CSRF-Token', other.csrf).send({ carId, title: 'Mine now', startFrom: { kind: 'stock' } });
    expect(res.status).toBe(404);
  });
});

describe('visibility', () => {
  it('hides a private setup from everyone but its owner (404, not 403)', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8e, { visibility: 'private' });
    await owner.agent.get(`/api/setups/${setup.id}`).expect(200);
    expect((await other.agent.get(`/api/setups/${setup.id}`)).status).toBe(404);
    expect((await request(t.app).get(`/api/setups/${setup.id}`)).status).toBe(404);
    expect((await request(t.app).get(`/api/setups/${setup.id}/export.json`)).status).toBe(404);
  });

  it('opens an unlisted setup only with its share link', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8e, { visibility: 'unlisted' });
    expect(setup.shareToken).toBeTruthy();
    expect((await request(t.app).get(`/api/setups/${setup.id}`)).status).toBe(404);
    expect((await request(t.app).get(`/api/setups/${setup.id}?share=wrong`)).status).toBe(404);
    const res = await request(t.app).get(`/api/setups/${setup.id}?share=${setup.shareToken}`).expect(200);
    expect(res.body.setup.shareToken).toBeNull(); // only the owner is shown the link
  });

  it('shows a public setup to anyone, with notes rendered safely', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8e, { visibility: 'public' });
    await owner.agent
      .patch(`/api/setups/${setup.id}`)
      .set('X-CSRF-Token', owner.csrf)
      .send({ notesMarkdown: 'Rear **450** <script>x()</script>', conditions: { trackType: 'loose-dusty', temperatureC: 24, grip: 'low' } })
      .expect(200);
    const res = await request(t.app).get(`/api/setups/${setup.id}`).expect(200);
    const detail = setupDetailResponseSchema.parse(res.body).setup;
    expect(detail.notesHtml.trim()).toBe('<p>Rear <strong>450</strong> </p>');
    expect(detail.conditions).toEqual({ trackType: 'loose-dusty', temperatureC: 24, grip: 'low' });
    expect(detail.isOwner).toBe(false);
  });

  it('removes a deleted setup for everyone while its revisions stay in the database', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8e, { visibility: 'public' });
    await owner.agent.delete(`/api/setups/${setup.id}`).set('X-CSRF-Token', owner.csrf).expect(204);
    expect((await owner.agent.get(`/api/setups/${setup.id}`)).status).toBe(404);
    expect(await t.db.models.SetupRevision.count({ where: { setupId: setup.id } })).toBe(1);
  });
});

describe('kit stock sheet', () => {
  it('gives the values and which options are in the box', async () => {
    const res = await request(t.app).get(`/api/kits/${stoat8e}/stock`).expect(200);
    expect(res.body.stock).toMatchObject({ kitId: stoat8e, vehicleClass: 'buggy-1-8-electric' });
    expect(res.body.stock.values['gear.spur']).toBe(46);
    expect(res.body.stock.inBox['chassis.front-brace']).not.toContain('stiff');
  });
});

describe('editing the setup details', () => {
  it('changes only the fields sent: a new title keeps notes, visibility and conditions', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8e, { visibility: 'public' });
    await owner.agent.patch(`/api/setups/${setup.id}`).set('X-CSRF-Token', owner.csrf).send({ notesMarkdown: 'Keep me', conditions: { trackType: 'turf', temperatureC: 12, grip: 'medium' } }).expect(200);
    const res = await owner.agent.patch(`/api/setups/${setup.id}`).set('X-CSRF-Token', owner.csrf).send({ title: 'Renamed' }).expect(200);
    expect(res.body.setup).toMatchObject({ title: 'Renamed', notesMarkdown: 'Keep me', visibility: 'public', conditions: { trackType: 'turf', temperatureC: 12, grip: 'medium' } });
  });
});
