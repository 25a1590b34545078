import request from 'supertest';
import { ACTION_OUTCOME_TEXT, moderationActionSummarySchema, queueResponseSchema, type QueueItem } from '../../shared/types/moderation';
import { composeNotification } from '../../server/services/emailNotifications';
import { type SessionAgent, signedInRacer, type SignedInRacer } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { plainJpeg } from '../support/images';
import { act, auditOf, fileReport, notificationsOf, sql } from '../support/moderationQueue';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/*
 * The review queue and moderators' actions, and what each action does to what others see: feed,
 * discover, search, vote rankings, counts, family lists and the setup's own address.
 */

let t: TestApp;
type Session = SignedInRacer;
let author: Session;
let follower: Session;
let reporter: Session;
let reporter2: Session;
let mod: Session;
let mod2: Session;
let admin: Session;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  [author, follower, reporter, reporter2, mod, mod2, admin] = await Promise.all([
    signedInRacer(t, { role: 'racer', prefix: 'author' }),
    signedInRacer(t, { role: 'racer', prefix: 'follower' }),
    signedInRacer(t, { role: 'racer', prefix: 'reporter' }),
    signedInRacer(t, { role: 'racer', prefix: 'reporter' }),
    signedInRacer(t, { role: 'moderator', prefix: 'mod' }),
    signedInRacer(t, { role: 'moderator', prefix: 'mod' }),
    signedInRacer(t, { role: 'admin', prefix: 'admin' }),
  ]);
  await follower.agent.post(`/api/racers/${author.handle}/follow`).set('X-CSRF-Token', follower.csrf).expect(200);
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(60_000);

async function publicSetup(owner: Session, title: string) {
  return (await carWithStockSetup(owner, stoat8n, { visibility: 'public', title })).setup;
}

async function saveRevision(owner: Session, setup: { id: number; currentRevision: { id: number; values: Record<string, unknown> } }, changeNote: string) {
  const res = await owner.agent
    .post(`/api/setups/${setup.id}/revisions`)
    .set('X-CSRF-Token', owner.csrf)
    .send({ baseRevisionId: setup.currentRevision.id, values: { ...setup.currentRevision.values, 'diff.front.oil': 3000 }, changeNote })
    .expect(201);
  return res.body.setup as { id: number; currentRevision: { id: number; number: number }; revisions: Array<{ id: number; number: number }> };
}

const ids = (list: Array<{ id: number }>) => list.map((x) => x.id);
const feedOf = async (s: Session) => (await s.agent.get('/api/feed').expect(200)).body.items as Array<{ kind: string; setup: { id: number }; revision?: { changeNote: string } }>;
const discover = async (query: Record<string, string>) => (await request(t.app).get('/api/discover').query(query).expect(200)).body.setups as Array<{ id: number; forkCount: number }>;
const search = async (q: string) => (await request(t.app).get('/api/search').query({ q }).expect(200)).body.setups as Array<{ id: number }>;
const kitList = async () => (await request(t.app).get(`/api/kits/${stoat8n}/setups`).expect(200)).body.setups as Array<{ id: number; forkCount: number }>;
const queue = async (s: Session, query: Record<string, string> = {}) => queueResponseSchema.parse((await s.agent.get('/api/moderation/queue').query(query).expect(200)).body);
const rowFor = (items: QueueItem[], type: string, id: number) => items.find((i) => i.targetType === type && i.targetId === id && !i.appeal);

/** Everything others can see of one setup, gathered from each place it shows up. */
async function whatOthersSee(setupId: number, word: string) {
  const feed = await feedOf(follower);
  return {
    feed: feed.filter((i) => i.setup.id === setupId).map((i) => i.kind).sort(),
    newest: ids(await discover({ sort: 'newest' })).includes(setupId),
    ranked: ids(await discover({ sort: 'best-for', bestFor: 'loose-dusty' })).includes(setupId),
    search: ids(await search(word)).includes(setupId),
    kitList: ids(await kitList()).includes(setupId),
    anonymous: (await request(t.app).get(`/api/setups/${setupId}`)).status,
    racer: (await follower.agent.get(`/api/setups/${setupId}`)).status,
    votes: (await follower.agent.get(`/api/setups/${setupId}/votes`)).status,
  };
}

