import { diffSetupValues } from '../../shared/compute/setup/diff';
import { CHANGE_NOTE_MAX } from '../../shared/types/setups';
import { getTemplate, listFields } from '../../shared/types/templates';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

type Values = Record<string, number | string | boolean>;
type Revision = { id: number; number: number; values: Values; changeNote: string };
type UpstreamRowBody = { key: string; label: string; section: string; base: unknown; theirs: unknown; mine: unknown; status: string };

let t: TestApp;
let author: SessionAgent;
let racer: SessionAgent;
let stranger: SessionAgent;
let authorHandle: string;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  const [a, b, c] = await Promise.all([createRacer(t.db), createRacer(t.db), createRacer(t.db)]);
  authorHandle = a.handle;
  author = await signIn(t.app, a.handle, a.password);
  racer = await signIn(t.app, b.handle, b.password);
  stranger = await signIn(t.app, c.handle, c.password);
});
afterAll(async () => {
  await t.close();
});

/** A setup of the author's with the given visibility, and the racer's fork of it. */
async function originalAndFork(visibility: 'public' | 'unlisted' = 'public', title = 'Saltmarsh sheet') {
  const { setup } = await carWithStockSetup(author, stoat8n, { visibility, title });
  const car = await racer.agent.post('/api/cars').set('X-CSRF-Token', racer.csrf).send({ kitId: stoat8n, nickname: 'My Stoat' }).expect(201);
  const forked = await racer.agent
    .post(`/api/setups/${setup.id}/forks`)
    .set('X-CSRF-Token', racer.csrf)
    .send({ carId: car.body.car.id, ...(visibility === 'unlisted' ? { share: setup.shareToken } : {}) })
    .expect(201);
  return { originalId: setup.id as number, original: setup.currentRevision as Revision, forkId: forked.body.setup.id as number, fork: forked.body.setup.currentRevision as Revision };
}

/** Saves a revision with some fields changed; answers the new current revision. */
async function edit(s: SessionAgent, setupId: number, base: Revision, changes: Values, changeNote = 'Tuning for the evening'): Promise<Revision> {
  const res = await s.agent
    .post(`/api/setups/${setupId}/revisions`)
    .set('X-CSRF-Token', s.csrf)
    .send({ baseRevisionId: base.id, values: { ...base.values, ...changes }, changeNote })
    .expect(201);
  return res.body.setup.currentRevision;
}

function upstream(s: SessionAgent, forkId: number) {
  return s.agent.get(`/api/setups/${forkId}/upstream`);
}

function apply(s: SessionAgent, forkId: number, body: object) {
  return s.agent.post(`/api/setups/${forkId}/upstream`).set('X-CSRF-Token', s.csrf).send(body);
}

async function rows(forkId: number): Promise<UpstreamRowBody[]> {
  const res = await upstream(racer, forkId).expect(200);
  expect(res.body.status).toBe('available');
  return res.body.rows;
}

async function currentOf(setupId: number): Promise<Revision & { revisionCount: number }> {
  const res = await racer.agent.get(`/api/setups/${setupId}`).expect(200);
  return { ...res.body.setup.currentRevision, revisionCount: res.body.setup.revisions.length };
}

