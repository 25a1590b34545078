import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { AUTO_HIDE_REPORTER_MIN_AGE_DAYS, AUTO_HIDE_REPORTERS } from '../../shared/types/moderation';
import { type SessionAgent, signedInRacer, type SignedInRacer } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/*
 * The automatic hide: open reports from AUTO_HIDE_REPORTERS distinct racers with a verified e-mail
 * and an account older than AUTO_HIDE_REPORTER_MIN_AGE_DAYS hide the thing pending review
 * (issue 7's rule; the numbers are the product's choice, common practice, no source).
 */

let t: TestApp;
let stoat8n: number;
type Racer = SignedInRacer;

function report(s: SessionAgent, targetType: string, targetId: number) {
  return s.agent.post('/api/reports').set('X-CSRF-Token', s.csrf).send({ targetType, targetId, reason: 'spam' });
}

const trusted = () => signedInRacer(t, { ageDays: AUTO_HIDE_REPORTER_MIN_AGE_DAYS + 1 });

async function autoHides(type: string, id: number) {
  return t.db.sequelize.query<{ actor_id: number | null; reason: string }>(
    "SELECT actor_id, reason FROM moderation_actions WHERE action = 'auto-hide' AND target_type = :type AND target_id = :id",
    { type: QueryTypes.SELECT, replacements: { type, id } },
  );
}

async function openReports(type: string, id: number): Promise<number> {
  const [row] = await t.db.sequelize.query<{ n: number }>(
    "SELECT count(*)::int AS n FROM reports WHERE target_type = :type AND target_id = :id AND status = 'open'",
    { type: QueryTypes.SELECT, replacements: { type, id } },
  );
  return row.n;
}

let trustedReporters: Racer[];

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  trustedReporters = await Promise.all(Array.from({ length: AUTO_HIDE_REPORTERS + 1 }, trusted));
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(60_000);

it(`hides a setup at ${AUTO_HIDE_REPORTERS} trusted reporters, not before, and never counts unverified or young accounts`, async () => {
  const author = await signedInRacer(t, { prefix: 'seller' });
  const { setup } = await carWithStockSetup(author, stoat8n, { title: 'Half-price bushings', visibility: 'public' });
  const unverified = await signedInRacer(t, { verified: false, ageDays: 60 });
  const young = await signedInRacer(t, { ageDays: AUTO_HIDE_REPORTER_MIN_AGE_DAYS - 1 });

  for (const r of [...trustedReporters.slice(0, AUTO_HIDE_REPORTERS - 1), unverified, young]) {
    await report(r, 'setup', setup.id).expect(201);
  }
  // Four open reports, two of them from trusted racers: still up.
  expect(await openReports('setup', setup.id)).toBe(AUTO_HIDE_REPORTERS + 1);
  expect(await autoHides('setup', setup.id)).toEqual([]);
  await request(t.app).get(`/api/setups/${setup.id}`).expect(200);

  await report(trustedReporters[AUTO_HIDE_REPORTERS - 1], 'setup', setup.id).expect(201);
  const hides = await autoHides('setup', setup.id);
  expect(hides).toHaveLength(1);
  expect(hides[0].actor_id).toBeNull();

  // Gone for everyone else, there for its author with the reason; the reports stay open for the moderators.
  await request(t.app).get(`/api/setups/${setup.id}`).expect(404);
  await trustedReporters[AUTO_HIDE_REPORTERS].agent.get(`/api/setups/${setup.id}`).expect(404);
  const own = await author.agent.get(`/api/setups/${setup.id}`).expect(200);
  // An automatic hide has no moderator's decision to appeal: a moderator reviews it from the queue.
  expect(own.body.setup.hidden).toMatchObject({ autoHidden: true, reason: hides[0].reason, actionId: null });
  expect(await openReports('setup', setup.id)).toBe(AUTO_HIDE_REPORTERS + 2);

  const audit = await t.db.sequelize.query<{ actor_id: number | null; actor_handle: string | null; subject_handle: string; new_state: { hidden: boolean; auto: boolean } }>(
    "SELECT actor_id, actor_handle, subject_handle, new_state FROM audit_log WHERE action = 'auto-hide' AND target_type = 'setup' AND target_id = :id",
    { type: QueryTypes.SELECT, replacements: { id: setup.id } },
  );
  expect(audit).toEqual([{ actor_id: null, actor_handle: null, subject_handle: author.handle, new_state: expect.objectContaining({ hidden: true, auto: true }) }]);

  // The author is told, in words, without any reporter's name.
  const notes = await author.agent.get('/api/notifications').expect(200);
  const notice = notes.body.notifications.find((n: { type: string }) => n.type === 'moderation-notice');
  expect(notice).toBeDefined();
  expect(notice.detail).toMatch(/^Your setup “Half-price bushings” was hidden while moderators review reports from several racers\./);
  for (const r of trustedReporters) expect(JSON.stringify(notes.body)).not.toContain(r.handle);
});

