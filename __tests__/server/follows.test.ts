import type { PoolClient } from 'pg';
import request from 'supertest';
import type { FeedItem, FeedPage, FollowList } from '../../shared/types/community';
import { FOLLOW_BACKFILL } from '../../server/db/migrations/20261202T1200-feed-items';
import { FEED_PAGE_SIZE, trimFeeds } from '../../server/services/feed';
import { FOLLOW_PAGE_SIZE } from '../../server/services/follows';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

type Racer = { id: number; handle: string; s: SessionAgent };

let t: TestApp;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  // Suggestions rank every racer in the database: start from the demo world alone.
  await resetDatabase(t.db);
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
});
afterAll(async () => {
  await t.close();
});

async function racer(prefix = 'racer'): Promise<Racer> {
  const r = await createRacer(t.db, { prefix });
  return { id: r.user.id, handle: r.handle, s: await signIn(t.app, r.handle, r.password) };
}
const write = (who: Racer, method: 'post' | 'patch' | 'delete', url: string, body: object = {}) =>
  who.s.agent[method](url).set('X-CSRF-Token', who.s.csrf).send(body);
const follow = (who: Racer, whom: Racer) => write(who, 'post', `/api/racers/${whom.handle}/follow`).expect(200);

async function publicSetup(owner: Racer, title: string, kit = stoat8n, visibility: 'public' | 'private' | 'unlisted' = 'public') {
  return (await carWithStockSetup(owner.s, kit, { title, visibility })).setup.id;
}

/** Saves a new revision that thickens the rear shock oil a little; answers its id. */
async function revise(owner: Racer, setupId: number, changeNote: string): Promise<number> {
  const current = (await owner.s.agent.get(`/api/setups/${setupId}`).expect(200)).body.setup.currentRevision;
  const values = { ...current.values, 'shock.rear.oil': (current.values['shock.rear.oil'] as number) + 10 };
  const res = await write(owner, 'post', `/api/setups/${setupId}/revisions`, { baseRevisionId: current.id, values, changeNote }).expect(201);
  return res.body.setup.currentRevision.id;
}

async function forkOf(who: Racer, setupId: number, visibility: 'public' | 'private' = 'public', kit = stoat8n): Promise<number> {
  const car = await write(who, 'post', '/api/cars', { kitId: kit, nickname: 'Fork car' }).expect(201);
  const fork = await write(who, 'post', `/api/setups/${setupId}/forks`, { carId: car.body.car.id }).expect(201);
  if (visibility === 'public') await write(who, 'patch', `/api/setups/${fork.body.setup.id}`, { visibility: 'public' }).expect(200);
  return fork.body.setup.id;
}

async function feedPage(who: Racer, cursor?: string | null): Promise<FeedPage> {
  const res = await who.s.agent.get(`/api/feed${cursor ? `?cursor=${encodeURIComponent(cursor)}` : ''}`).expect(200);
  return res.body;
}
const key = (item: FeedItem) => `${item.kind}:${item.id}`;