describe('the review queue', () => {
  it('groups open reports by target with counts, reasons and notes (no reporter names), the content inline and the author’s history', async () => {
    const setup = await publicSetup(author, 'Brackwater ruts — queue sheet');
    await fileReport(t.db, reporter.id, { type: 'setup', id: setup.id }, 'spam', 'Links to a shop in the notes');
    await fileReport(t.db, reporter2.id, { type: 'setup', id: setup.id }, 'unsafe');
    await sql(t.db, "INSERT INTO moderation_actions (actor_id, action, target_type, target_id, subject_user_id, reason) VALUES (:mod, 'warn', 'racer', :a, :a, 'Earlier warning')", { mod: mod2.id, a: author.id });

    const { items } = await queue(mod);
    const row = rowFor(items, 'setup', setup.id)!;
    expect(row).toMatchObject({
      reportCount: 2,
      notes: ['Links to a shop in the notes'],
      content: { title: 'Brackwater ruts — queue sheet', path: `/setups/${setup.id}`, hiddenAt: null, autoHidden: false },
      author: { id: author.id, handle: author.handle, role: 'racer', emailVerified: true, suspended: false },
      appeal: null,
      canAct: true,
      cannotActReason: null,
      canSuspend: true,
    });
    expect(row.reasons).toEqual(expect.arrayContaining([{ reason: 'spam', count: 1 }, { reason: 'unsafe', count: 1 }]));
    expect(row.author.history).toEqual([expect.objectContaining({ action: 'warn', reason: 'Earlier warning' })]);
    expect(JSON.stringify(row)).not.toContain(reporter.handle);
    expect(JSON.stringify(row)).not.toContain(reporter2.handle);

    // Filters: by reason and type; kind=appeals leaves reports out.
    expect(rowFor((await queue(mod, { reason: 'unsafe' })).items, 'setup', setup.id)).toBeDefined();
    expect(rowFor((await queue(mod, { reason: 'abusive' })).items, 'setup', setup.id)).toBeUndefined();
    expect(rowFor((await queue(mod, { type: 'comment' })).items, 'setup', setup.id)).toBeUndefined();
    expect(rowFor((await queue(mod, { kind: 'appeals' })).items, 'setup', setup.id)).toBeUndefined();
    const bad = await mod.agent.get('/api/moderation/queue').query({ type: 'kit' }).expect(400);
    expect(bad.body.error.details).toHaveProperty('type');
    await act(mod, { targetType: 'setup', targetId: setup.id, action: 'dismiss', reason: 'Ordinary setup notes.' }).expect(200);
  });

  it('orders reported things oldest first by default and newest first on request', async () => {
    const older = await publicSetup(author, 'Queue order older');
    const newer = await publicSetup(author, 'Queue order newer');
    const r1 = await fileReport(t.db, reporter.id, { type: 'setup', id: older.id });
    const r2 = await fileReport(t.db, reporter.id, { type: 'setup', id: newer.id });
    await sql(t.db, "UPDATE reports SET created_at = now() - interval '2 hours' WHERE id = :r1", { r1 });
    await sql(t.db, "UPDATE reports SET created_at = now() - interval '1 hour' WHERE id = :r2", { r2 });
    const position = (items: QueueItem[], id: number) => items.findIndex((i) => i.targetType === 'setup' && i.targetId === id);
    const oldest = (await queue(mod)).items;
    expect(position(oldest, older.id)).toBeLessThan(position(oldest, newer.id));
    const newest = (await queue(mod, { order: 'newest' })).items;
    expect(position(newest, newer.id)).toBeLessThan(position(newest, older.id));
    for (const s of [older, newer]) await act(mod, { targetType: 'setup', targetId: s.id, action: 'dismiss', reason: 'Fine.' }).expect(200);
  });

  it('tells the moderator where they cannot act: their own content, an admin’s, and suspending a moderator', async () => {
    const own = await publicSetup(mod, 'Moderator’s own sheet');
    const admins = await publicSetup(admin, 'Admin’s sheet');
    const colleague = await publicSetup(mod2, 'Colleague’s sheet');
    for (const s of [own, admins, colleague]) await fileReport(t.db, reporter.id, { type: 'setup', id: s.id });
    const { items } = await queue(mod);
    expect(rowFor(items, 'setup', own.id)).toMatchObject({ canAct: false, cannotActReason: expect.stringMatching(/your own/) });
    expect(rowFor(items, 'setup', admins.id)).toMatchObject({ canAct: false, cannotActReason: expect.stringMatching(/admin/) });
    expect(rowFor(items, 'setup', colleague.id)).toMatchObject({ canAct: true, canSuspend: false });
    const asAdmin = (await queue(admin)).items;
    expect(rowFor(asAdmin, 'setup', own.id)).toMatchObject({ canAct: true, canSuspend: true });
    expect(rowFor(asAdmin, 'setup', admins.id)).toMatchObject({ canAct: false });

    // The API enforces the same rules.
    const ownRes = await act(mod, { targetType: 'setup', targetId: own.id, action: 'hide', reason: 'x' }).expect(403);
    expect(ownRes.body.error.message).toMatch(/your own/);
    await act(mod, { targetType: 'setup', targetId: admins.id, action: 'hide', reason: 'x' }).expect(403);
    await act(mod, { targetType: 'racer', targetId: admin.id, action: 'warn', reason: 'x' }).expect(403);
    const suspend = await act(mod, { targetType: 'setup', targetId: colleague.id, action: 'suspend', reason: 'x', suspendDays: 3 }).expect(403);
    expect(suspend.body.error.message).toBe('Only admins can suspend a moderator.');
    await act(admin, { targetType: 'setup', targetId: own.id, action: 'dismiss', reason: 'Fine.' }).expect(200);
    await act(mod, { targetType: 'setup', targetId: colleague.id, action: 'dismiss', reason: 'Fine.' }).expect(200);
    await act(admin, { targetType: 'setup', targetId: admins.id, action: 'dismiss', reason: 'x' }).expect(403);
    await sql(t.db, "UPDATE reports SET status = 'resolved' WHERE target_type = 'setup' AND target_id = :id", { id: admins.id });
  });

  it('refuses an action without a reason, naming the field, and changes nothing', async () => {
    const setup = await publicSetup(author, 'No reason given');
    const res = await act(mod, { targetType: 'setup', targetId: setup.id, action: 'hide', reason: '  ' }).expect(400);
    expect(res.body.error.details).toHaveProperty('reason');
    const noDays = await act(mod, { targetType: 'setup', targetId: setup.id, action: 'suspend', reason: 'Spam' }).expect(400);
    expect(noDays.body.error.details).toHaveProperty('suspendDays');
    expect((await request(t.app).get(`/api/setups/${setup.id}`)).status).toBe(200);
    await act(mod, { targetType: 'setup', targetId: 999999, action: 'hide', reason: 'Spam' }).expect(404);
  });
});

