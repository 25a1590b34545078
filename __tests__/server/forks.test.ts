import request from 'supertest';
import { getFamily } from '../../server/services/family';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
let author: SessionAgent;
let racer: SessionAgent;
let racerId: number;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  const [a, b] = await Promise.all([createRacer(t.db), createRacer(t.db)]);
  racerId = b.user.id;
  author = await signIn(t.app, a.handle, a.password);
  racer = await signIn(t.app, b.handle, b.password);
});
afterAll(async () => {
  await t.close();
});

async function racerCar(kit = stoat8n): Promise<number> {
  const res = await racer.agent.post('/api/cars').set('X-CSRF-Token', racer.csrf).send({ kitId: kit, nickname: 'My car' }).expect(201);
  return res.body.car.id;
}

function fork(setupId: number, body: object) {
  return racer.agent.post(`/api/setups/${setupId}/forks`).set('X-CSRF-Token', racer.csrf).send(body);
}

describe('forking a setup', () => {
  it('copies the original into my garage as a private setup that remembers where it came from', async () => {
    const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'public', title: 'Winning sheet' });
    const res = await fork(setup.id, { carId: await racerCar() }).expect(201);
    expect(res.body.setup).toMatchObject({ title: 'Winning sheet', visibility: 'private', isOwner: true });
    expect(res.body.setup.currentRevision.values).toEqual(setup.currentRevision.values);
    expect(res.body.setup.currentRevision.changeNote).toMatch(/^Forked from “Winning sheet” by @/);
    const row = await t.db.models.Setup.findByPk(res.body.setup.id);
    expect(row).toMatchObject({ forkedFromSetupId: setup.id, forkedFromRevisionId: setup.currentRevision.id, familyRootId: setup.id, upstreamRevisionId: setup.currentRevision.id });
  });

  it('keeps the fork as it was when the original is edited and later deleted', async () => {
    const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'public' });
    const forked = (await fork(setup.id, { carId: await racerCar() }).expect(201)).body.setup;
    const edited = { ...setup.currentRevision.values, 'diff.front.oil': 3000 };
    await author.agent.post(`/api/setups/${setup.id}/revisions`).set('X-CSRF-Token', author.csrf).send({ baseRevisionId: setup.currentRevision.id, values: edited, changeNote: 'Thinner front diff' }).expect(201);
    await author.agent.delete(`/api/setups/${setup.id}`).set('X-CSRF-Token', author.csrf).expect(204);
    const after = await racer.agent.get(`/api/setups/${forked.id}`).expect(200);
    expect(after.body.setup.currentRevision.values).toEqual(setup.currentRevision.values);
    const family = await racer.agent.get(`/api/setups/${forked.id}/family`).expect(200);
    expect(family.body.ancestors).toEqual([expect.objectContaining({ id: setup.id, visible: false, title: null })]);
  });

  it('refuses to fork a private setup of someone else (404) and across scales (400)', async () => {
    const { setup: hidden } = await carWithStockSetup(author, stoat8n, { visibility: 'private' });
    expect((await fork(hidden.id, { carId: await racerCar() })).status).toBe(404);
    const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'public' });
    const wrongScale = await fork(setup.id, { carId: await racerCar(await kitId(t.db, 'marrowby-wren-10')) });
    expect(wrongScale.status).toBe(400);
    expect(wrongScale.body.error.details.carId).toMatch(/1\/8 nitro buggy.*1\/10 4WD buggy.*same scale/);
  });

  it('forks onto a car of another class of the same scale, with that class and its sheet', async () => {
    const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'public', title: 'Truggy-bound' });
    const res = await fork(setup.id, { carId: await racerCar(await kitId(t.db, 'cinderfell-gantry-t8')) }).expect(201);
    expect(res.body.setup).toMatchObject({ vehicleClass: 'truggy-1-8-nitro', title: 'Truggy-bound' });
    // Both are 1/8 nitro sheets with the same fields, and every buggy value fits the truggy's limits.
    expect(res.body.setup.currentRevision.values).toEqual(setup.currentRevision.values);
    const row = await t.db.models.Setup.findByPk(res.body.setup.id);
    expect(row).toMatchObject({ vehicleClass: 'truggy-1-8-nitro', forkedFromSetupId: setup.id });
  });

  it('forks an unlisted setup with its share link only', async () => {
    const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'unlisted' });
    const carId = await racerCar();
    expect((await fork(setup.id, { carId })).status).toBe(404);
    await fork(setup.id, { carId, share: setup.shareToken }).expect(201);
  });

  it('leaves nothing behind when the fork fails half-way (all or nothing)', async () => {
    const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'public', title: 'Fail me' });
    const carId = await racerCar();
    const before = await t.db.models.Setup.count();
    // A failure injected in the database, after the fork's setup row is written and before its revision is.
    await t.db.pool.query(`CREATE FUNCTION fail_fork_revision() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN IF NEW.change_note LIKE 'Forked from “Fail me”%' THEN RAISE EXCEPTION 'injected failure'; END IF; RETURN NEW; END $$`);
    await t.db.pool.query('CREATE TRIGGER fail_fork_revision BEFORE INSERT ON setup_revisions FOR EACH ROW EXECUTE FUNCTION fail_fork_revision()');
    try {
      const res = await fork(setup.id, { carId });
      expect(res.status).toBe(500);
    } finally {
      await t.db.pool.query('DROP TRIGGER fail_fork_revision ON setup_revisions');
      await t.db.pool.query('DROP FUNCTION fail_fork_revision()');
    }
    expect(await t.db.models.Setup.count()).toBe(before);
    expect(await t.db.models.Setup.count({ where: { ownerId: racerId, forkedFromSetupId: setup.id } })).toBe(0);
  });
});