describe('following racers', () => {
  it('follows and unfollows a racer, with the counts and lists on both profiles', async () => {
    const [me, juno] = [await racer('me'), await racer('juno')];
    const followed = await follow(me, juno);
    expect(followed.body.follow).toEqual({ handle: juno.handle, followerCount: 1, followingCount: 0, followedByMe: true, canFollow: true });
    // Following again changes nothing.
    expect((await follow(me, juno)).body.follow.followerCount).toBe(1);
    const followers: FollowList = (await request(t.app).get(`/api/racers/${juno.handle}/followers`).expect(200)).body;
    expect(followers.racers.map((r) => r.handle)).toEqual([me.handle]);
    const following: FollowList = (await request(t.app).get(`/api/racers/${me.handle}/following`).expect(200)).body;
    expect(following.racers.map((r) => r.handle)).toEqual([juno.handle]);
    const mine = (await request(t.app).get(`/api/racers/${me.handle}/follow`).expect(200)).body.follow;
    expect(mine).toMatchObject({ followerCount: 0, followingCount: 1, followedByMe: null, canFollow: false });

    const unfollowed = await write(me, 'delete', `/api/racers/${juno.handle}/follow`).expect(200);
    expect(unfollowed.body.follow).toMatchObject({ followerCount: 0, followedByMe: false });
    expect((await request(t.app).get(`/api/racers/${juno.handle}/followers`).expect(200)).body.racers).toEqual([]);
  });

  it('refuses following yourself with a message, in the API and in the database', async () => {
    const me = await racer('self');
    const res = await write(me, 'post', `/api/racers/${me.handle}/follow`);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ message: 'You cannot follow yourself.', details: { handle: 'You cannot follow yourself.' } });
    await expect(t.db.pool.query('INSERT INTO follows (follower_id, followee_id) VALUES ($1, $1)', [me.id])).rejects.toThrow(/follows_not_self_check/);
    const mine = (await me.s.agent.get(`/api/racers/${me.handle}/follow`).expect(200)).body.follow;
    expect(mine).toMatchObject({ followerCount: 0, followingCount: 0, followedByMe: false, canFollow: false });
  });

  it('answers 404 for a racer who does not exist and 401 to a follow without signing in', async () => {
    const me = await racer();
    expect((await write(me, 'post', '/api/racers/nobody-by-this-name/follow')).status).toBe(404);
    expect((await request(t.app).get('/api/racers/nobody-by-this-name/followers')).status).toBe(404);
    const anonymous = await request(t.app).get(`/api/racers/${me.handle}/follow`).expect(200);
    expect(anonymous.body.follow).toMatchObject({ followedByMe: null, canFollow: false });
  });

  it('pages followers newest first, with ties on the time kept apart by racer, and leaves suspended racers out', async () => {
    const star = await racer('star');
    const fans = await Promise.all(Array.from({ length: FOLLOW_PAGE_SIZE + 3 }, () => createRacer(t.db, { prefix: 'fan', password: null })));
    // Three fans at each second: the keyset must order within a tie, not only by time.
    await t.db.pool.query(
      `INSERT INTO follows (follower_id, followee_id, created_at)
       SELECT f, $2, timestamptz '2026-12-01 10:00:00Z' + (i / 3) * interval '1 second'
         FROM unnest($1::int[]) WITH ORDINALITY AS x(f, i)`,
      [fans.map((f) => f.user.id), star.id],
    );
    await fans[0].user.update({ suspendedIndefinitely: true });
    const first: FollowList = (await request(t.app).get(`/api/racers/${star.handle}/followers`).expect(200)).body;
    expect(first.racers).toHaveLength(FOLLOW_PAGE_SIZE);
    const second: FollowList = (await request(t.app).get(`/api/racers/${star.handle}/followers?cursor=${first.nextCursor}`).expect(200)).body;
    expect(second.nextCursor).toBeNull();
    const seen = [...first.racers, ...second.racers].map((r) => r.handle);
    // Expected order: newest follow first, then the higher racer id (common practice, no source).
    const expected = fans
      .map((f, i) => ({ handle: f.handle, id: f.user.id, second: Math.floor((i + 1) / 3) }))
      .filter((f) => f.id !== fans[0].user.id)
      .sort((a, b) => b.second - a.second || b.id - a.id)
      .map((f) => f.handle);
    expect(seen).toEqual(expected);
    expect((await request(t.app).get(`/api/racers/${star.handle}/follow`).expect(200)).body.follow.followerCount).toBe(FOLLOW_PAGE_SIZE + 2);
  });
});

