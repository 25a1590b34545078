import request from 'supertest';
import { forkPreviewSchema, type ForkPreview } from '../../shared/types/forks';
import { getTemplate, validateSetupValues } from '../../shared/types/templates';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

type Values = Record<string, number | string | boolean>;
/** The parts of the setup page these tests read. */
type ForkedSetup = {
  id: number;
  title: string;
  visibility: string;
  vehicleClass: string;
  templateVersion: number;
  currentRevision: { id: number; number: number; values: Values; changeNote: string };
};

let t: TestApp;
let author: SessionAgent;
let authorHandle: string;
let racer: SessionAgent;
let stoat8n: number;
let stoat8e: number;
let wren10: number;
/** A second 1/8 nitro buggy kit: stiff braces in the box, but no long exhaust pipe. */
let heron: { id: number; name: string };

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  [stoat8n, stoat8e, wren10] = await Promise.all(['ottervale-stoat-8n', 'ottervale-stoat-8e', 'marrowby-wren-10'].map((slug) => kitId(t.db, slug)));
  const [a, b, admin] = await Promise.all([createRacer(t.db), createRacer(t.db), createRacer(t.db, { role: 'admin' })]);
  authorHandle = a.handle;
  author = await signIn(t.app, a.handle, a.password);
  racer = await signIn(t.app, b.handle, b.password);
  heron = await addHeronKit(await signIn(t.app, admin.handle, admin.password));
});
afterAll(async () => {
  await t.close();
});

async function addHeronKit(admin: SessionAgent): Promise<{ id: number; name: string }> {
  const name = `Heron 8N ${Date.now().toString(36)}`;
  const created = await admin.agent
    .post('/api/admin/kits')
    .set('X-CSRF-Token', admin.csrf)
    .send({ makerName: 'Cinderfell Racing Models', name, vehicleClass: 'buggy-1-8-nitro' })
    .expect(201);
  const stoat = (await request(t.app).get(`/api/kits/${stoat8n}/stock`).expect(200)).body.stock;
  const inBox = { ...stoat.inBox, 'chassis.front-brace': ['none', 'flexible', 'standard', 'stiff'], 'chassis.rear-brace': ['none', 'flexible', 'standard', 'stiff'], 'engine.exhaust': ['short', 'medium'] };
  const values = { ...stoat.values, 'engine.exhaust': 'medium', 'diff.front.oil': 5000 };
  await admin.agent.put(`/api/admin/kits/${created.body.kit.id}/stock`).set('X-CSRF-Token', admin.csrf).send({ values, inBox }).expect(200);
  return { id: created.body.kit.id, name };
}

async function racerCar(kit: number, stock = false): Promise<number> {
  const res = await racer.agent.post('/api/cars').set('X-CSRF-Token', racer.csrf).send({ kitId: kit, nickname: 'Weekend car', stock }).expect(201);
  return res.body.car.id;
}

/** A public Stoat 8N setup whose revision 2 runs option parts: stiff braces and the long pipe. */
async function optionPartSetup(visibility: 'public' | 'unlisted' | 'private' = 'public') {
  const { setup } = await carWithStockSetup(author, stoat8n, { visibility, title: 'Saltmarsh braces' });
  const values: Values = { ...(setup.currentRevision.values as Values), 'chassis.front-brace': 'stiff', 'chassis.rear-brace': 'stiff', 'engine.exhaust': 'long', 'shock.rear.oil': 500 };
  const res = await author.agent
    .post(`/api/setups/${setup.id}/revisions`)
    .set('X-CSRF-Token', author.csrf)
    .send({ baseRevisionId: setup.currentRevision.id, values, changeNote: 'Stiff braces and the long pipe for the fast sweepers' })
    .expect(201);
  const detail = res.body.setup as ForkedSetup;
  return { id: detail.id, shareToken: setup.shareToken, firstRevisionId: setup.currentRevision.id, values: detail.currentRevision.values };
}

function preview(setupId: number, query: Record<string, string | number>) {
  return racer.agent.get(`/api/setups/${setupId}/fork-preview`).query(query);
}