describe('family', () => {
  it('returns the whole tree of a 1,000-fork family with one recursive query each way', async () => {
    const { setup: root } = await carWithStockSetup(author, stoat8n, { visibility: 'public', title: 'Family root' });
    const owner = await t.db.models.Setup.findByPk(root.id);
    // Generate the family in SQL: each fork hangs under a random earlier member.
    await t.db.pool.query(
      `DO $$
       DECLARE i int; parent int; new_id int; rev int; members int[] := ARRAY[${root.id}];
       BEGIN
         FOR i IN 1..1000 LOOP
           parent := members[1 + floor(random() * array_length(members, 1))::int];
           INSERT INTO setups (owner_id, car_id, vehicle_class, template_version, title, visibility, share_token,
                               forked_from_setup_id, forked_from_revision_id, family_root_id, revision_count)
           SELECT ${owner!.ownerId}, car_id, vehicle_class, template_version, 'Fork ' || i, 'public', md5(random()::text),
                  parent, current_revision_id, ${root.id}, 1 FROM setups WHERE id = parent
           RETURNING id INTO new_id;
           INSERT INTO setup_revisions (setup_id, number, values, change_note, author_id, changed_field_count)
           SELECT new_id, 1, r.values || jsonb_build_object('shock.rear.oil', 400 + (i % 5) * 50), 'generated', ${owner!.ownerId}, 0
             FROM setups s JOIN setup_revisions r ON r.id = s.current_revision_id WHERE s.id = parent
           RETURNING id INTO rev;
           UPDATE setups SET current_revision_id = rev WHERE id = new_id;
           members := members || new_id;
         END LOOP;
       END $$`,
    );
    let queries = 0;
    t.db.sequelize.addHook('beforeQuery', 'count', () => {
      queries += 1;
    });
    try {
      const family = await getFamily(t.db, root.id, undefined);
      expect(family.descendants).toHaveLength(1000);
      expect(family.familyForkCount).toBe(1000);
      expect(family.ancestors).toEqual([]);
      // Parents always come before their children.
      const seen = new Set([root.id]);
      for (const node of family.descendants) {
        expect(seen.has(node.parentId!)).toBe(true);
        seen.add(node.id);
      }
      expect(family.descendants.every((n) => n.changedFromParent !== null && n.changedFromParent <= 1)).toBe(true);
      // One lookup of the setup, one recursive query up, one down, one for the counts.
      expect(queries).toBe(4);
    } finally {
      t.db.sequelize.removeHook('beforeQuery', 'count');
    }
    const deepest = await request(t.app).get(`/api/setups/${root.id}/family`).expect(200);
    expect(deepest.body.forkCount).toBeGreaterThan(0);
  }, 60_000);
});
