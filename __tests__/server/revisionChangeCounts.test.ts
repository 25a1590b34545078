import { QueryTypes } from 'sequelize';
import { diffSetupValues } from '../../shared/compute/setup/diff';
import { backfillChangedFieldCounts, down, up } from '../../server/db/migrations/20261202T1300-revision-change-counts';
import { seedDemoWorld } from '../../server/seeders';
import { scaleSizes, seedScale } from '../../scripts/seed-scale';
import { signedInRacer, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/*
 * Each revision stores how many fields it changed from the revision before (0 for revision 1), and
 * the setup page lists that number. The reference is diffSetupValues (shared/compute/setup/diff.ts)
 * over the two stored sheets, which is what the page computed before the count was stored; the
 * expected numbers below are also the fields each test changes by construction.
 */

type Values = Record<string, number | string | boolean>;
type Revision = { id: number; number: number; values: Values };
type StoredRow = { id: number; setup_id: number; number: number; values: Values; changed_field_count: number | null };

let t: TestApp;
let owner: SessionAgent;
let forker: SessionAgent;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  [owner, forker] = await Promise.all([signedInRacer(t), signedInRacer(t)]);
});
afterAll(async () => {
  await t.close();
});

/** Every revision's stored count, and diffSetupValues against the revision before it, in number order. */
function countsOf(rows: StoredRow[]): Array<{ number: number; stored: number | null; diffed: number }> {
  return rows.map((r, i) => {
    const previous = i > 0 && rows[i - 1].setup_id === r.setup_id ? rows[i - 1] : null;
    return { number: r.number, stored: r.changed_field_count, diffed: previous ? diffSetupValues(previous.values, r.values).length : 0 };
  });
}

async function storedRevisions(setupId: number): Promise<StoredRow[]> {
  const { rows } = await t.db.pool.query<StoredRow>(
    'SELECT id, setup_id, number, values, changed_field_count FROM setup_revisions WHERE setup_id = $1 ORDER BY number',
    [setupId],
  );
  return rows;
}

/** The stored counts, the diffs of the stored sheets and the setup page's counts all equal `expected` (oldest first). */
async function expectCounts(s: SessionAgent, setupId: number, expected: number[]): Promise<void> {
  const counts = countsOf(await storedRevisions(setupId));
  expect(counts.map((c) => c.stored)).toEqual(expected);
  expect(counts.map((c) => c.diffed)).toEqual(expected);
  const page = await s.agent.get(`/api/setups/${setupId}`).expect(200);
  expect(page.body.setup.revisions.map((r: { number: number; changedFieldCount: number }) => [r.number, r.changedFieldCount])).toEqual(
    expected.map((n, i) => [i + 1, n]).reverse(),
  );
}

async function save(s: SessionAgent, setupId: number, base: Revision, values: Values, changeNote = 'Tuning after practice'): Promise<Revision> {
  const res = await s.agent
    .post(`/api/setups/${setupId}/revisions`)
    .set('X-CSRF-Token', s.csrf)
    .send({ baseRevisionId: base.id, values, changeNote })
    .expect(201);
  return res.body.setup.currentRevision;
}

async function carOf(s: SessionAgent, nickname = 'Count car'): Promise<number> {
  return (await s.agent.post('/api/cars').set('X-CSRF-Token', s.csrf).send({ kitId: stoat8n, nickname }).expect(201)).body.car.id;
}

