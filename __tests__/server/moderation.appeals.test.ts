import request from 'supertest';
import { actionOnMeSchema, myAppealSchema, queueResponseSchema, suspendedSignInDetailsSchema } from '../../shared/types/moderation';
import { issueAppealToken } from '../../server/services/moderation/appeals';
import { csrfAgent, type SessionAgent, signedInRacer, type SignedInRacer, signIn } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { act, auditOf, notificationsOf, sql } from '../support/moderationQueue';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/*
 * Appeals: once per decision, within 20 days, by its subject; decided by a different moderator
 * than the one who acted (admins may decide any); overturning reverses the decision. A suspended
 * racer appeals with the signed token their refused sign-in carries.
 */

let t: TestApp;
type Session = SignedInRacer;
let author: Session;
let other: Session;
let mod: Session;
let mod2: Session;
let admin: Session;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  [author, other, mod, mod2, admin] = await Promise.all([
    signedInRacer(t, { role: 'racer', prefix: 'author' }),
    signedInRacer(t, { role: 'racer', prefix: 'other' }),
    signedInRacer(t, { role: 'moderator', prefix: 'mod' }),
    signedInRacer(t, { role: 'moderator', prefix: 'mod' }),
    signedInRacer(t, { role: 'admin', prefix: 'admin' }),
  ]);
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(60_000);

async function hiddenSetup(by: Session, title: string) {
  const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'public', title });
  const res = await act(by, { targetType: 'setup', targetId: setup.id, action: 'hide', reason: 'Advertising.' }).expect(200);
  return { setupId: setup.id, actionId: res.body.action.id as number };
}

const appeal = (s: SessionAgent, actionId: number, text = 'It was a club notice, not an advert.') =>
  s.agent.post('/api/appeals').set('X-CSRF-Token', s.csrf).send({ actionId, text });
const decide = (s: SessionAgent, appealId: number, decision: 'uphold' | 'overturn', reason = 'Reviewed the notes again.') =>
  s.agent.post(`/api/moderation/appeals/${appealId}/decide`).set('X-CSRF-Token', s.csrf).send({ decision, reason });
const mine = async (s: SessionAgent) => actionOnMeSchema.array().parse((await s.agent.get('/api/moderation/mine').expect(200)).body.actions);
const appealRow = async (s: SessionAgent, appealId: number) =>
  queueResponseSchema.parse((await s.agent.get('/api/moderation/queue').query({ kind: 'appeals' }).expect(200)).body).items.find((i) => i.appeal?.id === appealId);