describe('the activity feed', () => {
  it('shows new public setups and revisions (with the change note) of racers I follow, newest first', async () => {
    const [me, juno, stranger] = [await racer('me'), await racer('juno'), await racer('stranger')];
    await follow(me, juno);
    const first = await publicSetup(juno, 'Hollow Pines — loose and dusty');
    const change = await revise(juno, first, 'Thicker rear oil for the ruts.\nSecond line.');
    const second = await publicSetup(juno, 'Saltmarsh — wet grass');
    await publicSetup(stranger, 'Not followed');
    const page = await feedPage(me);
    expect(page.items.map(key)).toEqual([`setup:${second}`, `revision:${change}`, `setup:${first}`]);
    expect(page.items[1]).toMatchObject({
      kind: 'revision',
      actor: { handle: juno.handle },
      setup: { id: first, title: 'Hollow Pines — loose and dusty', vehicleClass: 'buggy-1-8-nitro' },
      revision: { number: 2, changeNote: 'Thicker rear oil for the ruts.\nSecond line.' },
    });
    expect(page.nextCursor).toBeNull();
  });

  it('shows public forks of my setups by anyone, once each, and not private forks or my own', async () => {
    const [me, followed, stranger] = [await racer('me'), await racer('followed'), await racer('stranger')];
    await follow(me, followed);
    const mine = await publicSetup(me, 'My sheet');
    const byStranger = await forkOf(stranger, mine);
    const byFollowed = await forkOf(followed, mine);
    await forkOf(stranger, mine, 'private');
    await forkOf(me, mine);
    const page = await feedPage(me);
    expect(page.items.map(key)).toEqual([`fork:${byFollowed}`, `fork:${byStranger}`]);
    expect(page.items[1]).toMatchObject({ kind: 'fork', actor: { handle: stranger.handle }, original: { id: mine, title: 'My sheet' } });
  });

  it('never shows private, unlisted, hidden or deleted setups, nor anything of a suspended racer', async () => {
    const [me, juno, suspended] = [await racer('me'), await racer('juno'), await racer('suspended')];
    await follow(me, juno);
    await follow(me, suspended);
    const shown = await publicSetup(juno, 'Shown');
    await publicSetup(juno, 'Private', stoat8n, 'private');
    const unlisted = await publicSetup(juno, 'Unlisted', stoat8n, 'unlisted');
    await revise(juno, unlisted, 'Unlisted change');
    const hidden = await publicSetup(juno, 'Hidden');
    await revise(juno, hidden, 'Hidden change');
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: hidden } });
    const deleted = await publicSetup(juno, 'Deleted');
    await revise(juno, deleted, 'Deleted change');
    await write(juno, 'delete', `/api/setups/${deleted}`).expect(204);
    const unshared = await publicSetup(juno, 'Made private later');
    await revise(juno, unshared, 'Before unsharing');
    await write(juno, 'patch', `/api/setups/${unshared}`, { visibility: 'private' }).expect(200);
    const theirs = await publicSetup(suspended, 'By a suspended racer');
    await t.db.models.User.update({ suspendedUntil: new Date(Date.now() + 86_400_000) }, { where: { id: suspended.id } });

    expect((await feedPage(me)).items.map(key)).toEqual([`setup:${shown}`]);
    // A suspension that has ended shows the racer again.
    await t.db.models.User.update({ suspendedUntil: new Date(Date.now() - 1000) }, { where: { id: suspended.id } });
    expect((await feedPage(me)).items.map(key)).toEqual([`setup:${theirs}`, `setup:${shown}`]);
  });

  it('keeps its cursor stable when new items arrive between pages, across ties in time and kind', async () => {
    const [me, juno, forker] = [await racer('me'), await racer('juno'), await racer('forker')];
    await follow(me, juno);
    const setup = await publicSetup(juno, 'Busy sheet');
    const mine = await publicSetup(me, 'Mine to fork');
    const fork = await forkOf(forker, mine);
    // 46 revisions, three per second (one in the newest), and the setup and the fork on the same
    // second as three of them. Laid out so that page 1 ends on the setup, with revisions and the fork
    // of the same second still to come, and page 2 ends inside a second of three revisions.
    const { rows } = await t.db.pool.query<{ id: number; at: Date }>(
      `INSERT INTO setup_revisions (setup_id, number, values, change_note, author_id, changed_field_count, created_at)
       SELECT $1, 100 + i, '{}', 'Bulk change ' || i, $2,
              -- An empty sheet: the first drops every field of the sheet before it, the rest change none.
              CASE WHEN i = 0 THEN (SELECT count(*)::int FROM jsonb_object_keys(
                                      (SELECT values FROM setup_revisions WHERE setup_id = $1 ORDER BY number DESC LIMIT 1)))
                   ELSE 0 END,
              timestamptz '2026-11-01 08:00:00Z' + (i / 3) * interval '1 second'
         FROM generate_series(0, 45) AS i
       RETURNING id, created_at AS at`,
      [setup, juno.id],
    );
    await t.db.pool.query(`UPDATE setups SET created_at = timestamptz '2026-11-01 08:00:08Z' WHERE id IN ($1, $2)`, [setup, fork]);
    const kinds = { fork: 0, revision: 1, setup: 2 };
    // Expected order: newest first, then kind, then id, all descending (common practice, no source).
    const expected = [
      ...rows.map((r) => ({ key: `revision:${r.id}`, at: r.at.getTime(), kind: kinds.revision, id: r.id })),
      { key: `setup:${setup}`, at: Date.parse('2026-11-01T08:00:08Z'), kind: kinds.setup, id: setup },
      { key: `fork:${fork}`, at: Date.parse('2026-11-01T08:00:08Z'), kind: kinds.fork, id: fork },
    ]
      .sort((a, b) => b.at - a.at || b.kind - a.kind || b.id - a.id)
      .map((e) => e.key);

    const first = await feedPage(me);
    expect(first.items).toHaveLength(FEED_PAGE_SIZE);
    expect(first.items.map(key).slice(-1)).toEqual([`setup:${setup}`]);
    // Newer activity meanwhile: a new revision now, and a new public setup.
    const fresh = await revise(juno, setup, 'Arrived between pages');
    const freshSetup = await publicSetup(juno, 'Also new');
    const second = await feedPage(me, first.nextCursor);
    expect(second.items[FEED_PAGE_SIZE - 1].kind).toBe('revision');
    const third = await feedPage(me, second.nextCursor);
    expect(third.nextCursor).toBeNull();
    const seen = [...first.items, ...second.items, ...third.items].map(key);
    expect(seen).toEqual(expected);
    expect((await feedPage(me)).items.slice(0, 2).map(key)).toEqual([`setup:${freshSetup}`, `revision:${fresh}`]);
  });

  it("brings a newly followed racer's newest listed changes in, and takes them out again on unfollowing (forks of mine stay)", async () => {
    const [me, juno] = [await racer('me'), await racer('juno')];
    const older = await publicSetup(juno, 'Older sheet');
    await publicSetup(juno, 'Kept to myself', stoat8n, 'private');
    const sheet = await publicSetup(juno, 'Busy sheet');
    // 25 revisions, one a second: with the two setups, more than FOLLOW_BACKFILL changes.
    const { rows } = await t.db.pool.query<{ id: number }>(
      // The sheet as it stands each time (nothing changed: a count of 0), dated ahead of now.
      `INSERT INTO setup_revisions (setup_id, number, values, change_note, author_id, changed_field_count, created_at)
       SELECT $1, 100 + i, (SELECT values FROM setup_revisions WHERE setup_id = $1 AND number = 1), 'Change ' || i, $2, 0,
              now() + i * interval '1 second'
         FROM generate_series(1, 25) AS i
       RETURNING id`,
      [sheet, juno.id],
    );
    const mine = await publicSetup(me, 'Mine to fork');
    const fork = await forkOf(juno, mine);
    await follow(me, juno);
    const newest = [...rows].reverse().slice(0, FOLLOW_BACKFILL).map((r) => `revision:${r.id}`);
    const seen: string[] = [];
    for (let page = await feedPage(me); ; page = await feedPage(me, page.nextCursor)) {
      seen.push(...page.items.map(key));
      if (!page.nextCursor) break;
    }
    // Their newest FOLLOW_BACKFILL changes (the revisions are dated ahead), then their fork of my
    // setup, told once as a fork; the private setup and the older changes stay on their profile.
    expect(seen).toEqual([...newest, `fork:${fork}`]);
    expect(seen).not.toContain(`setup:${older}`);

    await write(me, 'delete', `/api/racers/${juno.handle}/follow`).expect(200);
    expect((await feedPage(me)).items.map(key)).toEqual([`fork:${fork}`]);
  });

  it('copies nothing of private setups into followers\' feeds, and brings a setup in when moderators restore it', async () => {
    const [me, juno] = [await racer('me'), await racer('juno')];
    await follow(me, juno);
    const draft = await publicSetup(juno, 'Still a draft', stoat8n, 'private');
    await revise(juno, draft, 'Private tinkering');
    const rows = async () => (await t.db.pool.query<{ n: number }>('SELECT count(*)::int AS n FROM feed_items WHERE reader_id = $1', [me.id])).rows[0].n;
    expect(await rows()).toBe(0);

    const shown = await publicSetup(juno, 'Hidden, then restored');
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: shown } });
    const change = await revise(juno, shown, 'Saved while hidden');
    expect((await feedPage(me)).items).toEqual([]);
    await t.db.models.Setup.update({ hiddenAt: null }, { where: { id: shown } });
    expect((await feedPage(me)).items.map(key)).toEqual([`revision:${change}`, `setup:${shown}`]);
  });

  describe('a save and a follow or unfollow of its racer at the same moment', () => {
    /** Runs `racing` on a second connection while `first` holds its transaction open, and checks that it waited. */
    async function whileOpen(first: (c: PoolClient) => Promise<void>, racing: string, params: unknown[]) {
      const [a, b] = [await t.db.pool.connect(), await t.db.pool.connect()];
      try {
        await a.query('BEGIN');
        await first(a);
        const pid = (await b.query<{ pid: number }>('SELECT pg_backend_pid() AS pid')).rows[0].pid;
        const raced = b.query(racing, params);
        for (let i = 0; ; i++) {
          const { rows } = await t.db.pool.query<{ w: string | null }>('SELECT wait_event_type AS w FROM pg_stat_activity WHERE pid = $1', [pid]);
          if (rows[0]?.w === 'Lock') break;
          if (i > 200) throw new Error('the racing statement never waited for the open save');
          await new Promise((r) => setTimeout(r, 25));
        }
        await a.query('COMMIT');
        await raced;
      } finally {
        a.release();
        b.release();
      }
    }
    const saveRevision = (setupId: number, authorId: number, note: string) => async (c: PoolClient) => {
      await c.query(
        `INSERT INTO setup_revisions (setup_id, number, values, change_note, author_id, changed_field_count)
         SELECT $1, 50, values, $3, $2, 0 FROM setup_revisions WHERE setup_id = $1 AND number = 1`,
        [setupId, authorId, note],
      );
    };

    it('a new follower still gets the change saved as they followed', async () => {
      const [me, juno] = [await racer('me'), await racer('juno')];
      const sheet = await publicSetup(juno, 'Raced sheet');
      await whileOpen(saveRevision(sheet, juno.id, 'Saved as I followed'), 'INSERT INTO follows (follower_id, followee_id) VALUES ($1, $2)', [me.id, juno.id]);
      const items = (await feedPage(me)).items;
      expect(items.map((i) => i.kind)).toEqual(['revision', 'setup']);
      expect(items[0]).toMatchObject({ revision: { number: 50, changeNote: 'Saved as I followed' } });
    });

    it('an unfollow takes out the change saved as it happened', async () => {
      const [me, juno] = [await racer('me'), await racer('juno')];
      const sheet = await publicSetup(juno, 'Raced sheet');
      await follow(me, juno);
      await whileOpen(saveRevision(sheet, juno.id, 'Saved as they unfollowed'), 'DELETE FROM follows WHERE follower_id = $1 AND followee_id = $2', [me.id, juno.id]);
      expect((await feedPage(me)).items).toEqual([]);
    });
  });

  it('shows the whole history of a setup made public after its revisions were saved', async () => {
    const [me, juno] = [await racer('me'), await racer('juno')];
    await follow(me, juno);
    const later = await publicSetup(juno, 'Shared later', stoat8n, 'private');
    const change = await revise(juno, later, 'Made while private');
    expect((await feedPage(me)).items).toEqual([]);
    await write(juno, 'patch', `/api/setups/${later}`, { visibility: 'public' }).expect(200);
    expect((await feedPage(me)).items.map(key)).toEqual([`revision:${change}`, `setup:${later}`]);
  });

  it('keeps each feed to its newest items when trimmed, leaving shorter feeds alone', async () => {
    const [me, other, juno] = [await racer('me'), await racer('other'), await racer('juno')];
    const sheet = await publicSetup(juno, 'Busy sheet');
    await follow(me, juno);
    await follow(other, juno);
    // 12 changes one second apart for me (beside the setup), 3 for the other reader.
    await t.db.pool.query(
      `INSERT INTO feed_items (reader_id, created_at, kind, item_id, actor_id)
       SELECT r.reader, timestamptz '2026-11-01 08:00:00Z' + i * interval '1 second', 'revision', 900000 + i, $3
         FROM (VALUES ($1::integer, 12), ($2::integer, 3)) AS r(reader, n), generate_series(1, r.n) AS i`,
      [me.id, other.id, juno.id],
    );
    const left = (id: number) => t.db.pool.query<{ at: Date }>('SELECT created_at AS at FROM feed_items WHERE reader_id = $1 ORDER BY created_at DESC', [id]);
    const before = (await left(me.id)).rows;
    expect(before).toHaveLength(13);
    const dropped = await trimFeeds(t.db, 10);
    // Other feeds in this database may be trimmed too: only mine and the other reader's are counted here.
    expect(dropped).toBeGreaterThanOrEqual(3);
    expect((await left(me.id)).rows).toEqual(before.slice(0, 10));
    expect((await left(other.id)).rows).toHaveLength(4);
    expect((await feedPage(me)).items[0]).toMatchObject({ kind: 'setup', id: sheet });
    await expect(trimFeeds(t.db, 0)).rejects.toThrow('keep must be a whole number ≥ 1, got 0');
  });

  it('refuses a damaged cursor with a 400 that says what to do', async () => {
    const me = await racer();
    for (const cursor of ['not-a-cursor', Buffer.from('["2026-01-01", "setup", 1]').toString('base64url'), Buffer.from('["2026-12-01T10:00:00.000000Z", "vote", 1]').toString('base64url')]) {
      const res = await me.s.agent.get(`/api/feed?cursor=${cursor}`);
      expect(res.status).toBe(400);
      expect(res.body.error.details.cursor).toBe('That page link is damaged or out of date. Reload the list from the top.');
    }
    expect((await me.s.agent.get('/api/feed?cursor=a&cursor=b')).status).toBe(400);
  });

  it('is for signed-in racers only', async () => {
    expect((await request(t.app).get('/api/feed')).status).toBe(401);
  });
});

