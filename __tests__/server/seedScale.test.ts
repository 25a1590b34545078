import type { PoolClient } from 'pg';
import { seedDemoWorld } from '../../server/seeders';
import { FOLLOW_BACKFILL } from '../../server/db/migrations/20261202T1200-feed-items';
import { scaleSizes, seedScale, type ScaleResult, type ScaleSizes } from '../../scripts/seed-scale';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/*
 * The generated world of npm run seed:scale, at a tiny scale on the test database: sizes, the
 * references between the generated rows, the counts the triggers maintain, and the skew.
 */
describe('seed:scale generator', () => {
  let t: TestApp;
  let client: PoolClient;
  let sizes: ScaleSizes;
  let result: ScaleResult;
  const one = async <T>(sql: string): Promise<T> => (await client.query(sql)).rows[0] as T;

  beforeAll(async () => {
    t = buildTestApp();
    await resetDatabase(t.db);
    await seedDemoWorld(t.db, { bcryptCost: 4 });
    client = await t.db.pool.connect();
    sizes = scaleSizes({ SCALE: '0.004' });
    result = await seedScale(client, sizes, { bcryptCost: 4 });
  }, 60_000);

  afterAll(async () => {
    client.release();
    await resetDatabase(t.db);
    await t.close();
  });

  it('reads its sizes from SCALE with floors, and refuses a nonsense scale with a clear message', () => {
    expect(sizes).toMatchObject({ racers: 40, setups: 400, revisions: 4000, votes: 2000, forkShare: 0.1 });
    // 300 × 0.004 = 1,200 follows cannot fit 40 racers well: capped at 30 % of the 40 × 39 pairs.
    expect(sizes.follows).toBe(Math.floor(0.3 * 40 * 39));
    expect(scaleSizes({ SCALE: '1' })).toMatchObject({ racers: 10_000, setups: 100_000, revisions: 1_000_000, votes: 500_000, follows: 300_000 });
    expect(scaleSizes({ SCALE: '0.5', SCALE_VOTES: '1234' }).votes).toBe(1234);
    expect(() => scaleSizes({ SCALE: 'lots' })).toThrow('SCALE must be a number ≥ 0, got "lots"');
  });

  it('fills every table to the planned size and times each one', async () => {
    const kits = await one<{ n: number }>('SELECT count(*)::int AS n FROM kits');
    expect(result.counts).toEqual({
      racers: sizes.racers,
      cars: sizes.racers * kits.n,
      setups: sizes.setups,
      forks: Math.round(sizes.setups * sizes.forkShare),
      revisions: sizes.revisions,
      votes: sizes.votes,
      follows: sizes.follows,
    });
    expect(result.timings.map((x) => x.table)).toEqual(
      expect.arrayContaining(['users', 'cars', 'setups', 'setup_revisions', 'follows', 'setup_votes']),
    );
  });

  it('refuses to run twice on one database, and leaves it as it was', async () => {
    await expect(seedScale(client, sizes, { bcryptCost: 4 })).rejects.toThrow('already has generated racers');
    expect((await one<{ n: number }>(`SELECT count(*)::int AS n FROM setups`)).n).toBeGreaterThanOrEqual(sizes.setups);
  });

  it('links setups, revisions and forks consistently', async () => {
    const broken = await one<Record<string, number>>(`
      WITH gen AS (SELECT s.* FROM setups s JOIN users u ON u.id = s.owner_id WHERE u.handle LIKE 'racer\\_%'),
           revs AS (SELECT setup_id, count(*)::int AS n, max(number) AS top, max(id) AS last_id FROM setup_revisions GROUP BY setup_id)
      SELECT
        (SELECT count(*) FROM gen g LEFT JOIN revs r ON r.setup_id = g.id
          WHERE r.n IS DISTINCT FROM g.revision_count OR r.top <> r.n OR r.last_id <> g.current_revision_id)::int AS bad_history,
        (SELECT count(*) FROM gen g JOIN setup_revisions r ON r.id = g.current_revision_id WHERE r.author_id <> g.owner_id)::int AS bad_author,
        (SELECT count(*) FROM gen g JOIN cars c ON c.id = g.car_id WHERE c.owner_id <> g.owner_id)::int AS foreign_car,
        (SELECT count(*) FROM gen g JOIN setups src ON src.id = g.forked_from_setup_id
           JOIN cars gc ON gc.id = g.car_id JOIN cars sc ON sc.id = src.car_id
          WHERE src.visibility <> 'public' OR gc.kit_id <> sc.kit_id OR g.forked_from_revision_id <> src.current_revision_id
             OR g.family_root_id IS DISTINCT FROM coalesce(src.family_root_id, src.id))::int AS bad_fork,
        (SELECT count(*) FROM gen g WHERE g.search_context NOT LIKE '%' || (SELECT handle FROM users WHERE id = g.owner_id))::int AS bad_search,
        (SELECT count(*) FROM setup_revisions r JOIN gen g ON g.id = r.setup_id
          WHERE NOT (r.values ? 'shock.front.oil') OR jsonb_typeof(r.values -> 'shock.front.oil') <> 'number')::int AS bad_values,
        (SELECT count(*) FROM follows WHERE follower_id = followee_id)::int AS self_follows,
        (SELECT count(*) FROM setup_votes v JOIN setups s ON s.id = v.setup_id WHERE v.user_id = s.owner_id OR s.visibility <> 'public')::int AS bad_votes`);
    expect(broken).toEqual({ bad_history: 0, bad_author: 0, foreign_car: 0, bad_fork: 0, bad_search: 0, bad_values: 0, self_follows: 0, bad_votes: 0 });
  });

  it('leaves the trigger-maintained counts equal to a recount', async () => {
    const drift = await one<{ votes: number; forks: number }>(`
      SELECT
        (SELECT count(*) FROM (SELECT setup_id, track_type, count(*) FILTER (WHERE works)::int AS w, count(*) FILTER (WHERE NOT works)::int AS f
                                 FROM setup_votes GROUP BY 1, 2) v
           FULL JOIN setup_vote_counts c USING (setup_id, track_type)
          WHERE coalesce(v.w, 0) <> coalesce(c.works, 0) OR coalesce(v.f, 0) <> coalesce(c.fails, 0))::int AS votes,
        (SELECT count(*) FROM setups s
          WHERE s.fork_count <> (SELECT count(*) FROM setups f WHERE f.forked_from_setup_id = s.id AND f.deleted_at IS NULL AND f.hidden_at IS NULL))::int AS forks`);
    expect(drift).toEqual({ votes: 0, forks: 0 });
    // The generator switched the counting triggers off for its bulk inserts; they must be on again.
    const { rows } = await client.query(
      `SELECT tgname, tgenabled FROM pg_trigger
        WHERE tgname IN ('setups_fork_count_on_insert_delete', 'setup_votes_counts_on_insert_delete') ORDER BY tgname`,
    );
    expect(rows).toEqual([
      { tgname: 'setup_votes_counts_on_insert_delete', tgenabled: 'O' },
      { tgname: 'setups_fork_count_on_insert_delete', tgenabled: 'O' },
    ]);
  });

  it("fills each reader's feed with the newest listed changes of every racer they follow, and its triggers are on again", async () => {
    // Recomputed another way than the generator's window query: per follow, a LATERAL walk of the
    // followee's listed setups and revisions newest first, cut at FOLLOW_BACKFILL.
    const drift = await one<{ missing: number; extra: number; follows: number }>(`
      WITH expected AS (
        SELECT f.follower_id AS reader_id, x.created_at, x.kind, x.item_id
          FROM follows f
          JOIN users u ON u.id = f.follower_id AND u.handle LIKE 'racer\\_%'
          CROSS JOIN LATERAL (
            SELECT * FROM (SELECT s.created_at, 'setup' AS kind, s.id AS item_id FROM setups s
                            WHERE s.owner_id = f.followee_id AND s.visibility = 'public' AND s.hidden_at IS NULL AND s.deleted_at IS NULL
                           UNION ALL
                           SELECT r.created_at, 'revision', r.id FROM setups s JOIN setup_revisions r ON r.setup_id = s.id
                            WHERE s.owner_id = f.followee_id AND r.number > 1
                              AND s.visibility = 'public' AND s.hidden_at IS NULL AND s.deleted_at IS NULL) y
             ORDER BY y.created_at DESC, y.kind DESC, y.item_id DESC LIMIT ${FOLLOW_BACKFILL}) x),
      -- Generated readers only: the demo world's feeds were written live by the triggers, uncut.
      actual AS (SELECT fi.reader_id, fi.created_at, fi.kind, fi.item_id FROM feed_items fi
                   JOIN users u ON u.id = fi.reader_id AND u.handle LIKE 'racer\\_%' WHERE fi.kind <> 'fork')
      SELECT (SELECT count(*) FROM (SELECT * FROM expected EXCEPT SELECT * FROM actual) m)::int AS missing,
             (SELECT count(*) FROM (SELECT * FROM actual EXCEPT SELECT * FROM expected) e)::int AS extra,
             (SELECT count(*) FROM follows f JOIN users u ON u.id = f.follower_id AND u.handle LIKE 'racer\\_%')::int AS follows`);
    expect(drift.follows).toBeGreaterThan(100);
    expect(drift).toMatchObject({ missing: 0, extra: 0 });
    const forks = await one<{ missing: number }>(`
      SELECT count(*)::int AS missing FROM setups s
       WHERE s.forked_from_owner_id <> s.owner_id
         AND NOT EXISTS (SELECT 1 FROM feed_items fi WHERE fi.reader_id = s.forked_from_owner_id AND fi.kind = 'fork' AND fi.item_id = s.id)`);
    expect(forks.missing).toBe(0);
    const { rows } = await client.query(
      `SELECT tgname, tgenabled FROM pg_trigger
        WHERE tgname IN ('setups_feed_fan_out', 'setup_revisions_feed_fan_out', 'follows_feed_backfill', 'follows_feed_unfollow') ORDER BY tgname`,
    );
    expect(rows.map((r: { tgenabled: string }) => r.tgenabled)).toEqual(['O', 'O', 'O', 'O']);
  });

  // The thresholds are common practice, no source: a log-uniform draw gives rank r a share ∝ 1/r
  // (Zipf's law with exponent 1), so the top tenth takes several times its uniform share of 10 %.
  it('skews follows, forks and votes towards a few popular racers and setups', async () => {
    const follows = await one<{ top_share: number; top_rank: number }>(`
      WITH per AS (SELECT followee_id, count(*) AS n FROM follows GROUP BY 1),
           ranked AS (SELECT u.handle, p.n, row_number() OVER (ORDER BY p.n DESC, u.id) AS rn FROM per p JOIN users u ON u.id = p.followee_id)
      SELECT (SELECT sum(n) FROM ranked WHERE rn <= ${sizes.racers / 10})::float / (SELECT sum(n) FROM ranked) AS top_share,
             (SELECT substring(handle FROM 7)::int FROM ranked WHERE rn = 1) AS top_rank`);
    expect(follows.top_share).toBeGreaterThan(0.2);
    expect(follows.top_rank).toBeLessThanOrEqual(3);

    const forks = await one<{ top_share: number }>(`
      WITH origins AS (SELECT s.id, s.fork_count, row_number() OVER (ORDER BY s.fork_count DESC, s.id) AS rn, count(*) OVER () AS total
                         FROM setups s JOIN users u ON u.id = s.owner_id
                        WHERE u.handle LIKE 'racer\\_%' AND s.forked_from_setup_id IS NULL AND s.visibility = 'public')
      SELECT (SELECT sum(fork_count) FROM origins WHERE rn <= total / 10)::float / (SELECT sum(fork_count) FROM origins) AS top_share`);
    expect(forks.top_share).toBeGreaterThan(0.25);

    const votes = await one<{ top_share: number }>(`
      WITH per AS (SELECT setup_id, count(*) AS n FROM setup_votes GROUP BY 1),
           listed AS (SELECT count(*) AS total FROM setups s JOIN users u ON u.id = s.owner_id WHERE u.handle LIKE 'racer\\_%' AND s.visibility = 'public'),
           ranked AS (SELECT n, row_number() OVER (ORDER BY n DESC, setup_id) AS rn FROM per)
      SELECT (SELECT sum(n) FROM ranked WHERE rn <= (SELECT total FROM listed) / 10)::float / (SELECT sum(n) FROM ranked) AS top_share`);
    expect(votes.top_share).toBeGreaterThan(0.3);
  });
});