async function previewOk(setupId: number, query: Record<string, string | number>): Promise<ForkPreview> {
  const res = await preview(setupId, query).expect(200);
  return forkPreviewSchema.parse(res.body);
}

function fork(setupId: number, body: object) {
  return racer.agent.post(`/api/setups/${setupId}/forks`).set('X-CSRF-Token', racer.csrf).send(body);
}

const keys = (rows: ReadonlyArray<{ key: string }>) => rows.map((row) => row.key);

describe('fork preview', () => {
  it('flags the option parts a stock car of the same kit lacks, beside the stock values', async () => {
    const source = await optionPartSetup();
    const carId = await racerCar(stoat8n, true);
    const body = await previewOk(source.id, { carId });
    expect(body.source).toMatchObject({ setupId: source.id, revisionNumber: 2, title: 'Saltmarsh braces', ownerHandle: authorHandle, vehicleClass: 'buggy-1-8-nitro', kitName: 'Stoat 8N' });
    expect(body.target).toEqual({ carId, nickname: 'Weekend car', kitName: 'Stoat 8N', vehicleClass: 'buggy-1-8-nitro', stock: true });
    expect(body.checkedOptionParts).toBe(true);
    // The demo Stoat 8N ships without stiff braces (server/seeders/stockSheets.ts).
    expect(body.optionParts).toEqual([
      { key: 'chassis.front-brace', label: 'Front chassis brace', section: 'Chassis', value: 'stiff', stockValue: 'none' },
      { key: 'chassis.rear-brace', label: 'Rear chassis brace', section: 'Chassis', value: 'stiff', stockValue: 'none' },
    ]);
    expect(body.dropped).toEqual([]);
    expect(body.filledFromStock).toEqual([]);
  });

  it('does not check option parts for a car of the same kit that is not marked stock', async () => {
    const source = await optionPartSetup();
    const body = await previewOk(source.id, { carId: await racerCar(stoat8n) });
    expect(body.checkedOptionParts).toBe(false);
    expect(body.optionParts).toEqual([]);
  });

  it('checks option parts against the other kit of the same class, even when the car is not marked stock', async () => {
    const source = await optionPartSetup();
    const body = await previewOk(source.id, { carId: await racerCar(heron.id) });
    expect(body.target).toMatchObject({ kitName: heron.name, vehicleClass: 'buggy-1-8-nitro', stock: false });
    expect(body.checkedOptionParts).toBe(true);
    expect(body.optionParts).toEqual([{ key: 'engine.exhaust', label: 'Exhaust pipe', section: 'Engine and clutch', value: 'long', stockValue: 'medium' }]);
  });

  it('drops the engine and fills the motor from stock when a nitro buggy setup goes onto an electric buggy', async () => {
    const source = await optionPartSetup();
    const body = await previewOk(source.id, { carId: await racerCar(stoat8e) });
    expect(body.target.vehicleClass).toBe('buggy-1-8-electric');
    expect(keys(body.dropped)).toEqual(expect.arrayContaining(['gear.clutch-bell', 'engine.size', 'engine.exhaust', 'clutch.gap', 'brakes.bias']));
    expect(body.dropped.find((row) => row.key === 'engine.exhaust')).toEqual({ key: 'engine.exhaust', label: 'Exhaust pipe', section: 'Engine and clutch', value: 'long' });
    const stock = (await request(t.app).get(`/api/kits/${stoat8e}/stock`).expect(200)).body.stock;
    expect(body.filledFromStock.find((row) => row.key === 'motor.kv')).toEqual({ key: 'motor.kv', label: 'Motor kV', section: 'Motor, speed controller and battery', value: null, stockValue: stock.values['motor.kv'] });
    expect(keys(body.filledFromStock)).toEqual(expect.arrayContaining(['gear.pinion', 'battery.cells', 'battery.voltage']));
    // The Stoat 8E does not ship stiff braces either.
    expect(keys(body.optionParts)).toEqual(['chassis.front-brace', 'chassis.rear-brace']);
  });

  it('previews an older revision when asked', async () => {
    const source = await optionPartSetup();
    const body = await previewOk(source.id, { carId: await racerCar(stoat8n, true), revisionId: source.firstRevisionId });
    expect(body.source).toMatchObject({ revisionId: source.firstRevisionId, revisionNumber: 1 });
    expect(body.optionParts).toEqual([]);
  });

  it('refuses a car of another scale with a 400 naming both classes', async () => {
    const source = await optionPartSetup();
    const res = await preview(source.id, { carId: await racerCar(wren10) });
    expect(res.status).toBe(400);
    expect(res.body.error.details.carId).toMatch(/1\/8 nitro buggy.*1\/10 4WD buggy.*same scale/);
  });

  it('answers 404 for someone else’s car and for a setup I may not see', async () => {
    const source = await optionPartSetup();
    const { carId: authorsCar } = await carWithStockSetup(author, stoat8n);
    expect((await preview(source.id, { carId: authorsCar })).status).toBe(404);
    const hidden = await optionPartSetup('private');
    expect((await preview(hidden.id, { carId: await racerCar(stoat8n) })).status).toBe(404);
    expect((await preview(999_999, { carId: await racerCar(stoat8n) })).status).toBe(404);
  });

  it('opens an unlisted setup with its share token only', async () => {
    const source = await optionPartSetup('unlisted');
    const carId = await racerCar(stoat8n);
    expect((await preview(source.id, { carId })).status).toBe(404);
    expect((await preview(source.id, { carId, share: 'not-the-token' })).status).toBe(404);
    expect((await previewOk(source.id, { carId, share: source.shareToken! })).source.setupId).toBe(source.id);
  });

  it('explains a missing or malformed car, revision or token in the query', async () => {
    const source = await optionPartSetup();
    const missing = await racer.agent.get(`/api/setups/${source.id}/fork-preview`).expect(400);
    expect(missing.body.error.details.carId).toBe('Pick the car to fork onto (carId).');
    const words = await preview(source.id, { carId: 'twelve' }).expect(400);
    expect(words.body.error.details.carId).toBe('carId must be a whole number, such as 12.');
    const twice = await racer.agent.get(`/api/setups/${source.id}/fork-preview?carId=1&carId=2`).expect(400);
    expect(twice.body.error.details.carId).toBe('Give carId once, as a number.');
    const huge = await preview(source.id, { carId: '99999999999' }).expect(400);
    expect(huge.body.error.details.carId).toBe('carId must be a number from 1 to 2147483647.');
    const zero = await preview(source.id, { carId: 0 }).expect(400);
    expect(zero.body.error.details.carId).toMatch(/from 1/);
    const otherRevision = await preview(source.id, { carId: await racerCar(stoat8n), revisionId: (await optionPartSetup()).firstRevisionId }).expect(400);
    expect(otherRevision.body.error.details.revisionId).toBe('That revision is not part of this setup.');
    const longToken = await preview(source.id, { carId: 1, share: 'x'.repeat(61) }).expect(400);
    expect(longToken.body.error.details.share).toMatch(/too long/);
  });

  it('is for signed-in racers only', async () => {
    const source = await optionPartSetup();
    expect((await request(t.app).get(`/api/setups/${source.id}/fork-preview?carId=1`)).status).toBe(401);
  });
});