describe('hide and restore', () => {
  it('hides a setup from feed, discover, search, rankings, kit lists and its address for others; its author and moderators still see it with the reason', async () => {
    const created = await publicSetup(author, 'Quillwort marsh line');
    const withRevision = await saveRevision(author, created, 'Thinner front diff for the quillwort section');
    await follower.agent.put(`/api/setups/${created.id}/votes/loose-dusty`).set('X-CSRF-Token', follower.csrf).send({ works: true }).expect(200);
    await follower.agent.post(`/api/setups/${created.id}/comments`).set('X-CSRF-Token', follower.csrf).send({ bodyMarkdown: 'Works at the marsh too.' }).expect(201);
    const before = {
      detail: (await author.agent.get(`/api/setups/${created.id}`).expect(200)).body.setup,
      votes: (await request(t.app).get(`/api/setups/${created.id}/votes`).expect(200)).body.votes,
      comments: (await author.agent.get(`/api/setups/${created.id}/comments`).expect(200)).body.comments,
    };
    const visible = { feed: ['revision', 'setup'], newest: true, ranked: true, search: true, kitList: true, anonymous: 200, racer: 200, votes: 200 };
    expect(await whatOthersSee(created.id, 'quillwort')).toEqual(visible);

    await fileReport(t.db, reporter.id, { type: 'setup', id: created.id }, 'spam', 'Shop link');
    await fileReport(t.db, reporter2.id, { type: 'setup', id: created.id }, 'spam');
    const res = await act(mod, { targetType: 'setup', targetId: created.id, action: 'hide', reason: 'Advertising a shop.' }).expect(200);
    const action = moderationActionSummarySchema.parse(res.body.action);
    expect(action).toMatchObject({ action: 'hide', targetType: 'setup', targetId: created.id, reason: 'Advertising a shop.', resolvedReports: 2, suspendedUntil: null });

    expect(await whatOthersSee(created.id, 'quillwort')).toEqual({
      feed: [],
      newest: false,
      ranked: false,
      search: false,
      kitList: false,
      anonymous: 404,
      racer: 404,
      votes: 404,
    });
    const hiddenNotice = { reason: 'Advertising a shop.', autoHidden: false, actionId: action.id, hiddenAt: expect.any(String) };
    expect((await author.agent.get(`/api/setups/${created.id}`).expect(200)).body.setup.hidden).toEqual(hiddenNotice);
    expect((await mod2.agent.get(`/api/setups/${created.id}`).expect(200)).body.setup.hidden).toEqual(hiddenNotice);
    expect(rowFor((await queue(mod)).items, 'setup', created.id)).toBeUndefined();

    // Reports resolved by this action; the audit row holds the state before and after.
    const reports = await sql<{ status: string; resolved_by_action_id: number }>(t.db, "SELECT status, resolved_by_action_id FROM reports WHERE target_type = 'setup' AND target_id = :id", { id: created.id });
    expect(reports).toEqual([
      { status: 'resolved', resolved_by_action_id: action.id },
      { status: 'resolved', resolved_by_action_id: action.id },
    ]);
    expect((await auditOf(t.db, 'setup', created.id)).at(-1)).toMatchObject({
      action: 'hide',
      actor_id: mod.id,
      actor_handle: mod.handle,
      reason: 'Advertising a shop.',
      previous_state: { hidden: false },
      new_state: { hidden: true, hiddenReason: 'Advertising a shop.', actionId: action.id, resolvedReports: 2 },
    });

    // Restoring brings it back whole: the same revisions, votes and comments.
    await act(mod2, { targetType: 'setup', targetId: created.id, action: 'restore', reason: 'The link was to a club page.' }).expect(200);
    expect(await whatOthersSee(created.id, 'quillwort')).toEqual(visible);
    const after = (await author.agent.get(`/api/setups/${created.id}`).expect(200)).body.setup;
    expect(after.hidden).toBeNull();
    expect(after.revisions).toEqual(before.detail.revisions);
    expect(after.currentRevision).toEqual(withRevision.currentRevision);
    expect(after.commentCount).toBe(1);
    expect((await request(t.app).get(`/api/setups/${created.id}/votes`).expect(200)).body.votes).toEqual(before.votes);
    expect((await author.agent.get(`/api/setups/${created.id}/comments`).expect(200)).body.comments).toEqual(before.comments);
    await act(mod2, { targetType: 'setup', targetId: created.id, action: 'restore', reason: 'Again' }).expect(409);
  });

  it('tells each reporter the outcome in plain words and the author the reason, never naming the moderator', async () => {
    const setup = await publicSetup(author, 'Outcome words');
    await fileReport(t.db, reporter.id, { type: 'setup', id: setup.id }, 'abusive');
    await act(mod, { targetType: 'setup', targetId: setup.id, action: 'hide', reason: 'Insults in the notes.' }).expect(200);
    const [outcome] = await notificationsOf(t.db, reporter.id, 'report-outcome');
    expect(outcome).toMatchObject({ actor_id: null, setup_id: setup.id, detail: ACTION_OUTCOME_TEXT.hide });
    const [notice] = await notificationsOf(t.db, author.id, 'moderation-notice');
    expect(notice).toMatchObject({ actor_id: null, setup_id: setup.id });
    expect(notice.detail).toBe('The moderators hid your setup “Outcome words”. Reason: Insults in the notes. You can appeal within 20 days.');
    for (const n of [outcome, notice]) expect(n.detail).not.toContain(mod.handle);
    // The in-app list shows it to the author with the setup still openable (it is theirs).
    const inbox = (await author.agent.get('/api/notifications').expect(200)).body.notifications;
    expect(inbox[0]).toMatchObject({ type: 'moderation-notice', actor: null, setup: { id: setup.id, available: true } });
    // Both are mailed although the setup is hidden (other notifications about hidden setups are not).
    const job = (type: 'report-outcome' | 'moderation-notice', userId: number, detail: string) =>
      composeNotification(t.db.pool, 'https://tunefork.example', { id: 1, type, userId, actorId: null, setupId: setup.id, revisionId: null, commentId: null, detail });
    expect(await job('moderation-notice', author.id, notice.detail)).toMatchObject({ subject: 'A message from the Tunefork moderators', lines: [notice.detail], link: { url: 'https://tunefork.example/moderation/mine' } });
    expect(await job('report-outcome', reporter.id, outcome.detail)).toMatchObject({ lines: [ACTION_OUTCOME_TEXT.hide] });
  });

  it('dismisses reports without changing anything, and refuses a dismissal with nothing to dismiss', async () => {
    const setup = await publicSetup(author, 'Dismissed sheet');
    await fileReport(t.db, reporter.id, { type: 'setup', id: setup.id }, 'other', 'Looks odd');
    const res = await act(mod, { targetType: 'setup', targetId: setup.id, action: 'dismiss', reason: 'Nothing wrong here.' }).expect(200);
    expect(res.body.action.resolvedReports).toBe(1);
    expect((await request(t.app).get(`/api/setups/${setup.id}`)).status).toBe(200);
    expect((await notificationsOf(t.db, reporter.id, 'report-outcome'))[0].detail).toBe(ACTION_OUTCOME_TEXT.dismiss);
    expect(await notificationsOf(t.db, author.id, 'moderation-notice')).not.toContainEqual(expect.objectContaining({ setup_id: setup.id }));
    const again = await act(mod, { targetType: 'setup', targetId: setup.id, action: 'dismiss', reason: 'x' }).expect(409);
    expect(again.body.error.code).toBe('nothing_to_dismiss');
  });

  it('warns the author with a notification and nothing else', async () => {
    const setup = await publicSetup(author, 'Warned sheet');
    await fileReport(t.db, reporter.id, { type: 'setup', id: setup.id }, 'unsafe');
    await act(mod, { targetType: 'setup', targetId: setup.id, action: 'warn', reason: 'Do not run lipo packs past 4.2 V per cell.' }).expect(200);
    expect((await notificationsOf(t.db, author.id, 'moderation-notice'))[0].detail).toMatch(/^The moderators sent you a warning about your setup “Warned sheet”\. Reason: Do not run lipo/);
    expect((await request(t.app).get(`/api/setups/${setup.id}`)).status).toBe(200);
    expect((await auditOf(t.db, 'setup', setup.id)).map((a) => a.action)).toEqual(['warn']);
  });

  it('takes a hidden fork out of fork counts and the family list, and counts it again once restored', async () => {
    const original = await publicSetup(author, 'Family original');
    const car = await follower.agent.post('/api/cars').set('X-CSRF-Token', follower.csrf).send({ kitId: stoat8n, nickname: 'Fork car' }).expect(201);
    const fork = (await follower.agent.post(`/api/setups/${original.id}/forks`).set('X-CSRF-Token', follower.csrf).send({ carId: car.body.car.id }).expect(201)).body.setup;
    await follower.agent.patch(`/api/setups/${fork.id}`).set('X-CSRF-Token', follower.csrf).send({ visibility: 'public' }).expect(200);
    const counts = async () => ({
      detail: (await request(t.app).get(`/api/setups/${original.id}`).expect(200)).body.setup.lineage.forkCount,
      discover: (await discover({ sort: 'most-forked' })).find((s) => s.id === original.id)?.forkCount,
      kitList: (await kitList()).find((s) => s.id === original.id)?.forkCount,
      family: (await request(t.app).get(`/api/setups/${original.id}/family`).expect(200)).body.descendants.map((d: { id: number; visible: boolean }) => [d.id, d.visible]),
    });
    expect(await counts()).toEqual({ detail: 1, discover: 1, kitList: 1, family: [[fork.id, true]] });
    await act(mod, { targetType: 'setup', targetId: fork.id, action: 'hide', reason: 'Copied without credit.' }).expect(200);
    expect(await counts()).toEqual({ detail: 0, discover: 0, kitList: 0, family: [[fork.id, false]] });
    await act(mod, { targetType: 'setup', targetId: fork.id, action: 'restore', reason: 'Credit was given.' }).expect(200);
    expect(await counts()).toEqual({ detail: 1, discover: 1, kitList: 1, family: [[fork.id, true]] });
  });

  it('hides a change note: blank for others in history, revision detail and the feed; kept for its author and moderators', async () => {
    const created = await publicSetup(author, 'Change note sheet');
    const saved = await saveRevision(author, created, 'Buy these shocks at the shop down the road');
    const revision = saved.currentRevision;
    await act(mod, { targetType: 'revision', targetId: revision.id, action: 'hide', reason: 'Advertising in a change note.' }).expect(200);
    const note = async (s: SessionAgent | null) => {
      const agent = s ? s.agent : request(t.app);
      const history = (await agent.get(`/api/setups/${created.id}/history`).expect(200)).body.revisions.find((r: { id: number }) => r.id === revision.id).changeNote;
      const detail = (await agent.get(`/api/setups/${created.id}/revisions/${revision.number}`).expect(200)).body.revision.changeNote;
      return [history, detail];
    };
    expect(await note(null)).toEqual(['', '']);
    expect(await note(follower)).toEqual(['', '']);
    expect(await note(author)).toEqual(['Buy these shocks at the shop down the road', 'Buy these shocks at the shop down the road']);
    expect(await note(mod2)).toEqual(['Buy these shocks at the shop down the road', 'Buy these shocks at the shop down the road']);
    const feedItem = (await feedOf(follower)).find((i) => i.kind === 'revision' && i.setup.id === created.id);
    expect(feedItem?.revision?.changeNote).toBe('');
    const others = (await follower.agent.get(`/api/setups/${created.id}`).expect(200)).body.setup;
    expect(others.revisions.find((r: { id: number }) => r.id === revision.id)).toMatchObject({ noteHidden: true, changeNote: '' });
    await act(mod, { targetType: 'revision', targetId: revision.id, action: 'restore', reason: 'Fine after all.' }).expect(200);
    expect(await note(follower)).toEqual(['Buy these shocks at the shop down the road', 'Buy these shocks at the shop down the road']);
  });

  it('hides a comment from others and from the comment count; its author still sees it', async () => {
    const setup = await publicSetup(author, 'Comment sheet');
    const comment = (await follower.agent.post(`/api/setups/${setup.id}/comments`).set('X-CSRF-Token', follower.csrf).send({ bodyMarkdown: 'Cheap parts at example dot shop' }).expect(201)).body.comment;
    await fileReport(t.db, author.id, { type: 'comment', id: comment.id }, 'spam');
    await act(mod, { targetType: 'comment', targetId: comment.id, action: 'hide', reason: 'Spam link.' }).expect(200);
    expect((await request(t.app).get(`/api/setups/${setup.id}/comments`).expect(200)).body.comments).toEqual([]);
    expect((await author.agent.get(`/api/setups/${setup.id}`).expect(200)).body.setup.commentCount).toBe(0);
    const own = (await follower.agent.get(`/api/setups/${setup.id}/comments`).expect(200)).body.comments;
    expect(own).toEqual([expect.objectContaining({ id: comment.id, hidden: expect.objectContaining({ reason: 'Spam link.', autoHidden: false }) })]);
    expect(ids((await mod2.agent.get(`/api/setups/${setup.id}/comments`).expect(200)).body.comments)).toEqual([comment.id]);
    expect((await notificationsOf(t.db, follower.id, 'moderation-notice'))[0].detail).toMatch(/^The moderators hid your comment on “Comment sheet”/);
    await act(mod, { targetType: 'comment', targetId: comment.id, action: 'restore', reason: 'Not spam.' }).expect(200);
    const back = (await request(t.app).get(`/api/setups/${setup.id}/comments`).expect(200)).body.comments;
    expect(ids(back)).toEqual([comment.id]);
    expect(back[0].hidden).toBeUndefined();
  });

  it('leaves a hidden photo out of the setup for everyone and out of the photo address', async () => {
    const { setup } = await carWithStockSetup(author, stoat8n, { visibility: 'public', title: 'Photo sheet' });
    const uploaded = await author.agent.post(`/api/setups/${setup.id}/photos`).set('X-CSRF-Token', author.csrf).attach('photo', await plainJpeg(320, 240), 'car.jpg').expect(201);
    const photo = uploaded.body.setup.photos[0];
    await request(t.app).get(photo.url).expect(200);
    await act(mod, { targetType: 'photo', targetId: photo.id, action: 'hide', reason: 'Someone else’s photo.' }).expect(200);
    expect((await request(t.app).get(`/api/setups/${setup.id}`).expect(200)).body.setup.photos).toEqual([]);
    await request(t.app).get(photo.url).expect(404);
    await act(mod, { targetType: 'photo', targetId: photo.id, action: 'restore', reason: 'Their own photo after all.' }).expect(200);
    expect(ids((await request(t.app).get(`/api/setups/${setup.id}`).expect(200)).body.setup.photos)).toEqual([photo.id]);
  });

  it('hides a racer profile: bio withheld from others, shown with the notice to the racer and moderators', async () => {
    const r = await signedInRacer(t, { role: 'racer', prefix: 'bio' });
    await r.agent.patch('/api/me/profile').set('X-CSRF-Token', r.csrf).send({ bio: 'Best prices at my shop', homeTrack: 'Old Kiln Indoor' }).expect(200);
    await act(mod, { targetType: 'racer', targetId: r.id, action: 'hide', reason: 'Advertising in the bio.' }).expect(200);
    const anon = (await request(t.app).get(`/api/racers/${r.handle}`).expect(200)).body.racer;
    expect(anon).toMatchObject({ handle: r.handle, bioHtml: '', homeTrack: '' });
    expect(anon.hidden).toBeUndefined();
    for (const viewer of [r, mod2]) {
      const seen = (await viewer.agent.get(`/api/racers/${r.handle}`).expect(200)).body.racer;
      expect(seen).toMatchObject({ bioHtml: expect.stringContaining('Best prices at my shop'), hidden: { reason: 'Advertising in the bio.', autoHidden: false } });
    }
    await act(mod, { targetType: 'racer', targetId: r.id, action: 'restore', reason: 'Changed.' }).expect(200);
    expect((await request(t.app).get(`/api/racers/${r.handle}`).expect(200)).body.racer.bioHtml).toContain('Best prices at my shop');
  });

  it('takes over an automatic hide and clears it on restore', async () => {
    const setup = await publicSetup(author, 'Auto-hidden sheet');
    const [auto] = await sql<{ id: number }>(t.db, "INSERT INTO moderation_actions (action, target_type, target_id, subject_user_id, reason) VALUES ('auto-hide', 'setup', :id, :a, 'Reported by several racers') RETURNING id", { id: setup.id, a: author.id });
    await sql(t.db, "INSERT INTO content_hides (target_type, target_id, reason, auto, action_id) VALUES ('setup', :id, 'Reported by several racers', true, :auto) RETURNING target_id", { id: setup.id, auto: auto.id });
    await sql(t.db, 'UPDATE setups SET hidden_at = now() WHERE id = :id RETURNING id', { id: setup.id });
    await fileReport(t.db, reporter.id, { type: 'setup', id: setup.id }, 'spam');
    expect(rowFor((await queue(mod)).items, 'setup', setup.id)?.content).toMatchObject({ autoHidden: true, hiddenReason: 'Reported by several racers' });
    await act(mod, { targetType: 'setup', targetId: setup.id, action: 'restore', reason: 'Reports were wrong.' }).expect(200);
    expect((await request(t.app).get(`/api/setups/${setup.id}`)).status).toBe(200);
    expect(await sql(t.db, "SELECT 1 FROM content_hides WHERE target_type = 'setup' AND target_id = :id", { id: setup.id })).toEqual([]);
  });
});

