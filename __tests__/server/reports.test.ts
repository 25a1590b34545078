import { QueryTypes } from 'sequelize';
import {
  ACTION_OUTCOME_TEXT,
  REPORT_TARGET_TYPES,
  REPORTS_PER_HOUR,
  myReportSchema,
  type ModerationActionKind,
  type MyReport,
  type ReportTargetType,
} from '../../shared/types/moderation';
import { createRacer, csrfAgent, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { plainJpeg } from '../support/images';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/*
 * Reports: who may report what, duplicates, own content, things the reporter cannot see, the
 * hourly limit, and "my reports" with the outcome in plain words.
 */

let t: TestApp;
let stoat8n: number;
type Racer = SessionAgent & { id: number; handle: string };
let author: Racer;
let moderator: Racer;
/** What the author posted: one of every kind of reportable thing, on a public setup. */
const posted = {} as Record<ReportTargetType, number> & { setupId: number };

async function racer(opts: Parameters<typeof createRacer>[1] = {}): Promise<Racer> {
  const r = await createRacer(t.db, opts);
  return { ...(await signIn(t.app, r.handle, r.password)), id: r.user.id, handle: r.handle };
}

function report(s: SessionAgent, body: Record<string, unknown>) {
  return s.agent.post('/api/reports').set('X-CSRF-Token', s.csrf).send(body);
}

async function mine(s: SessionAgent): Promise<MyReport[]> {
  const res = await s.agent.get('/api/reports/mine').expect(200);
  return res.body.reports.map((r: unknown) => myReportSchema.parse(r));
}

/** A public setup of the author's with a second revision (change note), a comment and a photo. */
async function authorPosts(owner: Racer, visibility: 'public' | 'unlisted' | 'private' = 'public') {
  const { setup } = await carWithStockSetup(owner, stoat8n, { title: `Reported ${visibility} sheet`, visibility });
  const values = setup.currentRevision.values as Record<string, number>;
  const saved = await owner.agent
    .post(`/api/setups/${setup.id}/revisions`)
    .set('X-CSRF-Token', owner.csrf)
    .send({ baseRevisionId: setup.currentRevision.id, values: { ...values, 'shock.rear.oil': values['shock.rear.oil'] + 50 }, changeNote: 'Thicker rear oil for the ruts.' })
    .expect(201);
  const comment = await owner.agent
    .post(`/api/setups/${setup.id}/comments`)
    .set('X-CSRF-Token', owner.csrf)
    .send({ bodyMarkdown: 'Ran this all afternoon, no breakages.', ...(setup.shareToken ? { share: setup.shareToken } : {}) })
    .expect(201);
  const photo = await owner.agent
    .post(`/api/setups/${setup.id}/photos`)
    .set('X-CSRF-Token', owner.csrf)
    .attach('photo', await plainJpeg(320, 240), 'car.jpg')
    .expect(201);
  return {
    setupId: setup.id as number,
    shareToken: setup.shareToken,
    revision: saved.body.setup.currentRevision.id as number,
    comment: comment.body.comment.id as number,
    photo: photo.body.setup.photos[0].id as number,
  };
}

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  author = await racer({ prefix: 'author' });
  moderator = await racer({ role: 'moderator' });
  const p = await authorPosts(author);
  Object.assign(posted, { setupId: p.setupId, setup: p.setupId, revision: p.revision, comment: p.comment, photo: p.photo, racer: author.id });
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(60_000);

describe('filing a report', () => {
  let reporter: Racer;
  beforeAll(async () => {
    reporter = await racer({ prefix: 'reporter' });
  });

  it.each(REPORT_TARGET_TYPES.map((type) => [type]))('accepts a report on a %s, stores its author and writes the audit row', async (type) => {
    const res = await report(reporter, { targetType: type, targetId: posted[type], reason: 'spam', note: 'Shop links only.' });
    expect(res.status).toBe(201);
    const created = myReportSchema.parse(res.body.report);
    expect(created).toMatchObject({ targetType: type, targetId: posted[type], reason: 'spam', note: 'Shop links only.', status: 'open', outcome: null, outcomeText: null });
    expect(created.targetPath).toBe(
      { setup: `/setups/${posted.setupId}`, revision: `/setups/${posted.setupId}/history`, comment: `/setups/${posted.setupId}`, photo: `/setups/${posted.setupId}`, racer: `/racers/${author.handle}` }[type],
    );
    expect(created.targetLabel).toContain(type === 'racer' ? `@${author.handle}` : 'Reported public sheet');
    const [row] = await t.db.sequelize.query<{ owner: number }>('SELECT target_owner_id AS owner FROM reports WHERE id = :id', {
      type: QueryTypes.SELECT,
      replacements: { id: created.id },
    });
    expect(row.owner).toBe(author.id);
    const audit = await t.db.sequelize.query<{ actor_handle: string; subject_handle: string; reason: string }>(
      "SELECT actor_handle, subject_handle, reason FROM audit_log WHERE action = 'report-filed' AND target_type = :type AND target_id = :id",
      { type: QueryTypes.SELECT, replacements: { type, id: posted[type] } },
    );
    expect(audit).toEqual([{ actor_handle: reporter.handle, subject_handle: author.handle, reason: 'Spam or advertising: Shop links only.' }]);
  });

  it('refuses a second open report on the same thing with a clear message, and allows one again once it is resolved', async () => {
    const first = await mine(reporter);
    const open = first.find((r) => r.targetType === 'setup')!;
    const again = await report(reporter, { targetType: 'setup', targetId: posted.setup, reason: 'abusive' });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toBe('You have already reported this setup and your report is still open. You can follow it under My reports.');
    expect(again.body.error.details).toEqual({ reportId: open.id });
    await t.db.sequelize.query("UPDATE reports SET status = 'resolved', resolved_at = now() WHERE id = :id", { replacements: { id: open.id } });
    await report(reporter, { targetType: 'setup', targetId: posted.setup, reason: 'abusive' }).expect(201);
  });

  it('lets only one of two simultaneous reports by one racer on one thing through', async () => {
    const someone = await racer();
    const both = await Promise.all([1, 2].map(() => report(someone, { targetType: 'comment', targetId: posted.comment, reason: 'spam' })));
    expect(both.map((r) => r.status).sort()).toEqual([201, 409]);
    expect((await mine(someone)).length).toBe(1);
  });

  it('refuses a report of one’s own content or profile, saying why', async () => {
    const own = await report(author, { targetType: 'setup', targetId: posted.setup, reason: 'spam' });
    expect(own.status).toBe(409);
    expect(own.body.error.message).toBe('You cannot report your own setup. Edit or delete it instead.');
    const self = await report(author, { targetType: 'racer', targetId: author.id, reason: 'other', note: 'testing' });
    expect(self.status).toBe(409);
    expect(self.body.error.message).toMatch(/your own profile/);
  });

  it('needs a note for “Something else” and names the field; refuses unknown kinds of things', async () => {
    const noNote = await report(reporter, { targetType: 'photo', targetId: posted.photo, reason: 'other' });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.details).toEqual({ note: 'Say what is wrong when the reason is “Something else”.' });
    const badType = await report(reporter, { targetType: 'track', targetId: 1, reason: 'spam' });
    expect(badType.status).toBe(400);
    expect(Object.keys(badType.body.error.details)).toEqual(['targetType']);
  });

  it('is for signed-in racers only', async () => {
    const anonymous = await csrfAgent(t.app);
    const res = await anonymous.agent.post('/api/reports').set('X-CSRF-Token', anonymous.csrf).send({ targetType: 'setup', targetId: posted.setup, reason: 'spam' });
    expect(res.status).toBe(401);
  });
});

