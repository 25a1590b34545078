import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { wilsonLowerBound } from '../../shared/compute/ranking';
import { setupVotesResponseSchema, type SetupVotes } from '../../shared/types/community';
import { TRACK_TYPES } from '../../shared/types/trackTypes';
import { OWN_SETUP_MESSAGE } from '../../server/services/votes';
import { createRacer, csrfAgent, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

let t: TestApp;
let author: SessionAgent;
let voter: SessionAgent;
let stoat8e: number;

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  await ensureCatalog(t.db);
  stoat8e = await kitId(t.db, 'ottervale-stoat-8e');
  const [a, v] = await Promise.all([createRacer(t.db, { prefix: 'author' }), createRacer(t.db, { prefix: 'voter' })]);
  author = await signIn(t.app, a.handle, a.password);
  voter = await signIn(t.app, v.handle, v.password);
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(60_000);

async function publicSetup(visibility: 'public' | 'unlisted' | 'private' = 'public') {
  return (await carWithStockSetup(author, stoat8e, { visibility, title: 'Saltmarsh hard-pack' })).setup;
}

function vote(s: SessionAgent, setupId: number, trackType: string, works: unknown) {
  return s.agent.put(`/api/setups/${setupId}/votes/${trackType}`).set('X-CSRF-Token', s.csrf).send({ works });
}

function withdraw(s: SessionAgent, setupId: number, trackType: string) {
  return s.agent.delete(`/api/setups/${setupId}/votes/${trackType}`).set('X-CSRF-Token', s.csrf);
}

function tallyOf(votes: SetupVotes, trackType: string) {
  const row = votes.trackTypes.find((r) => r.trackType === trackType);
  if (!row) throw new Error(`no ${trackType} in ${JSON.stringify(votes)}`);
  return row;
}

describe('voting by track type', () => {
  it('counts a "works here" vote, shows it as mine, changes it to "doesn\'t work" and withdraws it', async () => {
    const setup = await publicSetup();
    const cast = setupVotesResponseSchema.parse((await vote(voter, setup.id, 'loose-dusty', true).expect(200)).body).votes;
    expect(tallyOf(cast, 'loose-dusty')).toMatchObject({ works: 1, fails: 0, myVote: 'works' });
    expect(tallyOf(cast, 'loose-dusty').wilson).toBeCloseTo(wilsonLowerBound(1, 0), 7);
    expect(cast.canVote).toBe(true);

    const changed = setupVotesResponseSchema.parse((await vote(voter, setup.id, 'loose-dusty', false).expect(200)).body).votes;
    expect(tallyOf(changed, 'loose-dusty')).toMatchObject({ works: 0, fails: 1, wilson: 0, myVote: 'fails' });

    const gone = setupVotesResponseSchema.parse((await withdraw(voter, setup.id, 'loose-dusty').expect(200)).body).votes;
    expect(tallyOf(gone, 'loose-dusty')).toMatchObject({ works: 0, fails: 0, wilson: 0, myVote: null });
  });

  it('keeps one vote per racer, setup and track type however often it is sent', async () => {
    const setup = await publicSetup();
    for (let i = 0; i < 3; i += 1) await vote(voter, setup.id, 'turf', true).expect(200);
    const [{ n }] = await t.db.sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM setup_votes WHERE setup_id = :id', {
      replacements: { id: setup.id },
      type: QueryTypes.SELECT,
    });
    expect(n).toBe(1);
    const { votes } = setupVotesResponseSchema.parse((await request(t.app).get(`/api/setups/${setup.id}/votes`).expect(200)).body);
    expect(tallyOf(votes, 'turf')).toMatchObject({ works: 1, fails: 0, myVote: null });
  });

  it('keeps each track type separate and lists every track type of the fixed list, in order', async () => {
    const setup = await publicSetup();
    await vote(voter, setup.id, 'indoor-clay', true).expect(200);
    const { votes } = setupVotesResponseSchema.parse((await vote(voter, setup.id, 'wet-muddy', false).expect(200)).body);
    expect(votes.trackTypes.map((r) => r.trackType)).toEqual(TRACK_TYPES.map((tt) => tt.key));
    expect(tallyOf(votes, 'indoor-clay')).toMatchObject({ works: 1, fails: 0, myVote: 'works' });
    expect(tallyOf(votes, 'wet-muddy')).toMatchObject({ works: 0, fails: 1, myVote: 'fails' });
    expect(tallyOf(votes, 'loamy')).toMatchObject({ works: 0, fails: 0, myVote: null });
  });

  it('withdrawing a vote that is not there changes nothing', async () => {
    const setup = await publicSetup();
    const { votes } = setupVotesResponseSchema.parse((await withdraw(voter, setup.id, 'loamy').expect(200)).body);
    expect(votes.trackTypes.every((r) => r.works === 0 && r.fails === 0)).toBe(true);
  });
});

