import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { compareByWilson, wilsonLowerBound } from '../../shared/compute/ranking';
import { discoverPageSchema, type DiscoverPage, type DiscoverSetup } from '../../shared/types/community';
import type { TrackTypeKey } from '../../shared/types/trackTypes';
import { discoverSetups } from '../../server/services/discover';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

let t: TestApp;
let juno: SessionAgent;
let pell: SessionAgent;
const cars: Record<string, number> = {};
let wren10: number;

type NewSetup = { title?: string; visibility?: 'public' | 'unlisted' | 'private'; trackType?: TrackTypeKey | null; temperatureC?: number | null };

async function carOn(s: SessionAgent, slug: string): Promise<number> {
  const res = await s.agent.post('/api/cars').set('X-CSRF-Token', s.csrf).send({ kitId: await kitId(t.db, slug), nickname: 'Club car' }).expect(201);
  return res.body.car.id;
}

async function makeSetup(s: SessionAgent, carId: number, opts: NewSetup = {}): Promise<number> {
  const res = await s.agent
    .post('/api/setups')
    .set('X-CSRF-Token', s.csrf)
    .send({
      carId,
      title: opts.title ?? 'Club night',
      visibility: opts.visibility ?? 'public',
      conditions: { trackType: opts.trackType ?? null, temperatureC: opts.temperatureC ?? null, grip: null },
      startFrom: { kind: 'stock' },
    })
    .expect(201);
  return res.body.setup.id;
}

async function racerSession(prefix: string): Promise<SessionAgent & { userId: number }> {
  const r = await createRacer(t.db, { prefix });
  return { ...(await signIn(t.app, r.handle, r.password)), userId: r.user.id };
}

/** Every page of a Discover query through the API, following nextCursor to the end. */
async function allPages(query: Record<string, string>): Promise<{ setups: DiscoverSetup[]; pages: DiscoverPage[] }> {
  const pages: DiscoverPage[] = [];
  let cursor: string | null = null;
  do {
    const res = await request(t.app)
      .get('/api/discover')
      .query(cursor ? { ...query, cursor } : query)
      .expect(200);
    const page = discoverPageSchema.parse(res.body);
    pages.push(page);
    cursor = page.nextCursor;
  } while (cursor && pages.length < 50);
  return { setups: pages.flatMap((p) => p.setups), pages };
}

const ids = (setups: DiscoverSetup[]) => setups.map((s) => s.id);

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  await ensureCatalog(t.db);
  wren10 = await kitId(t.db, 'marrowby-wren-10');
  juno = await racerSession('juno');
  pell = await racerSession('pell');
  cars.junoStoat8e = await carOn(juno, 'ottervale-stoat-8e');
  cars.junoWren10 = await carOn(juno, 'marrowby-wren-10');
  cars.pellGantry = await carOn(pell, 'cinderfell-gantry-t8');
  cars.pellStoat8e = await carOn(pell, 'ottervale-stoat-8e');
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(60_000);