describe('counts written with each revision', () => {
  it('creating a setup from the stock sheet or as a copy stores 0 for revision 1', async () => {
    const { carId, setup } = await carWithStockSetup(owner, stoat8n);
    await expectCounts(owner, setup.id, [0]);
    const copy = await owner.agent
      .post('/api/setups')
      .set('X-CSRF-Token', owner.csrf)
      .send({ carId, title: 'Copy of the test setup', startFrom: { kind: 'copy', setupId: setup.id } })
      .expect(201);
    await expectCounts(owner, copy.body.setup.id, [0]);
  });

  it('saving a revision stores the fields changed from the one before, values added and removed included', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const stock = setup.currentRevision as Revision;
    const oils = { ...stock.values, 'shock.front.oil': 600, 'shock.rear.oil': 500 };
    const r2 = await save(owner, setup.id, stock, oils);
    const r3 = await save(owner, setup.id, r2, { ...oils }, 'Same sheet, a note about the track');
    const withNote = { ...oils, 'diff.notes': 'Centre diff feels loose on the jumps', 'gear.spur': 47 };
    const r4 = await save(owner, setup.id, r3, withNote);
    const { 'diff.notes': _dropped, ...withoutNote } = withNote;
    await save(owner, setup.id, r4, withoutNote, 'Note moved to the setup notes');
    await expectCounts(owner, setup.id, [0, 2, 0, 2, 1]);
  });

  // diffSetupValues tells -0 from 0 (Object.is) and JSON stores -0 as 0: the values schema makes -0 a 0
  // before the count, so the stored count agrees with the stored sheets.
  it('counts a -0 sent for a stored 0 as unchanged, as the stored sheets compare', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const stock = setup.currentRevision as Revision;
    expect(stock.values['susp.rear.hub-toe']).toBe(0);
    // JSON.stringify writes -0 as 0, so the body is written by hand to carry the sign.
    const body = JSON.stringify({ baseRevisionId: stock.id, values: stock.values, changeNote: 'Hub toe typed as -0' }).replace(
      '"susp.rear.hub-toe":0',
      '"susp.rear.hub-toe":-0',
    );
    expect(body).toContain('"susp.rear.hub-toe":-0');
    await owner.agent.post(`/api/setups/${setup.id}/revisions`).set('X-CSRF-Token', owner.csrf).set('Content-Type', 'application/json').send(body).expect(201);
    await expectCounts(owner, setup.id, [0, 0]);
  });

  it('forking stores 0 for the fork’s revision 1, and taking the original’s changes counts them against the fork’s own sheet', async () => {
    const { setup: original } = await carWithStockSetup(owner, stoat8n, { visibility: 'public', title: 'Original to follow' });
    const forked = await forker.agent.post(`/api/setups/${original.id}/forks`).set('X-CSRF-Token', forker.csrf).send({ carId: await carOf(forker) }).expect(201);
    const forkId = forked.body.setup.id as number;
    await expectCounts(forker, forkId, [0]);
    // The fork changes one field of its own; the original changes three, and the fork takes two of them.
    const fork = forked.body.setup.currentRevision as Revision;
    const mine = await save(forker, forkId, fork, { ...fork.values, 'diff.front.oil': 5000 });
    const base = original.currentRevision as Revision;
    const theirs = await save(owner, original.id, base, { ...base.values, 'gear.spur': 48, 'diff.rear.oil': 5000, 'shock.rear.oil': 500 });
    await forker.agent
      .post(`/api/setups/${forkId}/upstream`)
      .set('X-CSRF-Token', forker.csrf)
      .send({ baseRevisionId: mine.id, theirsRevisionId: theirs.id, take: ['gear.spur', 'diff.rear.oil'] })
      .expect(201);
    await expectCounts(forker, forkId, [0, 1, 2]);
    await expectCounts(owner, original.id, [0, 3]);
  });

  it('importing a setup file stores 0 for its revision 1', async () => {
    const { carId, setup } = await carWithStockSetup(owner, stoat8n);
    await save(owner, setup.id, setup.currentRevision as Revision, { ...setup.currentRevision.values, 'gear.clutch-bell': 14 } as Values);
    const exported = await owner.agent.get(`/api/setups/${setup.id}/export.json`).expect(200);
    const imported = await owner.agent.post('/api/setups/import').set('X-CSRF-Token', owner.csrf).send({ carId, document: exported.body }).expect(201);
    expect(imported.body.setup.currentRevision.values['gear.clutch-bell']).toBe(14);
    await expectCounts(owner, imported.body.setup.id, [0]);
  });
});

describe('the migration’s backfill', () => {
  it('fills NULL counts in batches with the numbers diffSetupValues gives, and switches the immutability trigger back on', async () => {
    const { setup } = await carWithStockSetup(owner, stoat8n);
    const stock = setup.currentRevision.values as Values;
    const sheets: Values[] = [
      { ...stock, 'shock.front.oil': 600, 'shock.rear.oil': 500 },
      { ...stock, 'shock.front.oil': 600, 'shock.rear.oil': 500 },
      { ...stock, 'shock.front.oil': 600, 'diff.notes': 'Written by hand' },
      { 'gear.spur': 48 },
    ];
    const transaction = await t.db.sequelize.transaction();
    try {
      const run = (sql: string, replacements: Record<string, unknown> = {}) =>
        t.db.sequelize.query<Record<string, unknown>>(sql, { replacements, transaction, type: QueryTypes.SELECT });
      // As before the migration: rows without a count. Undone with the rest of this transaction.
      await t.db.sequelize.query('ALTER TABLE setup_revisions ALTER COLUMN changed_field_count DROP NOT NULL', { transaction });
      const [copy] = await run(
        `INSERT INTO setups (owner_id, car_id, vehicle_class, template_version, title, visibility, share_token)
         SELECT owner_id, car_id, vehicle_class, template_version, 'Backfill copy', 'private', md5(random()::text) FROM setups WHERE id = :id
         RETURNING id`,
        { id: setup.id },
      );
      const insert = (setupId: unknown, number: number, values: Values) =>
        run(
          `INSERT INTO setup_revisions (setup_id, number, values, change_note, author_id)
           SELECT :setupId, :number, CAST(:values AS jsonb), 'Old revision', owner_id FROM setups WHERE id = :setupId RETURNING id`,
          { setupId, number, values: JSON.stringify(values) },
        );
      // Interleaved ids across two setups, so "the revision before" must be found by number within the setup.
      for (const [i, sheet] of sheets.entries()) {
        await insert(setup.id, i + 2, sheet);
        await insert(copy.id, i + 1, i === 0 ? stock : sheets[i - 1]);
      }

      expect(await backfillChangedFieldCounts(t.db.sequelize, transaction, 3)).toBe(2 * sheets.length);

      const rows = (await run(
        'SELECT id, setup_id, number, values, changed_field_count FROM setup_revisions WHERE setup_id IN (:ids) ORDER BY setup_id, number',
        { ids: [setup.id, copy.id] },
      )) as StoredRow[];
      const counts = countsOf(rows);
      for (const c of counts) expect(c.stored).toBe(c.diffed);
      const fieldCount = Object.keys(stock).length;
      expect(counts.map((c) => c.stored)).toEqual([
        // The API-made setup: revision 1 kept its 0; then 2 oils, nothing, rear oil back and a note, a one-field sheet.
        0, 2, 0, 2, fieldCount + 1,
        // The copy, all filled here: its revision 1 counts 0 whatever it holds.
        0, 2, 0, 2,
      ]);
      expect(fieldCount).toBeGreaterThan(60);
      const [trigger] = await run("SELECT tgenabled FROM pg_trigger WHERE tgname = 'setup_revisions_no_update_or_delete'");
      expect(trigger.tgenabled).toBe('O');
    } finally {
      await transaction.rollback();
    }
    const [column] = await t.db.sequelize.query<{ is_nullable: string }>(
      "SELECT is_nullable FROM information_schema.columns WHERE table_name = 'setup_revisions' AND column_name = 'changed_field_count'",
      { type: QueryTypes.SELECT },
    );
    expect(column.is_nullable).toBe('NO');
  });

  it('refuses a batch size that is not a whole number ≥ 1', async () => {
    const transaction = await t.db.sequelize.transaction();
    try {
      await expect(backfillChangedFieldCounts(t.db.sequelize, transaction, 0)).rejects.toThrow('batchSize must be a whole number ≥ 1, got 0');
    } finally {
      await transaction.rollback();
    }
  });
});