it('does not hide again what is already hidden', async () => {
  const author = await signedInRacer(t);
  const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'public' });
  for (const r of trustedReporters.slice(0, AUTO_HIDE_REPORTERS)) await report(r, 'setup', setup.id).expect(201);
  expect(await autoHides('setup', setup.id)).toHaveLength(1);
  // Moderators still see hidden things and may report them; the count rises, the hide is not repeated.
  const moderator = await signedInRacer(t, { role: 'moderator', ageDays: 400 });
  await report(moderator, 'setup', setup.id).expect(201);
  expect(await autoHides('setup', setup.id)).toHaveLength(1);
});

it('hides a comment once, even when the deciding reports arrive together', async () => {
  const author = await signedInRacer(t);
  const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'public' });
  const commenter = await signedInRacer(t, { prefix: 'spammer' });
  const comment = await commenter.agent
    .post(`/api/setups/${setup.id}/comments`)
    .set('X-CSRF-Token', commenter.csrf)
    .send({ bodyMarkdown: 'Cheap tyres at our shop!' })
    .expect(201);
  const id = comment.body.comment.id as number;
  await report(trustedReporters[0], 'comment', id).expect(201);
  await report(trustedReporters[1], 'comment', id).expect(201);
  const together = await Promise.all([report(trustedReporters[2], 'comment', id), report(trustedReporters[3], 'comment', id)]);
  // Whichever report lands second may find the comment already hidden, and hidden content is
  // out of a racer's sight (404); either way it is hidden exactly once.
  const statuses = together.map((r) => r.status).sort();
  expect(statuses[0]).toBe(201);
  expect([201, 404]).toContain(statuses[1]);
  expect(await autoHides('comment', id)).toHaveLength(1);
  const thread = await request(t.app).get(`/api/setups/${setup.id}/comments`).expect(200);
  expect(thread.body.comments).toEqual([]);
  const notes = await commenter.agent.get('/api/notifications').expect(200);
  expect(notes.body.notifications.filter((n: { type: string }) => n.type === 'moderation-notice')).toHaveLength(1);
});

it('leaves the content of moderators and admins up for a person to decide', async () => {
  const staff = await signedInRacer(t, { role: 'moderator', ageDays: 400 });
  const { setup } = await carWithStockSetup(staff, stoat8n, { visibility: 'public' });
  for (const r of trustedReporters.slice(0, AUTO_HIDE_REPORTERS)) await report(r, 'setup', setup.id).expect(201);
  expect(await autoHides('setup', setup.id)).toEqual([]);
  expect(await openReports('setup', setup.id)).toBe(AUTO_HIDE_REPORTERS);
  await request(t.app).get(`/api/setups/${setup.id}`).expect(200);
});

it('does not count reporters who are suspended now', async () => {
  const author = await signedInRacer(t);
  const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'public' });
  const benched = await trusted();
  await report(benched, 'setup', setup.id).expect(201);
  await t.db.models.User.update({ suspendedIndefinitely: true }, { where: { id: benched.id } });
  for (const r of trustedReporters.slice(0, AUTO_HIDE_REPORTERS - 1)) await report(r, 'setup', setup.id).expect(201);
  expect(await autoHides('setup', setup.id)).toEqual([]);
  await report(trustedReporters[AUTO_HIDE_REPORTERS - 1], 'setup', setup.id).expect(201);
  expect(await autoHides('setup', setup.id)).toHaveLength(1);
});