describe('who may vote on what', () => {
  it('refuses the author with a message saying why, and tells the author so when reading the votes', async () => {
    const setup = await publicSetup();
    const res = await vote(author, setup.id, 'loose-dusty', true).expect(403);
    expect(res.body.error).toMatchObject({ code: 'forbidden', message: OWN_SETUP_MESSAGE });
    const { votes } = setupVotesResponseSchema.parse((await author.agent.get(`/api/setups/${setup.id}/votes`).expect(200)).body);
    expect(votes).toMatchObject({ canVote: false, cannotVoteReason: OWN_SETUP_MESSAGE });
    await withdraw(author, setup.id, 'loose-dusty').expect(403);
  });

  it('asks anonymous readers to sign in: the counts are public, voting is not', async () => {
    const setup = await publicSetup();
    await vote(voter, setup.id, 'blue-groove', true).expect(200);
    const { votes } = setupVotesResponseSchema.parse((await request(t.app).get(`/api/setups/${setup.id}/votes`).expect(200)).body);
    expect(votes.canVote).toBe(false);
    expect(votes.cannotVoteReason).toMatch(/Sign in/);
    expect(tallyOf(votes, 'blue-groove')).toMatchObject({ works: 1, myVote: null });
    const anonymous = await csrfAgent(t.app);
    const res = await vote(anonymous, setup.id, 'blue-groove', true).expect(401);
    expect(res.body.error.message).toBe('Sign in to do that.');
  });

  it('opens votes on public setups only: private and deleted are not found, unlisted says it is not public, hidden is closed', async () => {
    const priv = await publicSetup('private');
    expect((await vote(voter, priv.id, 'turf', true)).status).toBe(404);

    const unlisted = await publicSetup('unlisted');
    expect((await vote(voter, unlisted.id, 'turf', true)).status).toBe(404);
    const viaLink = setupVotesResponseSchema.parse(
      (await voter.agent.get(`/api/setups/${unlisted.id}/votes?share=${unlisted.shareToken}`).expect(200)).body,
    ).votes;
    expect(viaLink).toMatchObject({ canVote: false, cannotVoteReason: 'Votes open once the owner makes this setup public.' });

    const hidden = await publicSetup();
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: hidden.id } });
    expect((await vote(voter, hidden.id, 'turf', true)).status).toBe(404);

    const deleted = await publicSetup();
    await author.agent.delete(`/api/setups/${deleted.id}`).set('X-CSRF-Token', author.csrf).expect(204);
    expect((await vote(voter, deleted.id, 'turf', true)).status).toBe(404);
    expect((await request(t.app).get(`/api/setups/${deleted.id}/votes`)).status).toBe(404);
  });

  it('tells a moderator who can see a hidden setup that voting is closed', async () => {
    const setup = await publicSetup();
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: setup.id } });
    const mod = await createRacer(t.db, { role: 'moderator' });
    const modSession = await signIn(t.app, mod.handle, mod.password);
    const res = await vote(modSession, setup.id, 'turf', true).expect(403);
    expect(res.body.error.message).toBe('Voting is closed while moderators review this setup.');
  });
});