describe('things the reporter cannot see', () => {
  let privatePosts: Awaited<ReturnType<typeof authorPosts>>;
  let unlistedPosts: Awaited<ReturnType<typeof authorPosts>>;
  beforeAll(async () => {
    privatePosts = await authorPosts(author, 'private');
    unlistedPosts = await authorPosts(author, 'unlisted');
  });

  it('answers 404 for a private setup and everything on it, exactly as for something that does not exist', async () => {
    const stranger = await racer({ prefix: 'stranger' });
    const missing = await report(stranger, { targetType: 'setup', targetId: 999_999, reason: 'spam' });
    expect(missing.status).toBe(404);
    for (const type of ['setup', 'revision', 'comment', 'photo'] as const) {
      const id = type === 'setup' ? privatePosts.setupId : privatePosts[type];
      const res = await report(stranger, { targetType: type, targetId: id, reason: 'spam' });
      expect(res.status).toBe(404);
      const refused = await report(stranger, { targetType: type, targetId: 999_999, reason: 'spam' });
      expect(res.body).toEqual(refused.body);
    }
    expect(await mine(stranger)).toEqual([]);
  });

  it('accepts an unlisted setup’s things only with its share token', async () => {
    const stranger = await racer({ prefix: 'stranger' });
    await report(stranger, { targetType: 'comment', targetId: unlistedPosts.comment, reason: 'spam' }).expect(404);
    await report(stranger, { targetType: 'comment', targetId: unlistedPosts.comment, reason: 'spam', share: 'not-the-token' }).expect(404);
    const ok = await report(stranger, { targetType: 'comment', targetId: unlistedPosts.comment, reason: 'spam', share: unlistedPosts.shareToken });
    expect(ok.status).toBe(201);
    // Its label stays (the reporter saw it), but there is no path without the link.
    expect(ok.body.report.targetLabel).toMatch(/Ran this all afternoon/);
    expect(ok.body.report.targetPath).toBeNull();
  });

  it('answers 404 for hidden things to racers, while moderators can still report them', async () => {
    const stranger = await racer({ prefix: 'stranger' });
    const hiddenSetup = await authorPosts(author);
    await t.db.sequelize.query('UPDATE setups SET hidden_at = now() WHERE id = :id', { replacements: { id: hiddenSetup.setupId } });
    await t.db.sequelize.query('UPDATE comments SET hidden_at = now() WHERE id = :id', { replacements: { id: posted.comment } });
    await report(stranger, { targetType: 'setup', targetId: hiddenSetup.setupId, reason: 'spam' }).expect(404);
    await report(stranger, { targetType: 'comment', targetId: posted.comment, reason: 'spam' }).expect(404);
    await report(moderator, { targetType: 'comment', targetId: posted.comment, reason: 'spam' }).expect(201);
    await t.db.sequelize.query('UPDATE comments SET hidden_at = NULL WHERE id = :id', { replacements: { id: posted.comment } });
  });
});