describe('hide everything by an account, and suspensions', () => {
  async function spammer() {
    const s = await signedInRacer(t, { role: 'racer', prefix: 'spam' });
    const a = await publicSetup(s, 'Zephyrine discount parts one');
    const b = await publicSetup(s, 'Zephyrine discount parts two');
    const comment = (await s.agent.post(`/api/setups/${a.id}/comments`).set('X-CSRF-Token', s.csrf).send({ bodyMarkdown: 'zephyrine deals' }).expect(201)).body.comment;
    const onOthers = await publicSetup(author, 'Honest sheet');
    const reply = (await s.agent.post(`/api/setups/${onOthers.id}/comments`).set('X-CSRF-Token', s.csrf).send({ bodyMarkdown: 'zephyrine deals here too' }).expect(201)).body.comment;
    await s.agent.patch('/api/me/profile').set('X-CSRF-Token', s.csrf).send({ bio: 'zephyrine shop' }).expect(200);
    return { s, setups: [a.id, b.id], comments: [comment.id, reply.id], onOthers: onOthers.id };
  }

  it('hides every setup, comment and the profile in one step, resolves every report on them, and restoring the racer brings all of it back', async () => {
    const { s, setups, comments, onOthers } = await spammer();
    // One setup was already hidden on its own: hide-all leaves that hide alone, and restoring the racer does too.
    await act(mod, { targetType: 'setup', targetId: setups[1], action: 'hide', reason: 'Spam on its own.' }).expect(200);
    await fileReport(t.db, reporter.id, { type: 'setup', id: setups[0] }, 'spam');
    await fileReport(t.db, reporter2.id, { type: 'comment', id: comments[1] }, 'spam');
    const res = await act(mod, { targetType: 'racer', targetId: s.id, action: 'hide-all', reason: 'Spam account.' }).expect(200);
    expect(res.body.action).toMatchObject({ action: 'hide-all', resolvedReports: 2 });
    expect(ids(await search('zephyrine'))).toEqual([]);
    for (const id of setups) expect((await request(t.app).get(`/api/setups/${id}`)).status).toBe(404);
    expect((await request(t.app).get(`/api/setups/${onOthers}/comments`).expect(200)).body.comments).toEqual([]);
    expect((await request(t.app).get(`/api/racers/${s.handle}`).expect(200)).body.racer.bioHtml).toBe('');
    expect((await notificationsOf(t.db, reporter2.id, 'report-outcome'))[0].detail).toBe(ACTION_OUTCOME_TEXT['hide-all']);
    const audit = (await auditOf(t.db, 'racer', s.id)).at(-1)!;
    expect(audit).toMatchObject({ action: 'hide-all', new_state: { hidden: { setup: 1, comment: 2, photo: 0, racer: 1, revision: 0 } } });

    await act(mod2, { targetType: 'racer', targetId: s.id, action: 'restore', reason: 'Not a spammer: a club shop.' }).expect(200);
    expect(ids(await search('zephyrine'))).toEqual([setups[0]]);
    expect((await request(t.app).get(`/api/setups/${setups[1]}`)).status).toBe(404);
    expect(ids((await request(t.app).get(`/api/setups/${onOthers}/comments`).expect(200)).body.comments)).toEqual([comments[1]]);
    expect((await request(t.app).get(`/api/racers/${s.handle}`).expect(200)).body.racer.bioHtml).toContain('zephyrine shop');
  });

  it('suspends for a number of days, ending sessions, optionally hiding everything; only admins suspend moderators', async () => {
    const { s, setups } = await spammer();
    const before = Date.now();
    const res = await act(mod, { targetType: 'setup', targetId: setups[0], action: 'suspend', reason: 'Spam account.', suspendDays: 7, hideContent: true }).expect(200);
    const until = new Date(res.body.action.suspendedUntil).getTime();
    expect(until).toBeGreaterThanOrEqual(before + 7 * 86_400_000 - 1000);
    expect(until).toBeLessThanOrEqual(Date.now() + 7 * 86_400_000 + 1000);
    expect((await s.agent.get('/api/me').expect(200)).body.user).toBeNull();
    expect((await request(t.app).get(`/api/setups/${setups[0]}`)).status).toBe(404);
    const [row] = await sql<{ suspended_indefinitely: boolean; suspension_reason: string }>(t.db, 'SELECT suspended_indefinitely, suspension_reason FROM users WHERE id = :id', { id: s.id });
    expect(row).toEqual({ suspended_indefinitely: false, suspension_reason: 'Spam account.' });
    expect((await auditOf(t.db, 'setup', setups[0])).at(-1)).toMatchObject({
      action: 'suspend',
      previous_state: { suspendedUntil: null, suspendedIndefinitely: false },
      new_state: { suspendedIndefinitely: false, hidden: { setup: 2 } },
    });

    // Indefinitely, content left as it is; a moderator's account only by an admin.
    const other = await signedInRacer(t, { role: 'racer', prefix: 'susp' });
    const kept = await publicSetup(other, 'Kept visible');
    await act(mod, { targetType: 'racer', targetId: other.id, action: 'suspend', reason: 'Threats.', suspendDays: null }).expect(200);
    expect((await sql<{ suspended_indefinitely: boolean }>(t.db, 'SELECT suspended_indefinitely FROM users WHERE id = :id', { id: other.id }))[0].suspended_indefinitely).toBe(true);
    expect((await follower.agent.get(`/api/setups/${kept.id}`)).status).toBe(200);
    const colleague = await signedInRacer(t, { role: 'moderator', prefix: 'modsusp' });
    await act(mod, { targetType: 'racer', targetId: colleague.id, action: 'suspend', reason: 'x', suspendDays: 1 }).expect(403);
    await act(admin, { targetType: 'racer', targetId: colleague.id, action: 'suspend', reason: 'Abused the queue.', suspendDays: 1 }).expect(200);
    expect((await colleague.agent.get('/api/me').expect(200)).body.user).toBeNull();
  });
});