describe('the answer to a vote', () => {
  async function read(setupId: number, s: SessionAgent) {
    return setupVotesResponseSchema.parse((await s.agent.get(`/api/setups/${setupId}/votes`).expect(200)).body).votes;
  }

  // The write statement recounts the voted track type itself (the trigger runs after it); the
  // source of truth it is checked against is the trigger-maintained counts that a read returns.
  it('is exactly what a read returns afterwards, with other racers\' votes on the same and other track types', async () => {
    const setup = await publicSetup();
    const others = await Promise.all(Array.from({ length: 4 }, () => createRacer(t.db, { prefix: 'crowd' })));
    await t.db.sequelize.query(
      `INSERT INTO setup_votes (user_id, setup_id, track_type, works)
       SELECT u.id, :setupId, tt, (u.id + length(tt)) % 3 <> 0 FROM users u, unnest(ARRAY['loose-dusty', 'turf']) AS tt WHERE u.id IN (:ids)`,
      { replacements: { setupId: setup.id, ids: others.map((o) => o.user.id) } },
    );
    const steps: Array<[string, boolean | null]> = [
      ['loose-dusty', true], ['loose-dusty', true], ['loose-dusty', false], ['turf', false], ['loose-dusty', null], ['loose-dusty', null], ['loamy', null], ['loamy', true],
    ];
    for (const [trackType, works] of steps) {
      const res = works === null ? await withdraw(voter, setup.id, trackType).expect(200) : await vote(voter, setup.id, trackType, works).expect(200);
      const answered = setupVotesResponseSchema.parse(res.body).votes;
      expect(answered).toEqual(await read(setup.id, voter));
      expect(tallyOf(answered, trackType).myVote).toBe(works === null ? null : works ? 'works' : 'fails');
    }
    await expectCountsEqualRecount();
  });

  it('agrees with itself when one racer sends the same vote, or both choices, several times at once', async () => {
    const setup = await publicSetup();
    const same = await Promise.all(Array.from({ length: 6 }, () => vote(voter, setup.id, 'hard-packed', true).expect(200)));
    for (const res of same) expect(tallyOf(setupVotesResponseSchema.parse(res.body).votes, 'hard-packed')).toMatchObject({ works: 1, fails: 0, myVote: 'works' });

    const mixed = await Promise.all(Array.from({ length: 6 }, (_, i) => vote(voter, setup.id, 'indoor-clay', i % 2 === 0).expect(200)));
    for (const res of mixed) {
      const row = tallyOf(setupVotesResponseSchema.parse(res.body).votes, 'indoor-clay');
      expect(row.works + row.fails).toBe(1);
      expect(row.myVote).toBe(row.works === 1 ? 'works' : 'fails');
    }
    const after = tallyOf(await read(setup.id, voter), 'indoor-clay');
    expect(after.works + after.fails).toBe(1);
    await expectCountsEqualRecount();
  });

  it('refuses without writing: the author of a hidden or private setup is told it is theirs, a deleted one is not found', async () => {
    const hidden = await publicSetup();
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: hidden.id } });
    expect((await vote(author, hidden.id, 'turf', true).expect(403)).body.error).toMatchObject({ code: 'forbidden', message: OWN_SETUP_MESSAGE });
    const priv = await publicSetup('private');
    expect((await vote(author, priv.id, 'turf', false).expect(403)).body.error.message).toBe(OWN_SETUP_MESSAGE);
    expect((await withdraw(author, priv.id, 'turf').expect(403)).body.error.message).toBe(OWN_SETUP_MESSAGE);
    const deleted = await publicSetup();
    await author.agent.delete(`/api/setups/${deleted.id}`).set('X-CSRF-Token', author.csrf).expect(204);
    await vote(author, deleted.id, 'turf', true).expect(404);
    const [{ n }] = await t.db.sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM setup_votes WHERE setup_id IN (:ids)', {
      replacements: { ids: [hidden.id, priv.id, deleted.id] },
      type: QueryTypes.SELECT,
    });
    expect(n).toBe(0);
  });

  it('withdrawing follows the same rules: hidden is not found for racers and closed for moderators, private is not found', async () => {
    const hidden = await publicSetup();
    await vote(voter, hidden.id, 'turf', true).expect(200);
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: hidden.id } });
    await withdraw(voter, hidden.id, 'turf').expect(404);
    const mod = await createRacer(t.db, { role: 'moderator' });
    const modSession = await signIn(t.app, mod.handle, mod.password);
    expect((await withdraw(modSession, hidden.id, 'turf').expect(403)).body.error.message).toBe('Voting is closed while moderators review this setup.');
    const priv = await publicSetup('private');
    await withdraw(modSession, priv.id, 'turf').expect(404);
    await vote(modSession, priv.id, 'turf', true).expect(404);
    const [{ n }] = await t.db.sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM setup_votes WHERE setup_id = :id', {
      replacements: { id: hidden.id },
      type: QueryTypes.SELECT,
    });
    expect(n).toBe(1);
  });

  it.each([['3000000000'], ['-1'], ['1.5'], ['99999999999999999999']])('answers 404 for the setup id %s', async (id) => {
    await voter.agent.put(`/api/setups/${id}/votes/turf`).set('X-CSRF-Token', voter.csrf).send({ works: true }).expect(404);
    await voter.agent.delete(`/api/setups/${id}/votes/turf`).set('X-CSRF-Token', voter.csrf).expect(404);
  });
});