describe('the original’s changes on offer', () => {
  it('offers each field the original changed since the fork, in sheet order with labels and sections', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const theirs = await edit(author, originalId, original, { 'shock.front.oil': 600, 'diff.rear.oil': 5000, 'gear.clutch-bell': 14 });
    const res = await upstream(racer, forkId).expect(200);
    expect(res.body).toMatchObject({
      status: 'available',
      original: { setupId: originalId, title: 'Saltmarsh sheet', ownerHandle: authorHandle, revisionId: theirs.id, revisionNumber: 2 },
      syncedRevisionNumber: 1,
      mineRevisionId: fork.id,
    });
    expect(res.body.rows).toEqual([
      { key: 'diff.rear.oil', label: 'Rear diff oil', section: 'Differentials', base: 3000, theirs: 5000, mine: 3000, status: 'theirs-only' },
      { key: 'gear.clutch-bell', label: 'Clutch bell', section: 'Gearing', base: 13, theirs: 14, mine: 13, status: 'theirs-only' },
      expect.objectContaining({ key: 'shock.front.oil', label: 'Front shock oil', base: 550, theirs: 600, mine: 550, status: 'theirs-only' }),
    ]);
  });

  // Three-way comparison against the last synced base, as version control merges files: common practice, no source.
  it('tells changes only the original made from conflicts, and leaves out fields only I changed or both changed alike', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    await edit(racer, forkId, fork, { 'diff.rear.oil': 4000, 'diff.front.oil': 5000, 'shock.rear.oil': 500 });
    await edit(author, originalId, original, { 'diff.rear.oil': 5000, 'gear.spur': 48, 'shock.rear.oil': 500 });
    expect(await rows(forkId)).toEqual([
      expect.objectContaining({ key: 'diff.rear.oil', base: 3000, theirs: 5000, mine: 4000, status: 'conflict' }),
      expect.objectContaining({ key: 'gear.spur', base: 46, theirs: 48, mine: 46, status: 'theirs-only' }),
    ]);
  });

  it('answers not-a-fork for a setup of my own that was not forked', async () => {
    const { setup } = await carWithStockSetup(racer, stoat8n);
    expect((await upstream(racer, setup.id).expect(200)).body).toEqual({ status: 'not-a-fork' });
  });

  it('is the fork owner’s alone: 404 for everyone else, signed in or not', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const theirs = await edit(author, originalId, original, { 'gear.spur': 48 });
    expect((await upstream(author, forkId)).status).toBe(404);
    expect((await upstream(stranger, forkId)).status).toBe(404);
    const refused = await apply(stranger, forkId, { baseRevisionId: fork.id, theirsRevisionId: theirs.id, take: ['gear.spur'] });
    expect(refused.status).toBe(404);
    expect((await currentOf(forkId)).id).toBe(fork.id);
  });
});

describe('when the original is gone or no longer shared', () => {
  it('is unavailable once the original is deleted, and taking changes then leaves the fork as it was', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const theirs = await edit(author, originalId, original, { 'gear.spur': 48 });
    await author.agent.delete(`/api/setups/${originalId}`).set('X-CSRF-Token', author.csrf).expect(204);
    expect((await upstream(racer, forkId).expect(200)).body).toEqual({ status: 'unavailable' });
    const res = await apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: theirs.id, take: ['gear.spur'] });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/no longer be taken/);
    const after = await currentOf(forkId);
    expect(after).toMatchObject({ id: fork.id, revisionCount: 1 });
    expect(after.values).toEqual(fork.values);
  });

  it('is unavailable once the original is made private or hidden by a moderator', async () => {
    const made = await originalAndFork();
    await author.agent.patch(`/api/setups/${made.originalId}`).set('X-CSRF-Token', author.csrf).send({ visibility: 'private' }).expect(200);
    expect((await upstream(racer, made.forkId).expect(200)).body).toEqual({ status: 'unavailable' });

    const hidden = await originalAndFork();
    await t.db.models.Setup.update({ hiddenAt: new Date() }, { where: { id: hidden.originalId } });
    expect((await upstream(racer, hidden.forkId).expect(200)).body).toEqual({ status: 'unavailable' });
  });

  it('stays available from an unlisted original the racer forked through its link', async () => {
    const { originalId, original, forkId } = await originalAndFork('unlisted');
    await edit(author, originalId, original, { 'gear.spur': 48 });
    expect((await rows(forkId)).map((r) => r.key)).toEqual(['gear.spur']);
  });
});