describe('seeded worlds', () => {
  beforeAll(async () => {
    await resetDatabase(t.db);
    await seedDemoWorld(t.db, { bcryptCost: 4 });
    const client = await t.db.pool.connect();
    try {
      await seedScale(client, scaleSizes({ SCALE: '0.002' }), { bcryptCost: 4 });
    } finally {
      client.release();
    }
  }, 60_000);
  afterAll(async () => {
    await resetDatabase(t.db);
  });

  async function allCounts() {
    const { rows } = await t.db.pool.query<StoredRow & { handle: string }>(
      `SELECT r.id, r.setup_id, r.number, r.values, r.changed_field_count, u.handle
         FROM setup_revisions r JOIN setups s ON s.id = r.setup_id JOIN users u ON u.id = s.owner_id
        ORDER BY r.setup_id, r.number`,
    );
    return countsOf(rows).map((c, i) => ({ ...c, id: rows[i].id, setupId: rows[i].setup_id, generated: rows[i].handle.startsWith('racer_') }));
  }

  it('the demo seed and seed:scale store what diffSetupValues counts for every revision', async () => {
    const counts = await allCounts();
    expect(counts.filter((c) => c.stored !== c.diffed)).toEqual([]);
    // Both worlds have histories that change fields, not only first revisions.
    expect(counts.some((c) => !c.generated && c.stored! > 0)).toBe(true);
    // seed:scale moves, at every step after the first, each of the shock oils and the rear ride
    // height that the kit's stock sheet has (every demo kit has all three).
    const { rows: kits } = await t.db.pool.query<{ setup_id: number; stock: Values }>(
      `SELECT s.id AS setup_id, k.stock_values AS stock FROM setups s JOIN cars c ON c.id = s.car_id JOIN kits k ON k.id = c.kit_id
        JOIN users u ON u.id = s.owner_id WHERE u.handle LIKE 'racer\\_%'`,
    );
    const varied = new Map(kits.map((k) => [k.setup_id, ['shock.front.oil', 'shock.rear.oil', 'susp.rear.ride-height'].filter((key) => k.stock[key] !== undefined).length]));
    const generated = counts.filter((c) => c.generated);
    expect(generated.length).toBe(2000);
    expect(generated.filter((c) => c.stored !== (c.number === 1 ? 0 : varied.get(c.setupId)))).toEqual([]);
    expect(generated.some((c) => c.stored === 3)).toBe(true);
  });

  it('taking the migration down and up again backfills every revision with the count it was written with', async () => {
    const before = (await allCounts()).map((c) => [c.id, c.stored]);
    expect(before.length).toBeGreaterThan(1000);
    const context = { queryInterface: t.db.sequelize.getQueryInterface(), sequelize: t.db.sequelize };
    await down(context);
    await up(context);
    expect((await allCounts()).map((c) => [c.id, c.stored])).toEqual(before);
    // Still NOT NULL and still immutable.
    await expect(t.db.pool.query('INSERT INTO setup_revisions (setup_id, number, values, author_id) SELECT setup_id, 999, values, author_id FROM setup_revisions LIMIT 1')).rejects.toThrow(
      /changed_field_count/,
    );
    await expect(t.db.pool.query('UPDATE setup_revisions SET changed_field_count = 0 WHERE id = $1', [before[0][0]])).rejects.toThrow(/immutable/);
  }, 60_000);
});