describe('bad input gets a clear 400 and changes nothing', () => {
  it('names the track types when the one given is not on the list', async () => {
    const setup = await publicSetup();
    const res = await vote(voter, setup.id, 'ice-rink', true).expect(400);
    expect(res.body.error.message).toBe(`"ice-rink" is not a track type. Pick one of: ${TRACK_TYPES.map((tt) => tt.key).join(', ')}.`);
    expect(res.body.error.details).toHaveProperty('trackType');
  });

  it.each([[{}], [{ works: 'yes' }], [{ works: 1 }], [{ works: null }]])('refuses the body %j', async (body) => {
    const setup = await publicSetup();
    const res = await voter.agent.put(`/api/setups/${setup.id}/votes/turf`).set('X-CSRF-Token', voter.csrf).send(body).expect(400);
    expect(res.body.error.message).toBe('Say whether the setup works on this surface: works is true or false.');
    const { votes } = setupVotesResponseSchema.parse((await request(t.app).get(`/api/setups/${setup.id}/votes`).expect(200)).body);
    expect(tallyOf(votes, 'turf')).toMatchObject({ works: 0, fails: 0 });
  });

  it('answers 404 for a setup id that is not a number', async () => {
    expect((await vote(voter, Number.NaN, 'turf', true)).status).toBe(404);
    expect((await request(t.app).get('/api/setups/abc/votes')).status).toBe(404);
  });
});

type Recount = { setupId: number; trackType: string; works: number; fails: number };

async function recount(): Promise<Recount[]> {
  return t.db.sequelize.query<Recount>(
    `SELECT setup_id AS "setupId", track_type AS "trackType", count(*) FILTER (WHERE works)::int AS works, count(*) FILTER (WHERE NOT works)::int AS fails
       FROM setup_votes GROUP BY setup_id, track_type ORDER BY setup_id, track_type`,
    { type: QueryTypes.SELECT },
  );
}

async function maintained(): Promise<Array<Recount & { wilson: number }>> {
  return t.db.sequelize.query<Recount & { wilson: number }>(
    `SELECT setup_id AS "setupId", track_type AS "trackType", works, fails, wilson::float8 AS wilson
       FROM setup_vote_counts WHERE works + fails > 0 ORDER BY setup_id, track_type`,
    { type: QueryTypes.SELECT },
  );
}

/** The maintained counts (and their Wilson column) against a fresh count of every vote; returns the recount. */
async function expectCountsEqualRecount(): Promise<Recount[]> {
  const [counted, kept] = await Promise.all([recount(), maintained()]);
  expect(kept.map(({ wilson: _wilson, ...tally }) => tally)).toEqual(counted);
  for (const row of kept) expect(row.wilson).toBeCloseTo(wilsonLowerBound(row.works, row.fails), 7);
  return counted;
}