describe('what Discover lists', () => {
  it('public setups of racers in good standing only: not private, unlisted, hidden, deleted, or a suspended racer\'s', async () => {
    const listed = await makeSetup(juno, cars.junoStoat8e, { title: 'Listed' });
    const priv = await makeSetup(juno, cars.junoStoat8e, { visibility: 'private' });
    const unlisted = await makeSetup(juno, cars.junoStoat8e, { visibility: 'unlisted' });
    const hidden = await makeSetup(juno, cars.junoStoat8e);
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: hidden } });
    const deleted = await makeSetup(juno, cars.junoStoat8e);
    await juno.agent.delete(`/api/setups/${deleted}`).set('X-CSRF-Token', juno.csrf).expect(204);

    const banned = await racerSession('banned');
    const benched = await racerSession('benched');
    const back = await racerSession('back');
    const bannedSetup = await makeSetup(banned, await carOn(banned, 'ottervale-stoat-8n'));
    const benchedSetup = await makeSetup(benched, await carOn(benched, 'ottervale-stoat-8n'));
    const backSetup = await makeSetup(back, await carOn(back, 'ottervale-stoat-8n'));
    await t.db.models.User.update({ suspendedIndefinitely: true }, { where: { id: banned.userId } });
    await t.db.models.User.update({ suspendedUntil: new Date(Date.now() + 86_400_000) }, { where: { id: benched.userId } });
    await t.db.models.User.update({ suspendedUntil: new Date(Date.now() - 60_000) }, { where: { id: back.userId } });

    for (const sort of ['newest', 'most-forked']) {
      const found = ids((await allPages({ sort })).setups);
      expect(found).toEqual(expect.arrayContaining([listed, backSetup]));
      for (const gone of [priv, unlisted, hidden, deleted, bannedSetup, benchedSetup]) expect(found).not.toContain(gone);
    }
    const best = ids((await allPages({ sort: 'best-for', bestFor: 'turf' })).setups);
    expect(best).toContain(listed);
    expect(best).not.toContain(hidden);
  });

  it('describes each setup with its kit, maker, racer and conditions', async () => {
    const id = await makeSetup(pell, cars.pellGantry, { title: 'Brackwater ruts', trackType: 'rough-bumpy', temperatureC: 14.5 });
    const card = (await allPages({ kit: String(await kitId(t.db, 'cinderfell-gantry-t8')) })).setups.find((s) => s.id === id);
    expect(card).toMatchObject({
      title: 'Brackwater ruts',
      kitName: 'Gantry T8',
      makerName: 'Cinderfell Racing Models',
      vehicleClass: 'truggy-1-8-nitro',
      trackType: 'rough-bumpy',
      temperatureC: 14.5,
      forkCount: 0,
      revisionCount: 1,
      votes: null,
    });
  });
});

describe('filters', () => {
  let dusty20: number, dusty28: number, clay18: number, noTemp: number, gantry: number;
  beforeAll(async () => {
    dusty20 = await makeSetup(juno, cars.junoStoat8e, { trackType: 'loose-dusty', temperatureC: 20 });
    dusty28 = await makeSetup(pell, cars.pellStoat8e, { trackType: 'loose-dusty', temperatureC: 28 });
    clay18 = await makeSetup(juno, cars.junoWren10, { trackType: 'indoor-clay', temperatureC: 18 });
    noTemp = await makeSetup(juno, cars.junoStoat8e, { trackType: 'loose-dusty' });
    gantry = await makeSetup(pell, cars.pellGantry, { trackType: 'loose-dusty', temperatureC: 22 });
  });

  it('by class', async () => {
    const { setups } = await allPages({ class: 'buggy-1-10-4wd' });
    expect(setups.every((s) => s.vehicleClass === 'buggy-1-10-4wd')).toBe(true);
    expect(ids(setups)).toContain(clay18);
    expect(ids(setups)).not.toContain(dusty20);
  });

  it('by kit', async () => {
    const { setups } = await allPages({ kit: String(wren10) });
    expect(setups.every((s) => s.kitId === wren10)).toBe(true);
    expect(ids(setups)).toEqual(expect.arrayContaining([clay18]));
    expect(ids(setups)).not.toContain(gantry);
  });

  it('by track type', async () => {
    const { setups } = await allPages({ trackType: 'loose-dusty' });
    expect(setups.every((s) => s.trackType === 'loose-dusty')).toBe(true);
    expect(ids(setups)).toEqual(expect.arrayContaining([dusty20, dusty28, noTemp, gantry]));
    expect(ids(setups)).not.toContain(clay18);
  });

  it('by temperature range, bounds included; a setup without a temperature is left out of any range', async () => {
    const { setups } = await allPages({ tempMin: '20', tempMax: '22' });
    expect(setups.every((s) => s.temperatureC !== null && s.temperatureC >= 20 && s.temperatureC <= 22)).toBe(true);
    expect(ids(setups)).toEqual(expect.arrayContaining([dusty20, gantry]));
    for (const out of [dusty28, clay18, noTemp]) expect(ids(setups)).not.toContain(out);
    expect(ids((await allPages({ tempMin: '25' })).setups)).toContain(dusty28);
    expect(ids((await allPages({ tempMax: '18.5' })).setups)).toContain(clay18);
  });

  it('all together', async () => {
    const { setups } = await allPages({ class: 'buggy-1-8-electric', trackType: 'loose-dusty', tempMin: '19', tempMax: '30', sort: 'most-forked' });
    expect(ids(setups)).toEqual(expect.arrayContaining([dusty20, dusty28]));
    for (const out of [clay18, noTemp, gantry]) expect(ids(setups)).not.toContain(out);
    const fits = (s: DiscoverSetup) => s.vehicleClass === 'buggy-1-8-electric' && s.trackType === 'loose-dusty' && s.temperatureC! >= 19 && s.temperatureC! <= 30;
    expect(setups.every(fits)).toBe(true);
  });
});