describe('forking onto a stock kit', () => {
  it('takes exactly the stock values chosen, keeps the other option parts, and says so in the change note', async () => {
    const source = await optionPartSetup();
    const res = await fork(source.id, { carId: await racerCar(stoat8n, true), stockChoices: { 'chassis.front-brace': 'stock', 'chassis.rear-brace': 'keep' } }).expect(201);
    const forked = res.body.setup as ForkedSetup;
    expect(forked.currentRevision.values).toEqual({ ...source.values, 'chassis.front-brace': 'none' });
    expect(forked.currentRevision.changeNote).toBe(`Forked from “Saltmarsh braces” by @${authorHandle} (revision 2). Stock values instead of option parts: Front chassis brace.`);
  });

  it('keeps every option part when no choice is sent', async () => {
    const source = await optionPartSetup();
    const res = await fork(source.id, { carId: await racerCar(stoat8n, true) }).expect(201);
    expect(res.body.setup.currentRevision.values).toEqual(source.values);
    expect(res.body.setup.currentRevision.changeNote).toBe(`Forked from “Saltmarsh braces” by @${authorHandle} (revision 2).`);
  });

  it('refuses a stock choice other than keep or stock, and loses nothing', async () => {
    const source = await optionPartSetup();
    const before = await t.db.models.Setup.count();
    const res = await fork(source.id, { carId: await racerCar(stoat8n, true), stockChoices: { 'chassis.front-brace': 'buy' } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.details)).toEqual(['stockChoices.chassis.front-brace']);
    expect(await t.db.models.Setup.count()).toBe(before);
  });

  it('agrees with its preview, across classes, and the fork is a valid sheet for my car', async () => {
    const source = await optionPartSetup();
    const carId = await racerCar(stoat8e, true);
    const plan = await previewOk(source.id, { carId });
    const stockChoices = Object.fromEntries(plan.optionParts.map((row) => [row.key, 'stock']));
    const res = await fork(source.id, { carId, stockChoices, title: 'Braces on my 8E' }).expect(201);
    const forked = res.body.setup as ForkedSetup;

    const expected: Values = { ...source.values };
    for (const row of plan.dropped) delete expected[row.key];
    for (const row of [...plan.filledFromStock, ...plan.optionParts]) expected[row.key] = row.stockValue;
    expect(forked.currentRevision.values).toEqual(expected);
    expect(forked).toMatchObject({ vehicleClass: 'buggy-1-8-electric', templateVersion: getTemplate('buggy-1-8-electric').version, title: 'Braces on my 8E', visibility: 'private' });
    expect(validateSetupValues(getTemplate('buggy-1-8-electric'), forked.currentRevision.values)).toMatchObject({ ok: true, errors: {} });

    const note = forked.currentRevision.changeNote;
    expect(note).toMatch(/^Forked from “Saltmarsh braces” by @.+ \(revision 2\)\. Stock values instead of option parts: Front chassis brace, Rear chassis brace\. Left out, not on this car's sheet: Clutch bell, Brake bias to the front, .* and \d+ more\. From the Stoat 8E stock sheet: Pinion, Motor kV, .*\.$/);

    const row = await t.db.models.Setup.findByPk(forked.id);
    expect(row).toMatchObject({ forkedFromSetupId: source.id, upstreamRevisionId: plan.source.revisionId, familyRootId: source.id });
    // The fork edits like any setup of its class.
    await racer.agent
      .post(`/api/setups/${forked.id}/revisions`)
      .set('X-CSRF-Token', racer.csrf)
      .send({ baseRevisionId: forked.currentRevision.id, values: { ...forked.currentRevision.values, 'gear.pinion': 18 }, changeNote: 'One tooth up on the pinion' })
      .expect(201);
  });

  it('forks an unlisted setup onto a stock car only with its share token', async () => {
    const source = await optionPartSetup('unlisted');
    const carId = await racerCar(heron.id, true);
    expect((await fork(source.id, { carId })).status).toBe(404);
    const res = await fork(source.id, { carId, share: source.shareToken!, stockChoices: { 'engine.exhaust': 'stock' } }).expect(201);
    expect(res.body.setup.currentRevision.values['engine.exhaust']).toBe('medium');
    expect(res.body.setup.currentRevision.values['chassis.front-brace']).toBe('stiff');
  });

  it('refuses ids that cannot exist with a message instead of a server error', async () => {
    const source = await optionPartSetup();
    const res = await fork(source.id, { carId: 99_999_999_999 });
    expect(res.status).toBe(400);
    expect(res.body.error.details.carId).toBe('Pick one of your cars.');
  });
});
