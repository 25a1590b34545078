import request from 'supertest';
import { getHistory } from '../../server/services/history';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

type Values = Record<string, number | string | boolean>;
type Revision = { id: number; number: number; values: Values };
type HistoryEntry = { id: number; number: number; changeNote: string; authorHandle: string; createdAt: string; changes: Array<{ key: string; before: unknown; after: unknown }> };

let t: TestApp;
let owner: SessionAgent;
let ownerHandle: string;
let stranger: SessionAgent;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  const [a, b] = await Promise.all([createRacer(t.db), createRacer(t.db)]);
  ownerHandle = a.handle;
  owner = await signIn(t.app, a.handle, a.password);
  stranger = await signIn(t.app, b.handle, b.password);
});
afterAll(async () => {
  await t.close();
});

async function save(setupId: number, base: Revision, values: Values, changeNote: string): Promise<Revision> {
  const res = await owner.agent.post(`/api/setups/${setupId}/revisions`).set('X-CSRF-Token', owner.csrf).send({ baseRevisionId: base.id, values, changeNote }).expect(201);
  return res.body.setup.currentRevision;
}

/** A setup with three revisions: two fields changed, then one changed and one cleared. */
async function setupWithHistory(visibility: 'private' | 'unlisted' | 'public' = 'public') {
  const { setup } = await carWithStockSetup(owner, stoat8n, { visibility, title: 'Old Kiln evenings' });
  const first = setup.currentRevision as Revision;
  const second = await save(setup.id, first, { ...first.values, 'shock.rear.oil': 500, 'gear.spur': 48 }, 'Thicker rear oil, bigger spur');
  const { 'tire.front.diameter': _cleared, ...rest } = second.values;
  await save(setup.id, second, { ...rest, 'diff.centre.oil': 10000 }, 'Centre diff up; front tyre size unknown');
  return { id: setup.id as number, shareToken: setup.shareToken as string | null, first };
}

describe('history of a setup', () => {
  // A field-by-field diff of consecutive revisions, a cleared field reading as null: common practice, no source.
  it('lists revisions newest first, each with the fields it changed from the one before', async () => {
    const { id, first } = await setupWithHistory();
    const res = await request(t.app).get(`/api/setups/${id}/history`).expect(200);
    const revisions: HistoryEntry[] = res.body.revisions;
    expect(revisions.map((r) => [r.number, r.changeNote, r.authorHandle])).toEqual([
      [3, 'Centre diff up; front tyre size unknown', ownerHandle],
      [2, 'Thicker rear oil, bigger spur', ownerHandle],
      [1, expect.stringMatching(/stock sheet/), ownerHandle],
    ]);
    expect(revisions[0].changes).toEqual([
      { key: 'diff.centre.oil', before: first.values['diff.centre.oil'], after: 10000 },
      { key: 'tire.front.diameter', before: first.values['tire.front.diameter'], after: null },
    ]);
    expect(revisions[1].changes).toEqual([
      { key: 'gear.spur', before: first.values['gear.spur'], after: 48 },
      { key: 'shock.rear.oil', before: first.values['shock.rear.oil'], after: 500 },
    ]);
    expect(revisions[2].changes).toEqual([]);
    expect(Number.isNaN(Date.parse(revisions[0].createdAt))).toBe(false);
  });

  it('reads all revisions and their authors in one query, however many there are', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n, { visibility: 'public' });
    let base = setup.currentRevision as Revision;
    for (let i = 1; i <= 25; i += 1) {
      base = await save(setup.id, base, { ...base.values, 'shock.front.oil': 500 + i * 10 }, `Front oil step ${i}`);
    }
    let queries = 0;
    t.db.sequelize.addHook('beforeQuery', 'countHistory', () => {
      queries += 1;
    });
    try {
      const history = await getHistory(t.db, setup.id, undefined);
      expect(history.revisions).toHaveLength(26);
      expect(history.revisions[0].changes).toEqual([{ key: 'shock.front.oil', before: 740, after: 750 }]);
      // One lookup of the setup, one of its revisions with their authors.
      expect(queries).toBe(2);
    } finally {
      t.db.sequelize.removeHook('beforeQuery', 'countHistory');
    }
  });

  it('is 404 to everyone but the owner for a private setup', async () => {
    const { id } = await setupWithHistory('private');
    expect((await request(t.app).get(`/api/setups/${id}/history`)).status).toBe(404);
    expect((await stranger.agent.get(`/api/setups/${id}/history`)).status).toBe(404);
    expect((await stranger.agent.get(`/api/setups/${id}/revisions/2`)).status).toBe(404);
    expect((await owner.agent.get(`/api/setups/${id}/history`).expect(200)).body.revisions).toHaveLength(3);
  });

  it('opens an unlisted setup’s history and revisions with its share link only', async () => {
    const { id, shareToken } = await setupWithHistory('unlisted');
    expect(shareToken).toEqual(expect.any(String));
    expect((await stranger.agent.get(`/api/setups/${id}/history`)).status).toBe(404);
    expect((await stranger.agent.get(`/api/setups/${id}/history?share=wrong-token`)).status).toBe(404);
    const res = await stranger.agent.get(`/api/setups/${id}/history?share=${shareToken}`).expect(200);
    expect(res.body.revisions).toHaveLength(3);
    await stranger.agent.get(`/api/setups/${id}/revisions/1?share=${shareToken}`).expect(200);
  });

  it('is 404 once the setup is deleted', async () => {
    const { id } = await setupWithHistory();
    await owner.agent.delete(`/api/setups/${id}`).set('X-CSRF-Token', owner.csrf).expect(204);
    expect((await request(t.app).get(`/api/setups/${id}/history`)).status).toBe(404);
  });
});

describe('a single revision', () => {
  it('returns the revision by its number with the setup it belongs to', async () => {
    const { id } = await setupWithHistory();
    const res = await request(t.app).get(`/api/setups/${id}/revisions/2`).expect(200);
    expect(res.body.setup).toEqual({ id, title: 'Old Kiln evenings', vehicleClass: 'buggy-1-8-nitro', ownerHandle, kitName: 'Stoat 8N', revisionCount: 3 });
    expect(res.body.revision).toMatchObject({ number: 2, changeNote: 'Thicker rear oil, bigger spur', authorHandle: ownerHandle });
    expect(res.body.revision.values).toMatchObject({ 'shock.rear.oil': 500, 'gear.spur': 48 });
  });

  it('is 404 for a number the setup does not have', async () => {
    const { id } = await setupWithHistory();
    for (const number of ['4', '0', '-1', 'latest', '2.5']) {
      const res = await request(t.app).get(`/api/setups/${id}/revisions/${number}`);
      expect(res.status).toBe(404);
      expect(res.body.error.message).toBe('That revision was not found.');
    }
  });
});