describe('orders', () => {
  it('newest: by when the setup was started, newest first', async () => {
    const older = await makeSetup(juno, cars.junoWren10, { title: 'Older' });
    const newer = await makeSetup(juno, cars.junoWren10, { title: 'Newer' });
    const { setups, pages } = await allPages({});
    expect(ids(setups).indexOf(newer)).toBeLessThan(ids(setups).indexOf(older));
    const times = setups.map((s) => Date.parse(s.createdAt));
    expect(times).toEqual([...times].sort((a, b) => b - a));
    expect(pages[0].explanation).toMatch(/^Newest first/);
  });

  it('most forked: by forks that are neither deleted nor hidden, kept equal to a recount', async () => {
    const two = await makeSetup(juno, cars.junoStoat8e, { title: 'Forked twice' });
    const one = await makeSetup(juno, cars.junoStoat8e, { title: 'Forked once' });
    const fork = (id: number) => pell.agent.post(`/api/setups/${id}/forks`).set('X-CSRF-Token', pell.csrf).send({ carId: cars.pellStoat8e }).expect(201);
    for (let i = 0; i < 4; i += 1) await fork(two);
    const forksOfTwo = await t.db.models.Setup.findAll({ where: { forkedFromSetupId: two }, order: [['id', 'ASC']] });
    await pell.agent.delete(`/api/setups/${forksOfTwo[0].id}`).set('X-CSRF-Token', pell.csrf).expect(204);
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: forksOfTwo[1].id } });
    await fork(one);
    const unhidden = (await fork(one)).body.setup.id as number;
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: unhidden } });
    await t.db.models.Setup.update({ hiddenAt: null }, { where: { id: unhidden } });
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: unhidden } });

    const { setups, pages } = await allPages({ sort: 'most-forked' });
    expect(setups.find((s) => s.id === two)?.forkCount).toBe(2);
    expect(setups.find((s) => s.id === one)?.forkCount).toBe(1);
    expect(ids(setups).indexOf(two)).toBeLessThan(ids(setups).indexOf(one));
    const counts = setups.map((s) => s.forkCount);
    expect(counts).toEqual([...counts].sort((a, b) => b - a));
    expect(pages[0].explanation).toMatch(/^Most forked first/);

    const drift = await t.db.sequelize.query(
      `SELECT s.id, s.fork_count, (SELECT count(*)::int FROM setups f WHERE f.forked_from_setup_id = s.id AND f.deleted_at IS NULL AND f.hidden_at IS NULL) AS recount
         FROM setups s WHERE s.fork_count <> (SELECT count(*) FROM setups f WHERE f.forked_from_setup_id = s.id AND f.deleted_at IS NULL AND f.hidden_at IS NULL)`,
      { type: QueryTypes.SELECT },
    );
    expect(drift).toEqual([]);
  });

  describe('best for a track type', () => {
    let voterIds: number[] = [];
    beforeAll(async () => {
      const rows = await t.db.sequelize.query<{ id: number }>(
        "INSERT INTO users (handle, display_name, created_at, updated_at) SELECT 'fan-' || g, 'Fan ' || g, now(), now() FROM generate_series(1, 110) g RETURNING id",
        { type: QueryTypes.SELECT },
      );
      voterIds = rows.map((r) => r.id);
    });

    /** `works` racers say it works on `trackType`, the next `fails` say it doesn't (written as rows; the trigger counts them). */
    async function tally(setupId: number, trackType: TrackTypeKey, works: number, fails: number) {
      const voters = voterIds.slice(0, works + fails);
      await t.db.sequelize.query(
        'INSERT INTO setup_votes (user_id, setup_id, track_type, works) SELECT v.id, :setupId, :trackType, v.n <= :works FROM unnest(ARRAY[:voters]::int[]) WITH ORDINALITY AS v (id, n)',
        { replacements: { setupId, trackType, works, voters: voters.length ? voters : [0] } },
      );
    }

    it('ranks by the Wilson lower bound (Evan Miller 2009: 10/1 above 40/20), never 3 for 3 above 90 for 100, unvoted last', async () => {
      const make = (title: string) => makeSetup(pell, cars.pellStoat8e, { title });
      const tallies: Array<[string, number, number]> = [
        ['Three of three', 3, 0],
        ['Forty of sixty', 40, 20],
        ['Ten of eleven', 10, 1],
        ['Ninety of a hundred', 90, 10],
        ['Nought of four', 0, 4],
      ];
      const made = new Map<number, [number, number]>();
      for (const [title, works, fails] of tallies) {
        const id = await make(title);
        made.set(id, [works, fails]);
        await tally(id, 'loamy', works, fails);
      }
      const unvoted = await make('Nobody tried it on loam');
      // Votes for another surface do not move the loamy order.
      await tally(unvoted, 'turf', 50, 0);

      const { setups, pages } = await allPages({ sort: 'best-for', bestFor: 'loamy' });
      const mine = setups.filter((s) => made.has(s.id) || s.id === unvoted);
      expect(mine.map((s) => s.title)).toEqual(['Ninety of a hundred', 'Ten of eleven', 'Forty of sixty', 'Three of three', 'Nought of four', 'Nobody tried it on loam']);
      const ten = mine.find((s) => s.title === 'Ten of eleven')!;
      expect(ten.votes).toEqual({ trackType: 'loamy', works: 10, fails: 1, wilson: expect.any(Number) });
      expect(Number(ten.votes!.wilson.toFixed(4))).toBe(0.6226);
      expect(mine.at(-1)!.votes).toEqual({ trackType: 'loamy', works: 0, fails: 0, wilson: 0 });

      // The whole list: voted setups best first by the same comparison the app uses, then every unvoted one.
      const tallyList = setups.map((s) => ({ works: s.votes!.works, fails: s.votes!.fails }));
      expect(tallyList).toEqual([...tallyList].sort(compareByWilson));
      for (const s of setups) expect(s.votes!.wilson).toBeCloseTo(wilsonLowerBound(s.votes!.works, s.votes!.fails), 7);
      expect(pages[0].explanation).toMatch(/Best for Loamy first/);
      expect(pages[0].explanation).toMatch(/Wilson score interval/);
      expect(pages[0].explanation).toMatch(/3 of 3 ranks below 90 of 100/);
    });

    it('moves a setup up when racers vote it works', async () => {
      const a = await makeSetup(juno, cars.junoWren10, { title: 'Rising' });
      const b = await makeSetup(juno, cars.junoWren10, { title: 'Steady' });
      await tally(b, 'blue-groove', 6, 1);
      const before = ids((await allPages({ sort: 'best-for', bestFor: 'blue-groove' })).setups);
      expect(before.indexOf(b)).toBeLessThan(before.indexOf(a));
      await tally(a, 'blue-groove', 30, 0);
      const after = ids((await allPages({ sort: 'best-for', bestFor: 'blue-groove' })).setups);
      expect(after.indexOf(a)).toBeLessThan(after.indexOf(b));
    });
  });
});