describe('appealing a decision', () => {
  it('lets the author appeal once; another racer cannot; the appeal shows in my list and in the queue, marked', async () => {
    const { actionId } = await hiddenSetup(mod, 'Appeal once');
    expect((await mine(author)).find((a) => a.id === actionId)).toMatchObject({ action: 'hide', reason: 'Advertising.', canAppeal: true, cannotAppealReason: null, appeal: null, targetPath: expect.stringMatching(/^\/setups\//) });
    const res = await appeal(author, actionId).expect(201);
    const filed = myAppealSchema.parse(res.body.appeal);
    expect(filed).toMatchObject({ actionId, status: 'open', decisionReason: null });

    const again = await appeal(author, actionId).expect(409);
    expect(again.body.error).toMatchObject({ code: 'already_appealed', message: expect.stringMatching(/once/) });
    await appeal(other, actionId).expect(404);
    expect((await mine(author)).find((a) => a.id === actionId)).toMatchObject({ canAppeal: false, appeal: { id: filed.id, status: 'open' } });

    const row = await appealRow(mod2, filed.id);
    expect(row).toMatchObject({ targetType: 'setup', appeal: { text: 'It was a club notice, not an advert.', canDecide: true, action: { id: actionId, action: 'hide' } }, author: { id: author.id } });
    expect((await appealRow(mod, filed.id))?.appeal?.canDecide).toBe(false);
    expect((await auditOf(t.db, 'setup', row!.targetId)).map((a) => a.action)).toEqual(['hide', 'appeal-filed']);
  });

  it('closes appeals 20 days after the decision', async () => {
    const { actionId } = await hiddenSetup(mod, 'Too late');
    await sql(t.db, "UPDATE moderation_actions SET created_at = now() - interval '20 days 1 minute' WHERE id = :actionId RETURNING id", { actionId });
    const res = await appeal(author, actionId).expect(403);
    expect(res.body.error).toMatchObject({ code: 'appeal_not_possible', message: expect.stringMatching(/20 days/) });
    expect((await mine(author)).find((a) => a.id === actionId)).toMatchObject({ canAppeal: false, cannotAppealReason: expect.stringMatching(/20 days/) });
    // Still open a minute before the window closes.
    const { actionId: inTime } = await hiddenSetup(mod, 'Just in time');
    await sql(t.db, "UPDATE moderation_actions SET created_at = now() - interval '19 days 23 hours 59 minutes' WHERE id = :inTime RETURNING id", { inTime });
    await appeal(author, inTime).expect(201);
  });

  it('refuses appeals of decisions that did nothing against the racer, and of a hide already reversed', async () => {
    const { setupId, actionId } = await hiddenSetup(mod, 'Restored before appeal');
    const restore = await act(mod2, { targetType: 'setup', targetId: setupId, action: 'restore', reason: 'Fine.' }).expect(200);
    const reversed = await appeal(author, actionId).expect(403);
    expect(reversed.body.error.message).toMatch(/already reversed/);
    const notAppealable = await appeal(author, restore.body.action.id).expect(403);
    expect(notAppealable.body.error.code).toBe('not_appealable');
    const empty = await author.agent.post('/api/appeals').set('X-CSRF-Token', author.csrf).send({ actionId, text: ' ' }).expect(400);
    expect(empty.body.error.details).toHaveProperty('text');
  });
});

describe('deciding an appeal', () => {
  it('must be another moderator than the one who acted; overturning restores the setup and tells the author', async () => {
    const { setupId, actionId } = await hiddenSetup(mod, 'Overturned');
    const filed = (await appeal(author, actionId).expect(201)).body.appeal;
    const own = await decide(mod, filed.id, 'overturn').expect(403);
    expect(own.body.error.message).toMatch(/different moderator/);
    expect((await request(t.app).get(`/api/setups/${setupId}`)).status).toBe(404);

    const res = await decide(mod2, filed.id, 'overturn', 'The link is the club’s own page.').expect(200);
    expect(myAppealSchema.parse(res.body.appeal)).toMatchObject({ status: 'overturned', decisionReason: 'The link is the club’s own page.' });
    expect((await request(t.app).get(`/api/setups/${setupId}`)).status).toBe(200);
    expect((await notificationsOf(t.db, author.id, 'moderation-notice'))[0].detail).toBe(
      'Your appeal was reviewed and the decision was reversed. Reason: The link is the club’s own page.',
    );
    expect((await auditOf(t.db, 'setup', setupId)).at(-1)).toMatchObject({
      action: 'appeal-overturned',
      actor_id: mod2.id,
      previous_state: { appealedAction: 'hide', appealedActionId: actionId, hiddenByAction: 1 },
      new_state: { appealStatus: 'overturned', restored: 1 },
    });
    const twice = await decide(admin, filed.id, 'uphold').expect(409);
    expect(twice.body.error.code).toBe('appeal_decided');
    expect((await mine(author)).find((a) => a.id === actionId)?.appeal).toMatchObject({ status: 'overturned' });
  });

  it('lets an admin decide an appeal against their own decision; upholding keeps it hidden', async () => {
    const { setupId, actionId } = await hiddenSetup(admin, 'Admin decides own');
    const filed = (await appeal(author, actionId).expect(201)).body.appeal;
    expect((await appealRow(admin, filed.id))?.appeal?.canDecide).toBe(true);
    await decide(admin, filed.id, 'uphold', 'Still an advert.').expect(200);
    expect((await request(t.app).get(`/api/setups/${setupId}`)).status).toBe(404);
    expect((await notificationsOf(t.db, author.id, 'moderation-notice'))[0].detail).toBe('Your appeal was reviewed and the decision stands. Reason: Still an advert.');
    expect((await mine(author)).find((a) => a.id === actionId)).toMatchObject({ appeal: { status: 'upheld', decisionReason: 'Still an advert.' }, canAppeal: false });
  });

  it('overturning a hide-all brings back everything it hid', async () => {
    const s = await signedInRacer(t, { role: 'racer', prefix: 'spam' });
    const { setup } = await carWithStockSetup(s, stoat8n, { visibility: 'public', title: 'Everything back' });
    const res = await act(mod, { targetType: 'racer', targetId: s.id, action: 'hide-all', reason: 'Looked like spam.' }).expect(200);
    const filed = (await appeal(s, res.body.action.id).expect(201)).body.appeal;
    expect((await request(t.app).get(`/api/setups/${setup.id}`)).status).toBe(404);
    await decide(mod2, filed.id, 'overturn', 'A real racer.').expect(200);
    expect((await request(t.app).get(`/api/setups/${setup.id}`)).status).toBe(200);
    expect(await sql(t.db, 'SELECT 1 FROM content_hides WHERE action_id = :id', { id: res.body.action.id })).toEqual([]);
  });
});

describe('a suspended racer appeals without signing in', () => {
  it('gets a signed appeal token on a refused sign-in, refuses forged and expired tokens, accepts one appeal, and is let back in when overturned', async () => {
    const s = await signedInRacer(t, { role: 'racer', prefix: 'suspended' });
    const suspended = await act(mod, { targetType: 'racer', targetId: s.id, action: 'suspend', reason: 'Spam comments.', suspendDays: 30 }).expect(200);
    const actionId = suspended.body.action.id;

    const { agent, csrf } = await csrfAgent(t.app);
    const wrong = await agent.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login: s.handle, password: 'not-the-password-at-all' }).expect(401);
    expect(wrong.body.error.details).toBeUndefined();
    const refused = await agent.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login: s.handle, password: s.password }).expect(403);
    expect(refused.body.error.code).toBe('account_suspended');
    const details = suspendedSignInDetailsSchema.parse(refused.body.error.details);
    expect(details).toMatchObject({ reason: 'Spam comments.', suspensionActionId: actionId, appealToken: expect.any(String), cannotAppealReason: null });

    const post = (appealToken: string, text?: string) =>
      agent.post('/api/appeals/suspension').set('X-CSRF-Token', csrf).send({ appealToken, text: text ?? 'I posted race results, not spam.' });

    const [payload, signature] = details.appealToken!.split('.');
    const forgedPayload = Buffer.from(JSON.stringify({ u: other.id, a: actionId, e: Date.now() + 60_000 })).toString('base64url');
    const forged = await post(`${forgedPayload}.${signature}`).expect(400);
    expect(forged.body.error.code).toBe('appeal_token_invalid');
    await post(`${payload}.${signature.slice(0, -2)}xx`).expect(400);
    const expired = issueAppealToken(t.config.sessionSecret, s.id, actionId, Date.now() - 2 * 60 * 60_000);
    const late = await post(expired.token).expect(400);
    expect(late.body.error).toMatchObject({ code: 'appeal_token_expired', message: expect.stringMatching(/expired/) });
    const noText = await post(details.appealToken!, '').expect(400);
    expect(noText.body.error.details).toHaveProperty('text');

    const filed = (await post(details.appealToken!).expect(201)).body.appeal;
    expect(filed).toMatchObject({ actionId, status: 'open' });
    expect((await post(details.appealToken!).expect(409)).body.error.code).toBe('already_appealed');
    // Signing in again now says why no new token comes.
    const again = await agent.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login: s.handle, password: s.password }).expect(403);
    expect(again.body.error.details).toMatchObject({ suspensionActionId: actionId, cannotAppealReason: expect.stringMatching(/already appealed/) });
    expect(again.body.error.details.appealToken).toBeUndefined();

    await decide(mod, filed.id, 'overturn').expect(403);
    await decide(mod2, filed.id, 'overturn', 'Race results are welcome.').expect(200);
    await signIn(t.app, s.handle, s.password);
    expect((await auditOf(t.db, 'racer', s.id)).map((a) => a.action)).toEqual(['suspend', 'appeal-filed', 'appeal-overturned']);
  });

  it('only admins decide appeals against suspending a moderator', async () => {
    const m = await signedInRacer(t, { role: 'moderator', prefix: 'modsusp' });
    const res = await act(admin, { targetType: 'racer', targetId: m.id, action: 'suspend', reason: 'Abused the queue.', suspendDays: 2 }).expect(200);
    const token = issueAppealToken(t.config.sessionSecret, m.id, res.body.action.id).token;
    const { agent, csrf } = await csrfAgent(t.app);
    const filed = (await agent.post('/api/appeals/suspension').set('X-CSRF-Token', csrf).send({ appealToken: token, text: 'A misunderstanding.' }).expect(201)).body.appeal;
    const byMod = await decide(mod, filed.id, 'overturn').expect(403);
    expect(byMod.body.error.message).toMatch(/Only admins/);
    await decide(admin, filed.id, 'uphold').expect(200);
  });
});