describe('maintained counts', () => {
  it('equal a recount of the votes after many racers vote, change and withdraw at once over many connections', async () => {
    const setups = [await publicSetup(), await publicSetup()];
    const trackTypes = ['loose-dusty', 'hard-packed', 'indoor-clay'];
    const racers = await Promise.all(Array.from({ length: 24 }, () => createRacer(t.db, { prefix: 'crowd' })));
    const sessions = await Promise.all(racers.map((r) => signIn(t.app, r.handle, r.password)));
    // Each racer's script is fixed by its index, so the run is repeatable; the interleaving is not.
    const script = (i: number) =>
      setups.flatMap((s, si) =>
        trackTypes.map((tt, ti) => async (session: SessionAgent) => {
          const step = (i + si * 3 + ti) % 5;
          if (step === 4) return withdraw(session, s.id, tt).expect(200);
          await vote(session, s.id, tt, step % 2 === 0).expect(200);
          if (step === 3) await vote(session, s.id, tt, true).expect(200);
          if (step === 1) await withdraw(session, s.id, tt).expect(200);
          return undefined;
        }),
      );
    await Promise.all(sessions.map(async (session, i) => Promise.all(script(i).map((run) => run(session)))));

    const counted = await expectCountsEqualRecount();
    expect(counted.reduce((sum, r) => sum + r.works + r.fails, 0)).toBeGreaterThan(60);

    const { votes } = setupVotesResponseSchema.parse((await request(t.app).get(`/api/setups/${setups[0].id}/votes`).expect(200)).body);
    for (const tt of trackTypes) {
      const truth = counted.find((r) => r.setupId === setups[0].id && r.trackType === tt) ?? { works: 0, fails: 0 };
      expect(tallyOf(votes, tt)).toMatchObject({ works: truth.works, fails: truth.fails });
    }
  });

  it('follow votes written straight into the table, and their removal with the voter\'s account', async () => {
    const setup = await publicSetup();
    const crowd = await Promise.all(Array.from({ length: 5 }, () => createRacer(t.db, { prefix: 'bulk' })));
    await t.db.sequelize.query(
      `INSERT INTO setup_votes (user_id, setup_id, track_type, works) SELECT u.id, :setupId, 'loamy', u.id % 2 = 0 FROM users u WHERE u.id IN (:ids)`,
      { replacements: { setupId: setup.id, ids: crowd.map((c) => c.user.id) } },
    );
    const before = (await expectCountsEqualRecount()).find((r) => r.setupId === setup.id && r.trackType === 'loamy');
    expect(before && before.works + before.fails).toBe(5);
    await t.db.sequelize.query('DELETE FROM users WHERE id = :id', { replacements: { id: crowd[0].user.id } });
    const after = (await expectCountsEqualRecount()).find((r) => r.setupId === setup.id && r.trackType === 'loamy');
    expect(after && after.works + after.fails).toBe(4);
  });
});

describe('the database and the app compute the same Wilson bound', () => {
  it('agrees with shared/compute/ranking to 7 decimals (it stores 8), and on Evan Miller\'s (2009) values', async () => {
    const pairs: Array<[number, number]> = [[209, 50], [118, 25], [10, 1], [40, 20], [0, 0], [0, 9], [1, 0], [3, 0], [90, 10], [12_345, 678]];
    for (let w = 0; w < 30; w += 7) for (let f = 0; f < 30; f += 5) pairs.push([w, f]);
    const rows = await t.db.sequelize.query<{ works: number; fails: number; wilson: string }>(
      `SELECT p.works, p.fails, wilson_lower_bound(p.works, p.fails)::text AS wilson
         FROM unnest(ARRAY[:works]::int[], ARRAY[:fails]::int[]) AS p (works, fails)`,
      { replacements: { works: pairs.map((p) => p[0]), fails: pairs.map((p) => p[1]) }, type: QueryTypes.SELECT },
    );
    expect(rows).toHaveLength(pairs.length);
    for (const row of rows) expect(Number(row.wilson)).toBeCloseTo(wilsonLowerBound(row.works, row.fails), 7);
    const byPair = new Map(rows.map((r) => [`${r.works}/${r.fails}`, Number(Number(r.wilson).toFixed(4))]));
    expect([byPair.get('209/50'), byPair.get('118/25'), byPair.get('10/1'), byPair.get('40/20'), byPair.get('0/0')]).toEqual([0.7545, 0.7546, 0.6226, 0.5406, 0]);
  });
});