describe('pages (keyset cursors)', () => {
  beforeAll(async () => {
    // Enough listed setups for more than one API page of 20 in every order.
    for (let i = 0; i < 22; i += 1) await makeSetup(juno, cars.junoWren10, { title: `Wren page filler ${i}`, trackType: 'loamy' });
  });

  it.each([
    [{}],
    [{ sort: 'most-forked' }],
    [{ sort: 'best-for', bestFor: 'loamy' }],
    [{ class: 'buggy-1-10-4wd', sort: 'best-for', bestFor: 'loamy' }],
  ])('pages of any size join up to the whole list, once each, for %j', async (query) => {
    const whole = await discoverSetups(t.db, query, 1_000);
    expect(whole.nextCursor).toBeNull();
    for (const size of [1, 2, 7]) {
      const seen: number[] = [];
      let cursor: string | undefined;
      do {
        const page = await discoverSetups(t.db, { ...query, ...(cursor ? { cursor } : {}) }, size);
        expect(page.setups.length).toBeLessThanOrEqual(size);
        seen.push(...ids(page.setups));
        cursor = page.nextCursor ?? undefined;
      } while (cursor);
      expect(seen).toEqual(ids(whole.setups));
    }
  });

  it('serves 20 a page through the API with a cursor to the next', async () => {
    const { pages, setups } = await allPages({});
    expect(pages.length).toBeGreaterThan(1);
    expect(pages[0].setups).toHaveLength(20);
    expect(pages.at(-1)!.nextCursor).toBeNull();
    expect(new Set(ids(setups)).size).toBe(setups.length);
  });

  it('keeps its place when new setups arrive between pages', async () => {
    const first = await discoverSetups(t.db, {}, 5);
    const arrived = await makeSetup(pell, cars.pellGantry, { title: 'Arrived mid-scroll' });
    const rest = await discoverSetups(t.db, { cursor: first.nextCursor! }, 1_000);
    const before = (await discoverSetups(t.db, {}, 1_000)).setups.filter((s) => s.id !== arrived);
    expect([...ids(first.setups), ...ids(rest.setups)]).toEqual(ids(before));
  });
});

