import { QueryTypes } from 'sequelize';
import { NEW_ACCOUNT_HOURS, NEW_ACCOUNT_LIMITS, myLimitsSchema, type MyLimits } from '../../shared/types/moderation';
import { countLinks, inWords, newAccountStatus } from '../../server/services/moderation/limits';
import { type SessionAgent, signedInRacer, type SignedInRacer } from '../support/accounts';
import { ensureCatalog, kitId } from '../support/garage';
import { plainJpeg } from '../support/images';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/*
 * New-account limits (issue 7): accounts under a day old or with an unverified e-mail get fewer
 * setups and comments per rolling hour, at most two links per note or comment, and no photos until
 * verified. The figures are the product's choice (common practice, no source).
 */

let t: TestApp;
let stoat8n: number;
type Racer = SignedInRacer;

async function limitsOf(s: SessionAgent): Promise<MyLimits> {
  return myLimitsSchema.parse((await s.agent.get('/api/me/limits').expect(200)).body);
}

async function car(s: SessionAgent): Promise<number> {
  const res = await s.agent.post('/api/cars').set('X-CSRF-Token', s.csrf).send({ kitId: stoat8n, nickname: 'Limits car' }).expect(201);
  return res.body.car.id;
}

function newSetup(s: SessionAgent, carId: number, extra: Record<string, unknown> = {}) {
  return s.agent
    .post('/api/setups')
    .set('X-CSRF-Token', s.csrf)
    .send({ carId, title: 'Limits sheet', visibility: 'public', startFrom: { kind: 'stock' }, ...extra });
}

function comment(s: SessionAgent, setupId: number, bodyMarkdown: string) {
  return s.agent.post(`/api/setups/${setupId}/comments`).set('X-CSRF-Token', s.csrf).send({ bodyMarkdown });
}

const THREE_LINKS = 'Parts: [shop](https://shop.example/a), https://shop.example/b and www.shop.example/c';
const TWO_LINKS = 'Parts: [shop](https://shop.example/a) and https://shop.example/b';

/** An established racer's public setup to comment on. */
let publicSetupId: number;

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  const host = await signedInRacer(t);
  publicSetupId = (await newSetup(host, await car(host)).expect(201)).body.setup.id;
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(60_000);

describe('counting links (GFM autolinks extension, https://github.github.com/gfm/#autolinks-extension-)', () => {
  it.each([
    ['no links at all', 'Thicker rear oil, 450 cSt.', 0],
    ['an inline link', 'See [my notes](https://notes.example/stoat).', 1],
    ['bare http(s) URLs and a www. address, which GFM links too', 'https://a.example and http://b.example/x?y=1 and www.c.example', 3],
    ['an angle-bracket autolink (CommonMark 6.5)', '<https://d.example/page>', 1],
    ['a URL inside a code span, which is not a link', 'Type `https://e.example` into the box', 0],
    ['the three-link note the tests post', THREE_LINKS, 3],
  ])('%s', (_name, text, links) => {
    expect(countLinks(text)).toBe(links);
  });
});