describe('taking and dismissing changes', () => {
  // Note wording and number grouping ("3,000", unit after the new value): common practice, no source.
  it('takes one of two changes as a new revision that changes exactly that field, with a note naming it', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const theirs = await edit(author, originalId, original, { 'diff.rear.oil': 10000, 'gear.clutch-bell': 14 });
    const res = await apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: theirs.id, take: ['diff.rear.oil'] });
    expect(res.status).toBe(201);
    expect(res.body.taken).toBe(1);
    const taken = res.body.setup.currentRevision;
    expect(taken.number).toBe(2);
    expect(diffSetupValues(fork.values, taken.values)).toEqual([{ key: 'diff.rear.oil', before: 3000, after: 10000 }]);
    expect(taken.changeNote).toBe(`Took 1 change from “Saltmarsh sheet” by @${authorHandle} (revision 2): Rear diff oil 3,000 → 10,000 cSt.`);

    const after = await upstream(racer, forkId).expect(200);
    expect(after.body).toMatchObject({ syncedRevisionNumber: 2, mineRevisionId: taken.id });
    expect(after.body.rows).toEqual([expect.objectContaining({ key: 'gear.clutch-bell', base: 13, theirs: 14, mine: 13, status: 'theirs-only' })]);
  });

  it('names every taken change in the note, with units and choice labels', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const theirs = await edit(author, originalId, original, { 'gear.clutch-bell': 14, 'susp.front.camber': -2, 'chassis.front-brace': 'flexible' });
    const res = await apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: theirs.id, take: ['gear.clutch-bell', 'susp.front.camber', 'chassis.front-brace'] });
    expect(res.status).toBe(201);
    const note: string = res.body.setup.currentRevision.changeNote;
    expect(note).toMatch(/^Took 3 changes from “Saltmarsh sheet” by @.+ \(revision 2\): /);
    expect(note).toContain('Clutch bell 13 → 14');
    expect(note).toContain('Front camber -1 → -2°');
    expect(note).toMatch(/Front chassis brace [^;]+ → Flexible/);
    expect(await rows(forkId)).toEqual([]);
  });

  it('takes the original’s side of a conflict when chosen', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const mine = await edit(racer, forkId, fork, { 'shock.rear.oil': 400 });
    const theirs = await edit(author, originalId, original, { 'shock.rear.oil': 500 });
    const res = await apply(racer, forkId, { baseRevisionId: mine.id, theirsRevisionId: theirs.id, take: ['shock.rear.oil'] });
    expect(res.status).toBe(201);
    expect(res.body.setup.currentRevision.values['shock.rear.oil']).toBe(500);
    expect(res.body.setup.currentRevision.number).toBe(3);
  });

  it('does not offer a dismissed change again until the original changes that field once more', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const second = await edit(author, originalId, original, { 'gear.clutch-bell': 14, 'gear.spur': 48 });
    const res = await apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: second.id, dismiss: ['gear.clutch-bell'] });
    expect(res.status).toBe(200);
    expect(res.body.taken).toBe(0);
    expect(res.body.setup.currentRevision.id).toBe(fork.id);
    expect((await rows(forkId)).map((r) => r.key)).toEqual(['gear.spur']);

    // A change elsewhere does not bring the dismissed field back…
    const third = await edit(author, originalId, second, { 'diff.front.oil': 5000 });
    expect((await rows(forkId)).map((r) => r.key)).toEqual(['diff.front.oil', 'gear.spur']);
    // …a new value for it does, as a conflict with the value I kept.
    await edit(author, originalId, third, { 'gear.clutch-bell': 15 });
    expect((await rows(forkId)).find((r) => r.key === 'gear.clutch-bell')).toEqual(
      expect.objectContaining({ base: 14, theirs: 15, mine: 13, status: 'conflict' }),
    );
  });

  it('summarises a long list of taken changes to fit the change note limit', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    // Every number on the sheet moves one step (down when a step up would leave the field's range)
    // and every text field is filled to its limit.
    const changes: Values = {};
    const filler = 'Checked after every run, refilled when the oil looked dark. '.repeat(10);
    for (const field of listFields(getTemplate('buggy-1-8-nitro'))) {
      const value = original.values[field.key];
      if ((field.type === 'number' || field.type === 'integer') && typeof value === 'number') {
        const next = value + field.step <= field.max ? value + field.step : value - field.step;
        changes[field.key] = Math.round(next * 1000) / 1000;
      } else if (field.type === 'text') {
        changes[field.key] = filler.slice(0, field.maxLength).trim();
      }
    }
    const theirs = await edit(author, originalId, original, changes);
    const offered = await rows(forkId);
    const res = await apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: theirs.id, take: offered.map((r) => r.key) });
    expect(res.status).toBe(201);
    const note: string = res.body.setup.currentRevision.changeNote;
    expect(note.length).toBeLessThanOrEqual(CHANGE_NOTE_MAX);
    const listed = /^Took (\d+) changes from “Saltmarsh sheet” by @[^:]+: (.*); and (\d+) more\.$/.exec(note);
    expect(listed).not.toBeNull();
    const [, total, shown, more] = listed!;
    expect(Number(total)).toBe(offered.length);
    expect(shown.split('; ')[0]).toBe('Front diff oil 7,000 → 7,100 cSt');
    expect(shown.split('; ').length + Number(more)).toBe(offered.length);
    expect(res.body.setup.currentRevision.values).toEqual(theirs.values);
  });
});