describe('bad input gets a clear 400', () => {
  it.each([
    [{ sort: 'loudest' }, 'Sort by newest, most-forked or best-for.'],
    [{ sort: 'best-for' }, 'Pick the track type to rank for (bestFor).'],
    [{ sort: 'best-for', bestFor: 'ice' }, 'Pick the track type to rank for from the list.'],
    [{ class: 'monster-truck' }, 'Pick a class from the list.'],
    [{ trackType: 'snow' }, 'Pick a track type from the list.'],
    [{ kit: 'stoat' }, 'kit must be a number, such as 3.'],
    [{ kit: '0' }, 'kit must be from 1 to 2147483647.'],
    [{ tempMin: 'warm' }, 'tempMin must be a number, such as 15.'],
    [{ tempMax: '99' }, 'tempMax must be from -30 to 60.'],
    [{ tempMin: '30', tempMax: '10' }, 'The highest temperature must be at or above the lowest.'],
    [{ cursor: 'not-a-cursor' }, 'That page link does not fit this list; start again from the top.'],
  ])('%j', async (query, message) => {
    const res = await request(t.app).get('/api/discover').query(query).expect(400);
    expect(res.body.error).toMatchObject({ code: 'validation_failed', message });
  });

  it('refuses a cursor of another order, or one whose key was edited', async () => {
    const newest = await discoverSetups(t.db, {}, 1);
    await request(t.app).get('/api/discover').query({ sort: 'most-forked', cursor: newest.nextCursor! }).expect(400);
    const edited = Buffer.from(JSON.stringify({ o: 'newest', t: "2026-13-45T00:00:00.000000Z'; --", id: 1 })).toString('base64url');
    await request(t.app).get('/api/discover').query({ cursor: edited }).expect(400);
    const badWilson = Buffer.from(JSON.stringify({ o: 'best-for', p: 'voted', w: '1e9', id: 1 })).toString('base64url');
    await request(t.app).get('/api/discover').query({ sort: 'best-for', bestFor: 'turf', cursor: badWilson }).expect(400);
  });

  it('refuses a parameter given twice', async () => {
    const res = await request(t.app).get('/api/discover?kit=1&kit=2').expect(400);
    expect(res.body.error.message).toBe('Give kit once, as a number.');
  });

  it('treats an empty parameter as "any"', async () => {
    const res = await request(t.app).get('/api/discover?class=&kit=&trackType=&tempMin=&tempMax=').expect(200);
    expect(discoverPageSchema.parse(res.body).setups.length).toBeGreaterThan(0);
  });
});