describe('who is limited', () => {
  it('says when the age part lifts, in words (common practice, no source)', () => {
    expect(inWords(42 * 60_000)).toBe('in 42 min');
    expect(inWords(5 * 3_600_000 + 12 * 60_000)).toBe('in 5 h 12 min');
    expect(inWords(24 * 3_600_000)).toBe('in 24 h');
    expect(inWords(10_000)).toBe('in 1 min');
    const createdAt = new Date('2026-03-01T10:00:00Z');
    const account = { id: 1, role: 'racer' as const, createdAt, emailVerifiedAt: createdAt };
    expect(newAccountStatus(account, new Date('2026-03-02T09:59:00Z'))).toEqual({
      limited: true,
      because: ['new-account'],
      ageLiftsAt: new Date(createdAt.getTime() + NEW_ACCOUNT_HOURS * 3_600_000),
    });
    expect(newAccountStatus(account, new Date('2026-03-02T10:00:00Z')).limited).toBe(false);
    expect(newAccountStatus({ ...account, emailVerifiedAt: null }, new Date('2026-04-01T00:00:00Z')).because).toEqual(['unverified']);
    expect(newAccountStatus({ ...account, role: 'moderator', emailVerifiedAt: null }, createdAt).limited).toBe(false);
  });

  it('shows a new racer the limits in advance, with what is used and when they lift', async () => {
    const fresh = await signedInRacer(t, { ageDays: 0, verified: false });
    const limits = await limitsOf(fresh);
    expect(limits).toEqual({
      limited: true,
      because: ['new-account', 'unverified'],
      ageLiftsAt: expect.any(String),
      setups: { perHour: NEW_ACCOUNT_LIMITS.setupsPerHour, usedThisHour: 0 },
      comments: { perHour: NEW_ACCOUNT_LIMITS.commentsPerHour, usedThisHour: 0 },
      linksPerPost: NEW_ACCOUNT_LIMITS.linksPerPost,
      photosAllowed: false,
    });
    const [row] = await t.db.sequelize.query<{ created_at: Date }>('SELECT created_at FROM users WHERE id = :id', { replacements: { id: fresh.id }, type: QueryTypes.SELECT });
    expect(Date.parse(limits.ageLiftsAt!)).toBe(row.created_at.getTime() + NEW_ACCOUNT_HOURS * 3_600_000);
  });

  it('limits nobody with a verified account older than a day, and never moderators or admins', async () => {
    const settled = await signedInRacer(t, { ageDays: 7 });
    expect(await limitsOf(settled)).toEqual({ limited: false, because: [], ageLiftsAt: null, setups: null, comments: null, linksPerPost: null, photosAllowed: true });
    const carId = await car(settled);
    for (let i = 0; i <= NEW_ACCOUNT_LIMITS.setupsPerHour; i += 1) await newSetup(settled, carId, { notesMarkdown: THREE_LINKS }).expect(201);
    for (let i = 0; i <= NEW_ACCOUNT_LIMITS.commentsPerHour; i += 1) await comment(settled, publicSetupId, THREE_LINKS).expect(201);

    for (const role of ['moderator', 'admin'] as const) {
      const staff = await signedInRacer(t, { role, ageDays: 0, verified: false });
      expect((await limitsOf(staff)).limited).toBe(false);
      await comment(staff, publicSetupId, THREE_LINKS).expect(201);
    }
  });
});