describe('refusals that change nothing', () => {
  it('answers 409 when the original moved on since the changes were chosen', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const second = await edit(author, originalId, original, { 'gear.spur': 48, 'gear.clutch-bell': 14 });
    const first = await apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: second.id, take: ['gear.spur'] }).expect(201);
    const third = await edit(author, originalId, second, { 'diff.rear.oil': 5000 });
    const again = await apply(racer, forkId, { baseRevisionId: first.body.setup.currentRevision.id, theirsRevisionId: second.id, take: ['gear.clutch-bell'] });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('upstream_moved');
    expect(again.body.error.details.originalRevision).toEqual({ id: third.id, number: 3 });
    expect((await currentOf(forkId)).number).toBe(2);
  });

  it('answers 409 stale_revision when the fork changed since the changes were chosen', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const theirs = await edit(author, originalId, original, { 'gear.spur': 48 });
    const mine = await edit(racer, forkId, fork, { 'shock.front.oil': 500 }, 'Softer front');
    const res = await apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: theirs.id, take: ['gear.spur'] });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('stale_revision');
    expect(res.body.error.details.currentRevision).toMatchObject({ id: mine.id, number: 2, changeNote: 'Softer front' });
    expect((await currentOf(forkId)).id).toBe(mine.id);
  });

  it('refuses fields that are not among the offered changes, naming them (400)', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const theirs = await edit(author, originalId, original, { 'gear.spur': 48 });
    const unknown = await apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: theirs.id, take: ['gear.spur', 'wing.colour'], dismiss: ['diff.front.oil'] });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.details.take).toContain('wing.colour');
    expect(unknown.body.error.details.take).not.toContain('gear.spur');
    expect(unknown.body.error.details.dismiss).toContain('Front diff oil');
    const both = await apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: theirs.id, take: ['gear.spur'], dismiss: ['gear.spur'] });
    expect(both.status).toBe(400);
    expect(both.body.error.details.dismiss).toMatch(/Spur gear.*both taken and dismissed/);
    const malformed = await apply(racer, forkId, { baseRevisionId: 'latest', theirsRevisionId: theirs.id });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.details.baseRevisionId).toBeDefined();
    expect((await currentOf(forkId)).id).toBe(fork.id);
    expect((await rows(forkId)).map((r) => r.key)).toEqual(['gear.spur']);
  });

  it('lets exactly one of two simultaneous syncs from the same base win', async () => {
    const { originalId, original, forkId, fork } = await originalAndFork();
    const theirs = await edit(author, originalId, original, { 'gear.spur': 48, 'gear.clutch-bell': 14 });
    const results = await Promise.all([
      apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: theirs.id, take: ['gear.spur'] }),
      apply(racer, forkId, { baseRevisionId: fork.id, theirsRevisionId: theirs.id, take: ['gear.clutch-bell'] }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(await t.db.models.SetupRevision.count({ where: { setupId: forkId } })).toBe(2);
  });
});
