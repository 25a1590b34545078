import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
let owner: SessionAgent;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  const a = await createRacer(t.db);
  owner = await signIn(t.app, a.handle, a.password);
});
afterAll(async () => {
  await t.close();
});

function save(setupId: number, body: object) {
  return owner.agent.post(`/api/setups/${setupId}/revisions`).set('X-CSRF-Token', owner.csrf).send(body);
}

describe('saving revisions', () => {
  it('adds an immutable revision with the change note and counts the changed fields', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const before = setup.currentRevision.values as Record<string, number>;
    const values = { ...before, 'shock.rear.oil': before['shock.rear.oil'] + 50, 'gear.clutch-bell': before['gear.clutch-bell'] + 1 };
    const res = await save(setup.id, { baseRevisionId: setup.currentRevision.id, values, changeNote: 'Thicker rear oil and a bigger bell for the long straight.' });
    expect(res.status).toBe(201);
    expect(res.body.setup.currentRevision).toMatchObject({ number: 2, changeNote: 'Thicker rear oil and a bigger bell for the long straight.' });
    expect(res.body.setup.currentRevision.values['shock.rear.oil']).toBe(before['shock.rear.oil'] + 50);
    expect(res.body.setup.revisions.map((r: { number: number; changedFieldCount: number }) => [r.number, r.changedFieldCount])).toEqual([
      [2, 2],
      [1, 0],
    ]);
  });

  it('requires a change note after the first revision', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const res = await save(setup.id, { baseRevisionId: setup.currentRevision.id, values: setup.currentRevision.values, changeNote: '   ' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.changeNote).toMatch(/what changed and why/);
  });

  it('refuses unknown fields, wrong types and out-of-range numbers with a message per field', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const values = { ...setup.currentRevision.values, 'shock.rear.oil': 99999, 'gear.spur': 'forty', 'wing.colour': 'red' };
    const res = await save(setup.id, { baseRevisionId: setup.currentRevision.id, values, changeNote: 'Bad values' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.details).sort()).toEqual(['gear.spur', 'shock.rear.oil', 'wing.colour']);
    expect(await t.db.models.SetupRevision.count({ where: { setupId: setup.id } })).toBe(1);
  });

  it('accepts an implausible ride height with a warning (common practice, no source: 1/8 buggies sit in the mid-20s mm)', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const values = { ...setup.currentRevision.values, 'susp.front.ride-height': 5 };
    const res = await save(setup.id, { baseRevisionId: setup.currentRevision.id, values, changeNote: 'Testing a very low front' });
    expect(res.status).toBe(201);
    expect(res.body.warnings['susp.front.ride-height']).toBeDefined();
  });

  it('answers a save from a stale base with 409 and the current revision', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const base = setup.currentRevision.id;
    await save(setup.id, { baseRevisionId: base, values: { ...setup.currentRevision.values, 'diff.front.oil': 5000 }, changeNote: 'Front diff 7k to 5k' }).expect(201);
    const stale = await save(setup.id, { baseRevisionId: base, values: { ...setup.currentRevision.values, 'diff.rear.oil': 2000 }, changeNote: 'Rear diff thinner' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale_revision');
    expect(stale.body.error.details.currentRevision).toMatchObject({ number: 2, changeNote: 'Front diff 7k to 5k' });
    expect(stale.body.error.details.currentRevision.values['diff.front.oil']).toBe(5000);
  });

  it('lets exactly one of two simultaneous saves from the same base win', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const body = (oil: number) => ({ baseRevisionId: setup.currentRevision.id, values: { ...setup.currentRevision.values, 'shock.front.oil': oil }, changeNote: `Front oil ${oil}` });
    const results = await Promise.all([save(setup.id, body(600)), save(setup.id, body(650))]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(await t.db.models.SetupRevision.count({ where: { setupId: setup.id } })).toBe(2);
  });
});

describe('revision immutability in the database', () => {
  it('refuses UPDATE, DELETE and TRUNCATE on setup revisions whatever the code path', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const id = setup.currentRevision.id;
    await expect(t.db.pool.query("UPDATE setup_revisions SET change_note = 'rewritten' WHERE id = $1", [id])).rejects.toThrow(/immutable/);
    await expect(t.db.pool.query('DELETE FROM setup_revisions WHERE id = $1', [id])).rejects.toThrow(/immutable/);
    await expect(t.db.pool.query('TRUNCATE setup_revisions CASCADE')).rejects.toThrow(/immutable/);
    const row = await t.db.models.SetupRevision.findByPk(id);
    await expect(row!.update({ changeNote: 'via the ORM' })).rejects.toThrow(/immutable/);
    await expect(row!.destroy()).rejects.toThrow(/immutable/);
    await row!.reload();
    expect(row!.changeNote).toMatch(/stock sheet/);
  });
});

describe('setup files', () => {
  it('exports our JSON document and imports it back as a new private setup with the same values', async () => {
    const { carId, setup } = await carWithStockSetup(owner, stoat8n, { title: 'Export me' });
    const exported = await owner.agent.get(`/api/setups/${setup.id}/export.json`).expect(200);
    expect(exported.headers['content-disposition']).toBe('attachment; filename=Export-me.tunefork.json');
    expect(exported.body).toMatchObject({ format: 'tunefork.setup', formatVersion: 1, setup: { title: 'Export me', vehicleClass: 'buggy-1-8-nitro' } });
    const imported = await owner.agent.post('/api/setups/import').set('X-CSRF-Token', owner.csrf).send({ carId, document: exported.body }).expect(201);
    expect(imported.body.setup.visibility).toBe('private');
    expect(imported.body.setup.currentRevision.values).toEqual(setup.currentRevision.values);
  });

  it('refuses a document that is not ours, or carries unknown fields, without creating anything', async () => {
    const { carId, setup } = await carWithStockSetup(owner, stoat8n);
    const before = await t.db.models.Setup.count();
    const notOurs = await owner.agent.post('/api/setups/import').set('X-CSRF-Token', owner.csrf).send({ carId, document: { hello: 'world' } });
    expect(notOurs.status).toBe(400);
    expect(notOurs.body.error.message).toMatch(/not a Tunefork setup document/);
    const doc = (await owner.agent.get(`/api/setups/${setup.id}/export.json`)).body;
    doc.setup.values['made.up'] = 3;
    const unknown = await owner.agent.post('/api/setups/import').set('X-CSRF-Token', owner.csrf).send({ carId, document: doc });
    expect(unknown.status).toBe(400);
    expect(Object.keys(unknown.body.error.details)).toEqual(['values.made.up']);
    expect(await t.db.models.Setup.count()).toBe(before);
  });

  it('exports CSV with one quoted row per field and never a spreadsheet formula', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const values = { ...setup.currentRevision.values, 'diff.notes': '=HYPERLINK("x")' };
    await save(setup.id, { baseRevisionId: setup.currentRevision.id, values, changeNote: 'A note that looks like a formula' }).expect(201);
    const csv = await owner.agent.get(`/api/setups/${setup.id}/export.csv`).expect(200);
    const lines = csv.text.trim().split('\r\n');
    expect(lines[0]).toBe('"section","key","label","value","unit"');
    expect(lines.length).toBe(1 + 98);
    expect(csv.text).toContain('"gear.spur"');
    expect(csv.text).toContain(`"'=HYPERLINK(""x"")"`);
  });
});