describe('refusals name the limit and when it lifts', () => {
  it(`allows a new account ${NEW_ACCOUNT_LIMITS.setupsPerHour} setups in a rolling hour`, async () => {
    const fresh = await signedInRacer(t, { ageDays: 0 });
    const carId = await car(fresh);
    for (let i = 0; i < NEW_ACCOUNT_LIMITS.setupsPerHour; i += 1) await newSetup(fresh, carId).expect(201);
    expect((await limitsOf(fresh)).setups).toEqual({ perHour: NEW_ACCOUNT_LIMITS.setupsPerHour, usedThisHour: NEW_ACCOUNT_LIMITS.setupsPerHour });
    const refused = await newSetup(fresh, carId);
    expect(refused.status).toBe(429);
    expect(refused.body.error.code).toBe('new_account_limit');
    expect(refused.body.error.message).toMatch(
      /^New accounts can create 3 setups an hour, and you have created 3 in the last hour\. You can create the next setup in (59 min|1 h)\. New-account limits end once your account is 24 hours old \(in (23 h \d+ min|24 h)\)\.$/,
    );
    expect(refused.body.error.details).toMatchObject({ limit: 'setupsPerHour', perHour: 3, usedThisHour: 3, because: ['new-account'] });
    // An hour after the first one, a place is free again.
    await t.db.sequelize.query(
      "UPDATE setups SET created_at = created_at - interval '61 minutes' WHERE id = (SELECT min(id) FROM setups WHERE owner_id = :id)",
      { replacements: { id: fresh.id } },
    );
    await newSetup(fresh, carId).expect(201);
  });

  it(`allows a new account ${NEW_ACCOUNT_LIMITS.commentsPerHour} comments an hour`, async () => {
    const fresh = await signedInRacer(t, { ageDays: 0 });
    for (let i = 0; i < NEW_ACCOUNT_LIMITS.commentsPerHour; i += 1) await comment(fresh, publicSetupId, `Question ${i}`).expect(201);
    const refused = await comment(fresh, publicSetupId, 'One more question');
    expect(refused.status).toBe(429);
    expect(refused.body.error.message).toMatch(/^New accounts can post 5 comments an hour, and you have posted 5 in the last hour\. You can post the next comment in (59 min|1 h)\./);
    expect((await limitsOf(fresh)).comments).toEqual({ perHour: 5, usedThisHour: 5 });
  });

  it('refuses more than two links in setup notes, change notes and comments, naming the field; two are fine', async () => {
    const fresh = await signedInRacer(t, { ageDays: 0 });
    const carId = await car(fresh);
    const notes = await newSetup(fresh, carId, { notesMarkdown: THREE_LINKS });
    expect(notes.status).toBe(422);
    expect(notes.body.error.message).toMatch(
      /^New accounts can put at most 2 links in one note or comment; this has 3\. Remove 1 link and try again\. New-account limits end once your account is 24 hours old \(in (23 h \d+ min|24 h)\)\.$/,
    );
    expect(Object.keys(notes.body.error.details)).toEqual(['notesMarkdown']);

    const created = await newSetup(fresh, carId, { notesMarkdown: TWO_LINKS }).expect(201);
    const setup = created.body.setup;
    const meta = await fresh.agent.patch(`/api/setups/${setup.id}`).set('X-CSRF-Token', fresh.csrf).send({ notesMarkdown: THREE_LINKS });
    expect(meta.status).toBe(422);
    expect(Object.keys(meta.body.error.details)).toEqual(['notesMarkdown']);

    const revision = await fresh.agent
      .post(`/api/setups/${setup.id}/revisions`)
      .set('X-CSRF-Token', fresh.csrf)
      .send({ baseRevisionId: setup.currentRevision.id, values: setup.currentRevision.values, changeNote: THREE_LINKS });
    expect(revision.status).toBe(422);
    expect(Object.keys(revision.body.error.details)).toEqual(['changeNote']);

    const reply = await comment(fresh, publicSetupId, THREE_LINKS);
    expect(reply.status).toBe(422);
    expect(reply.body.error.details.bodyMarkdown).toMatch(/at most 2 links/);
    const ok = await comment(fresh, publicSetupId, TWO_LINKS).expect(201);
    const edited = await fresh.agent.patch(`/api/comments/${ok.body.comment.id}`).set('X-CSRF-Token', fresh.csrf).send({ bodyMarkdown: THREE_LINKS });
    expect(edited.status).toBe(422);
    // Nothing was held back or changed by the refusals.
    const detail = await fresh.agent.get(`/api/setups/${setup.id}`).expect(200);
    expect(detail.body.setup.notesMarkdown).toBe(TWO_LINKS);
    expect(detail.body.setup.revisions).toHaveLength(1);
  });

  it('refuses photos until the e-mail is verified, then takes them', async () => {
    const unverified = await signedInRacer(t, { ageDays: 30, verified: false });
    const created = await newSetup(unverified, await car(unverified)).expect(201);
    const upload = () =>
      unverified.agent.post(`/api/setups/${created.body.setup.id}/photos`).set('X-CSRF-Token', unverified.csrf).attach('photo', photo, 'car.jpg');
    const photo = await plainJpeg(320, 240);
    const refused = await upload();
    expect(refused.status).toBe(403);
    expect(refused.body.error).toEqual({
      code: 'new_account_limit',
      message: 'Photos can be added once your e-mail address is confirmed. Open the link in the e-mail we sent you, or send a new one from your profile.',
    });
    expect(await limitsOf(unverified)).toMatchObject({ limited: true, because: ['unverified'], ageLiftsAt: null, photosAllowed: false });
    await t.db.models.User.update({ emailVerifiedAt: new Date() }, { where: { id: unverified.id } });
    await upload().expect(201);
    expect(await limitsOf(unverified)).toMatchObject({ limited: false, photosAllowed: true });
  });
});
