import request from 'supertest';
import { kitSetupListSchema } from '../../shared/types/forks';
import { setupDetailResponseSchema } from '../../shared/types/setups';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
let author: SessionAgent;
let authorHandle: string;
let authorId: number;
let racer: SessionAgent;
let stoat8e: number;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  // A kit of its own, so other test files' setups on the shared demo kits never show in its list.
  stoat8e = await kitId(t.db, 'ottervale-stoat-8e');
  const [a, b] = await Promise.all([createRacer(t.db), createRacer(t.db)]);
  author = await signIn(t.app, a.handle, a.password);
  authorHandle = a.handle;
  authorId = a.user.id;
  racer = await signIn(t.app, b.handle, b.password);
});
afterAll(async () => {
  await t.close();
});

async function forkInto(who: SessionAgent, setupId: number, share?: string): Promise<number> {
  const car = await who.agent.post('/api/cars').set('X-CSRF-Token', who.csrf).send({ kitId: stoat8e, nickname: 'Fork car' }).expect(201);
  const res = await who.agent
    .post(`/api/setups/${setupId}/forks`)
    .set('X-CSRF-Token', who.csrf)
    .send({ carId: car.body.car.id, ...(share ? { share } : {}) })
    .expect(201);
  return res.body.setup.id;
}

async function detail(who: SessionAgent | null, id: number) {
  const res = await (who ? who.agent : request(t.app)).get(`/api/setups/${id}`).expect(200);
  return setupDetailResponseSchema.parse(res.body).setup;
}

describe('lineage on the setup page', () => {
  it('says where a fork came from and counts forks of the setup and of the whole family', async () => {
    const { setup } = await carWithStockSetup(author, stoat8e, { visibility: 'public', title: 'Root sheet' });
    const child = await forkInto(racer, setup.id);
    await racer.agent.patch(`/api/setups/${child}`).set('X-CSRF-Token', racer.csrf).send({ visibility: 'public' }).expect(200);
    await forkInto(author, child);

    const root = await detail(null, setup.id);
    expect(root.lineage).toEqual({ forkedFrom: null, forkCount: 1, familyForkCount: 2 });
    const middle = await detail(null, child);
    expect(middle.lineage.forkedFrom).toMatchObject({ available: true, setupId: setup.id, title: 'Root sheet', revisionNumber: 1, share: null });
    expect(middle.lineage.forkCount).toBe(1);
    expect(middle.lineage.familyForkCount).toBe(2);
  });

  it('shows "no longer available" once the original is deleted, and the fork stays as it was', async () => {
    const { setup } = await carWithStockSetup(author, stoat8e, { visibility: 'public' });
    const child = await forkInto(racer, setup.id);
    const before = await detail(racer, child);
    await author.agent.delete(`/api/setups/${setup.id}`).set('X-CSRF-Token', author.csrf).expect(204);
    const after = await detail(racer, child);
    expect(after.lineage.forkedFrom).toEqual({ available: false });
    expect(after.currentRevision.values).toEqual(before.currentRevision.values);
  });

  it('keeps an unlisted original reachable for the fork owner through its link, and withholds it from everyone else', async () => {
    const { setup } = await carWithStockSetup(author, stoat8e, { visibility: 'unlisted', title: 'Link-only sheet' });
    const child = await forkInto(racer, setup.id, setup.shareToken!);
    const mine = await detail(racer, child);
    expect(mine.lineage.forkedFrom).toMatchObject({ available: true, title: 'Link-only sheet', share: setup.shareToken });
    await racer.agent.patch(`/api/setups/${child}`).set('X-CSRF-Token', racer.csrf).send({ visibility: 'public' }).expect(200);
    const theirs = await detail(null, child);
    expect(theirs.lineage.forkedFrom).toEqual({ available: false });
    // The original's page itself still needs the link.
    await request(t.app).get(`/api/setups/${setup.id}?share=${mine.lineage.forkedFrom!.available ? mine.lineage.forkedFrom!.share : ''}`).expect(200);
  });

  it('counts only comments that are not deleted', async () => {
    const { setup } = await carWithStockSetup(author, stoat8e, { visibility: 'public' });
    await t.db.sequelize.query(
      `INSERT INTO comments (setup_id, author_id, body_md, deleted_at) VALUES (:id, :author, 'Kept', NULL), (:id, :author, 'Gone', now())`,
      { replacements: { id: setup.id, author: authorId } },
    );
    expect((await detail(null, setup.id)).commentCount).toBe(1);
  });
});

describe('a kit’s public setups', () => {
  it('lists public setups of the kit newest first with fork counts, leaving out private, deleted and suspended racers’ setups', async () => {
    const kit = await kitId(t.db, 'marrowby-wren-10-two');
    const [pub, priv, gone] = [
      (await carWithStockSetup(author, kit, { visibility: 'public', title: 'Carpet night' })).setup,
      (await carWithStockSetup(author, kit, { visibility: 'private', title: 'Secret' })).setup,
      (await carWithStockSetup(author, kit, { visibility: 'public', title: 'Deleted one' })).setup,
    ];
    await author.agent.delete(`/api/setups/${gone.id}`).set('X-CSRF-Token', author.csrf).expect(204);
    const suspended = await createRacer(t.db);
    const suspendedAgent = await signIn(t.app, suspended.handle, suspended.password);
    await carWithStockSetup(suspendedAgent, kit, { visibility: 'public', title: 'From a suspended racer' });
    await suspended.user.update({ suspendedIndefinitely: true });
    const newest = (await carWithStockSetup(author, kit, { visibility: 'public', title: 'Newest' })).setup;

    const res = await request(t.app).get(`/api/kits/${kit}/setups`).expect(200);
    const list = kitSetupListSchema.parse(res.body);
    expect(list.kit).toMatchObject({ id: kit, vehicleClass: 'buggy-1-10-2wd' });
    // Other racers' public setups on this kit may be listed too; this author's come newest first.
    const mine = list.setups.filter((s) => s.ownerHandle === authorHandle);
    expect(mine.map((s) => s.id)).toEqual([newest.id, pub.id]);
    expect(mine[0]).toMatchObject({ title: 'Newest', revisionCount: 1, forkCount: 0 });
    expect(list.setups.some((s) => s.id === priv.id || s.id === gone.id || s.title === 'From a suspended racer')).toBe(false);
    const times = list.setups.map((s) => Date.parse(s.updatedAt));
    expect([...times].sort((x, y) => y - x)).toEqual(times);
  });

  it('answers 404 for a kit that does not exist', async () => {
    const res = await request(t.app).get('/api/kits/999999/setups').expect(404);
    expect(res.body.error.message).toMatch(/kit/i);
  });
});