describe('the hourly limit', () => {
  it(`lets one racer file ${REPORTS_PER_HOUR} reports an hour and says when the next is possible; others are not affected`, async () => {
    const busy = await racer({ prefix: 'busy' });
    const targets = await Promise.all(Array.from({ length: REPORTS_PER_HOUR + 1 }, () => createRacer(t.db, { password: null })));
    for (const target of targets.slice(0, REPORTS_PER_HOUR)) {
      await report(busy, { targetType: 'racer', targetId: target.user.id, reason: 'spam' }).expect(201);
    }
    const over = await report(busy, { targetType: 'racer', targetId: targets[REPORTS_PER_HOUR].user.id, reason: 'spam' });
    expect(over.status).toBe(429);
    expect(over.body.error.code).toBe('rate_limited');
    expect(over.body.error.message).toMatch(new RegExp(`^You can file ${REPORTS_PER_HOUR} reports an hour\\. You can file the next one in (\\d+ min|1 h)\\.$`));
    expect(over.body.error.details.retryAfterSeconds).toBeGreaterThan(3000);
    const calm = await racer();
    await report(calm, { targetType: 'racer', targetId: targets[REPORTS_PER_HOUR].user.id, reason: 'spam' }).expect(201);
  });
});

describe('my reports', () => {
  /** Resolves the open reports on a thing as a moderator's action would (the actions route is another part of the work). */
  async function resolve(type: ReportTargetType, id: number, action: ModerationActionKind, ownerId: number) {
    const [row] = await t.db.sequelize.query<{ id: number }>(
      `INSERT INTO moderation_actions (actor_id, action, target_type, target_id, subject_user_id, reason)
       VALUES (:actor, :action, :type, :id, :owner, 'Advertising, not a setup.') RETURNING id`,
      { type: QueryTypes.SELECT, replacements: { actor: moderator.id, action, type, id, owner: ownerId } },
    );
    await t.db.sequelize.query(
      "UPDATE reports SET status = 'resolved', resolved_by_action_id = :action, resolved_at = now() WHERE target_type = :type AND target_id = :id AND status = 'open'",
      { replacements: { action: row.id, type, id } },
    );
  }

  it('lists mine only, newest first, with the outcome in plain words and never the moderator', async () => {
    const me = await racer({ prefix: 'watcher' });
    const other = await racer();
    const p = await authorPosts(author);
    await report(me, { targetType: 'setup', targetId: p.setupId, reason: 'spam' }).expect(201);
    await report(me, { targetType: 'photo', targetId: p.photo, reason: 'stolen', note: 'My photo from the club day.' }).expect(201);
    await report(me, { targetType: 'comment', targetId: p.comment, reason: 'abusive' }).expect(201);
    await report(other, { targetType: 'setup', targetId: p.setupId, reason: 'spam' }).expect(201);

    await resolve('setup', p.setupId, 'hide', author.id);
    await t.db.sequelize.query('UPDATE setups SET hidden_at = now() WHERE id = :id', { replacements: { id: p.setupId } });
    await resolve('photo', p.photo, 'dismiss', author.id);

    const res = await me.agent.get('/api/reports/mine').expect(200);
    expect(JSON.stringify(res.body)).not.toContain(moderator.handle);
    const reports: MyReport[] = res.body.reports.map((r: unknown) => myReportSchema.parse(r));
    expect(reports.map((r) => r.targetType)).toEqual(['comment', 'photo', 'setup']);
    const [comment, photo, setup] = reports;
    expect(comment).toMatchObject({ status: 'open', outcome: null, outcomeText: null, resolvedAt: null });
    expect(photo).toMatchObject({ status: 'resolved', outcome: 'dismiss', outcomeText: ACTION_OUTCOME_TEXT.dismiss, note: 'My photo from the club day.' });
    expect(setup).toMatchObject({ status: 'resolved', outcome: 'hide', outcomeText: 'The moderators hid it.', targetLabel: 'Reported public sheet', targetPath: null });
    expect(setup.resolvedAt).not.toBeNull();
    // The comment sits on the setup now hidden: the reporter can no longer open it.
    expect(comment.targetPath).toBeNull();
  });

  it('describes a thing that went private without giving away its new title', async () => {
    const me = await racer();
    const p = await authorPosts(author);
    await report(me, { targetType: 'setup', targetId: p.setupId, reason: 'unsafe' }).expect(201);
    await t.db.sequelize.query("UPDATE setups SET visibility = 'private', title = 'Secret new name' WHERE id = :id", { replacements: { id: p.setupId } });
    const [only] = await mine(me);
    expect(only).toMatchObject({ targetLabel: 'Setup no longer available', targetPath: null, status: 'open' });
  });
});