describe('suggestions for an empty feed', () => {
  it('suggests the most-forked racers in the classes I race, leaving out those I follow and suspended racers', async () => {
    const wren2 = await kitId(t.db, 'marrowby-wren-10-two');
    const wren4 = await kitId(t.db, 'marrowby-wren-10');
    const [me, most, some, none, followed, otherClass, suspended] = await Promise.all(
      ['me', 'most', 'some', 'none', 'followed', 'other', 'suspended'].map((p) => racer(`sg-${p}`)),
    );
    const forkers = await Promise.all([racer('fk'), racer('fk'), racer('fk')]);
    await t.db.models.User.update({ classesRaced: ['buggy-1-10-2wd'] }, { where: { id: me.id } });
    const mostSetup = await publicSetup(most, 'Most forked', wren2);
    for (const f of forkers) await forkOf(f, mostSetup, 'private', wren2);
    await forkOf(most, mostSetup, 'private', wren2); // their own fork does not count
    await forkOf(forkers[0], await publicSetup(some, 'Some', wren2), 'private', wren2);
    await publicSetup(none, 'Not forked yet', wren2);
    await forkOf(forkers[0], await publicSetup(followed, 'Followed', wren2), 'private', wren2);
    await follow(me, followed);
    for (const f of forkers) await forkOf(f, await publicSetup(otherClass, 'Other class', wren4), 'private', wren4);
    await forkOf(forkers[1], await publicSetup(suspended, 'Suspended', wren2), 'private', wren2);
    await t.db.models.User.update({ suspendedIndefinitely: true }, { where: { id: suspended.id } });

    // Ranking by forks by others, then public setups, then handle (common practice, no source).
    const res = await me.s.agent.get('/api/feed/suggestions').expect(200);
    expect(res.body.classes).toEqual(['buggy-1-10-2wd']);
    expect(res.body.racers).toEqual([
      { handle: most.handle, displayName: expect.any(String), forkCount: 3, setupCount: 1 },
      { handle: some.handle, displayName: expect.any(String), forkCount: 1, setupCount: 1 },
      { handle: none.handle, displayName: expect.any(String), forkCount: 0, setupCount: 1 },
    ]);
  });
});
