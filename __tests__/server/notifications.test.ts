import request from 'supertest';
import type { NotificationDto, NotificationPage } from '../../shared/types/community';
import { NOTIFICATION_PAGE_SIZE, notify, onNotification, type StoredNotification } from '../../server/services/notifications';
import { createRacer, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

type Racer = { id: number; handle: string; s: SessionAgent };

let t: TestApp;
let stoat8n: number;
const heard: StoredNotification[] = [];

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  onNotification((n) => {
    heard.push(n);
  });
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

async function publicSetup(owner: Racer, title = 'Hollow Pines — loose and dusty') {
  return (await carWithStockSetup(owner.s, stoat8n, { title, visibility: 'public' })).setup.id;
}
async function revise(owner: Racer, setupId: number, changeNote: string): Promise<number> {
  const current = (await owner.s.agent.get(`/api/setups/${setupId}`).expect(200)).body.setup.currentRevision;
  const values = { ...current.values, 'shock.rear.oil': (current.values['shock.rear.oil'] as number) + 10 };
  return (await write(owner, 'post', `/api/setups/${setupId}/revisions`, { baseRevisionId: current.id, values, changeNote }).expect(201)).body.setup.currentRevision.id;
}
async function fork(who: Racer, setupId: number): Promise<number> {
  const car = await write(who, 'post', '/api/cars', { kitId: stoat8n, nickname: 'Fork car' }).expect(201);
  return (await write(who, 'post', `/api/setups/${setupId}/forks`, { carId: car.body.car.id }).expect(201)).body.setup.id;
}
async function comment(who: Racer, setupId: number, body: object): Promise<number> {
  return (await write(who, 'post', `/api/setups/${setupId}/comments`, body).expect(201)).body.comment.id;
}

async function inbox(who: Racer, cursor?: string | null): Promise<NotificationPage> {
  return (await who.s.agent.get(`/api/notifications${cursor ? `?cursor=${cursor}` : ''}`).expect(200)).body;
}
async function unread(who: Racer): Promise<number> {
  return (await who.s.agent.get('/api/notifications/unread-count').expect(200)).body.unreadCount;
}
/** A fork tells its listeners after the response: wait for the notification to land. */
async function eventually(who: Racer, count: number, timeoutMs = 5_000): Promise<NotificationDto[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const { notifications } = await inbox(who);
    if (notifications.length >= count || Date.now() > deadline) return notifications;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

describe('notifications for each event', () => {
  it('tells a racer about a new follower, once however often they re-follow', async () => {
    const [juno, rafi] = [await racer('juno'), await racer('rafi')];
    await write(rafi, 'post', `/api/racers/${juno.handle}/follow`).expect(200);
    await write(rafi, 'delete', `/api/racers/${juno.handle}/follow`).expect(200);
    await write(rafi, 'post', `/api/racers/${juno.handle}/follow`).expect(200);
    const { notifications } = await inbox(juno);
    expect(notifications).toEqual([
      expect.objectContaining({ type: 'new-follower', read: false, actor: { handle: rafi.handle, displayName: expect.any(String) }, setup: null }),
    ]);
    expect(await unread(juno)).toBe(1);
  });

  it('tells the owner about a comment on their setup, quoting its first line', async () => {
    const [juno, rafi] = [await racer('juno'), await racer('rafi')];
    const setup = await publicSetup(juno, 'Saltmarsh — wet grass');
    const id = await comment(rafi, setup, { bodyMarkdown: 'How does it land off the big double?\n\nMore detail here.' });
    const [n] = (await inbox(juno)).notifications;
    expect(n).toMatchObject({
      type: 'comment-on-setup',
      actor: { handle: rafi.handle },
      setup: { id: setup, title: 'Saltmarsh — wet grass', available: true },
      commentId: id,
      detail: 'How does it land off the big double?',
    });
  });

  it('tells the author of a change about a comment on that change', async () => {
    const [juno, rafi] = [await racer('juno'), await racer('rafi')];
    const setup = await publicSetup(juno);
    const change = await revise(juno, setup, 'Thicker rear oil');
    await comment(rafi, setup, { bodyMarkdown: 'Why 10 more?', revisionId: change });
    const { notifications } = await inbox(juno);
    expect(notifications).toEqual([expect.objectContaining({ type: 'comment-on-revision', revision: { id: change, number: 2, setupId: setup } })]);
  });

  it('tells a commenter about a reply, and the owner about the reply on their setup, each once', async () => {
    const [juno, rafi, pell] = [await racer('juno'), await racer('rafi'), await racer('pell')];
    const setup = await publicSetup(juno);
    const question = await comment(rafi, setup, { bodyMarkdown: 'Which tyres?' });
    const answer = await comment(pell, setup, { bodyMarkdown: 'Soft pins here.', parentId: question });
    expect((await inbox(rafi)).notifications).toEqual([expect.objectContaining({ type: 'comment-reply', commentId: answer, actor: expect.objectContaining({ handle: pell.handle }) })]);
    expect((await inbox(juno)).notifications.map((n) => [n.type, n.commentId])).toEqual([
      ['comment-on-setup', answer],
      ['comment-on-setup', question],
    ]);
  });

  it('tells the owner when their setup is forked', async () => {
    const [juno, rafi] = [await racer('juno'), await racer('rafi')];
    const setup = await publicSetup(juno);
    await fork(rafi, setup);
    const notifications = await eventually(juno, 1);
    expect(notifications).toEqual([expect.objectContaining({ type: 'setup-forked', actor: expect.objectContaining({ handle: rafi.handle }), setup: expect.objectContaining({ id: setup }) })]);
  });

  it('tells fork owners when the original changes, linking their own fork', async () => {
    const [juno, rafi, pell] = [await racer('juno'), await racer('rafi'), await racer('pell')];
    const setup = await publicSetup(juno);
    const rafiFork = await fork(rafi, setup);
    const pellFork = await fork(pell, setup);
    await write(pell, 'delete', `/api/setups/${pellFork}`).expect(204);
    const change = await revise(juno, setup, 'Stiffer rear springs for the whoops.\nDetails follow.');
    expect((await inbox(rafi)).notifications).toEqual([
      expect.objectContaining({
        type: 'original-changed',
        actor: expect.objectContaining({ handle: juno.handle }),
        setup: { id: rafiFork, title: expect.any(String), available: true },
        revision: { id: change, number: 2, setupId: setup },
        detail: 'Stiffer rear springs for the whoops.',
      }),
    ]);
    // A deleted fork's owner is not told.
    expect((await inbox(pell)).notifications).toEqual([]);
  });

  it('shows events without an actor, such as the outcome of a report', async () => {
    const juno = await racer('juno');
    const setup = await publicSetup(juno);
    const stored = await notify(t.db, { type: 'report-outcome', userId: juno.id, actorId: null, setupId: setup, detail: 'The setup you reported was hidden.' });
    expect(stored).toMatchObject({ type: 'report-outcome', userId: juno.id, actorId: null });
    expect((await inbox(juno)).notifications).toEqual([expect.objectContaining({ type: 'report-outcome', actor: null, detail: 'The setup you reported was hidden.' })]);
    expect(heard).toContainEqual(expect.objectContaining({ id: stored!.id, type: 'report-outcome', userId: juno.id }));
  });
});

describe('no notification about my own actions', () => {
  it('stays quiet when I comment on, reply in, fork and change my own setup', async () => {
    const juno = await racer('juno');
    const setup = await publicSetup(juno);
    const change = await revise(juno, setup, 'Own change');
    const mine = await comment(juno, setup, { bodyMarkdown: 'Note to self', revisionId: change });
    await comment(juno, setup, { bodyMarkdown: 'Reply to self', parentId: mine });
    await fork(juno, setup);
    await revise(juno, setup, 'Another own change, with my fork of it in my garage');
    // The fork's listener runs after the response: give it the time a notification would take to land.
    expect(await eventually(juno, 1, 1_000)).toEqual([]);
    expect(await notify(t.db, { type: 'new-follower', userId: juno.id, actorId: juno.id })).toBeNull();
    expect(await unread(juno)).toBe(0);
    await expect(
      t.db.pool.query("INSERT INTO notifications (user_id, type, actor_id) VALUES ($1, 'new-follower', $1)", [juno.id]),
    ).rejects.toThrow(/notifications_not_own_action_check/);
  });
});

describe('reading notifications', () => {
  it('marks one read, then all read, and answers the new unread count each time', async () => {
    const [juno, ...fans] = [await racer('juno'), await racer('fan'), await racer('fan'), await racer('fan')];
    for (const fan of fans) await write(fan, 'post', `/api/racers/${juno.handle}/follow`).expect(200);
    const { notifications } = await inbox(juno);
    expect(notifications.map((n) => n.actor?.handle)).toEqual(fans.map((f) => f.handle).reverse());
    const one = await write(juno, 'post', `/api/notifications/${notifications[1].id}/read`).expect(200);
    expect(one.body).toEqual({ unreadCount: 2 });
    // Reading it again is fine and changes nothing.
    expect((await write(juno, 'post', `/api/notifications/${notifications[1].id}/read`).expect(200)).body).toEqual({ unreadCount: 2 });
    expect((await inbox(juno)).notifications.map((n) => n.read)).toEqual([false, true, false]);
    expect((await write(juno, 'post', '/api/notifications/read-all').expect(200)).body).toEqual({ unreadCount: 0 });
    expect((await inbox(juno)).notifications.every((n) => n.read)).toBe(true);
  });

  it('answers 404 for another racer’s notification and for ids that name nothing', async () => {
    const [juno, rafi] = [await racer('juno'), await racer('rafi')];
    await write(rafi, 'post', `/api/racers/${juno.handle}/follow`).expect(200);
    const [n] = (await inbox(juno)).notifications;
    for (const id of [n.id, 999_999_999, 99_999_999_999, 'abc']) {
      const res = await write(rafi, 'post', `/api/notifications/${id}/read`);
      expect(res.status).toBe(404);
      expect(res.body.error.message).toBe('That notification was not found.');
    }
    expect((await inbox(juno)).notifications[0].read).toBe(false);
    expect((await inbox(rafi)).notifications).toEqual([]);
    expect((await request(t.app).get('/api/notifications/unread-count')).status).toBe(401);
  });

  it('pages newest first with a cursor, and leaves out what suspended racers did', async () => {
    const [juno, actor, suspended] = [await racer('juno'), await racer('actor'), await racer('suspended')];
    await t.db.pool.query(
      `INSERT INTO notifications (user_id, type, actor_id, created_at)
       SELECT $1, 'new-follower', $2, timestamptz '2026-11-01 08:00:00Z' + (i / 2) * interval '1 second' FROM generate_series(1, $3::int) AS i`,
      [juno.id, actor.id, NOTIFICATION_PAGE_SIZE + 5],
    );
    await notify(t.db, { type: 'new-follower', userId: juno.id, actorId: suspended.id });
    await t.db.models.User.update({ suspendedIndefinitely: true }, { where: { id: suspended.id } });
    const first = await inbox(juno);
    const second = await inbox(juno, first.nextCursor);
    expect(second.nextCursor).toBeNull();
    const ids = [...first.notifications, ...second.notifications].map((n) => n.id);
    const { rows } = await t.db.pool.query<{ id: number }>('SELECT id FROM notifications WHERE user_id = $1 AND actor_id = $2 ORDER BY created_at DESC, id DESC', [juno.id, actor.id]);
    expect(ids).toEqual(rows.map((r) => r.id));
    expect(await unread(juno)).toBe(NOTIFICATION_PAGE_SIZE + 5);
    expect((await juno.s.agent.get('/api/notifications?cursor=zzz')).status).toBe(400);
  });

  it('withholds the title of a setup I can no longer open', async () => {
    const [juno, rafi] = [await racer('juno'), await racer('rafi')];
    const setup = await publicSetup(juno);
    const question = await comment(rafi, setup, { bodyMarkdown: 'Which pinion?' });
    await comment(juno, setup, { bodyMarkdown: '17T.', parentId: question });
    await write(juno, 'patch', `/api/setups/${setup}`, { visibility: 'private' }).expect(200);
    expect((await inbox(rafi)).notifications[0].setup).toEqual({ id: setup, title: null, available: false });
    // The owner still sees their own setup's title.
    expect((await inbox(juno)).notifications[0].setup).toMatchObject({ id: setup, available: true });
  });
});

describe('failures never reach the request', () => {
  it('logs a notification it could not store and answers null instead of throwing', async () => {
    const juno = await racer('juno');
    const stored = await notify(t.db, { type: 'new-follower', userId: 2_000_000_000, actorId: juno.id });
    expect(stored).toBeNull();
    expect(t.logLines.join('')).toMatch(/could not store a notification/);
  });

  it('stores the notification and finishes the request when a listener throws', async () => {
    onNotification(() => {
      throw new Error('mail queue down');
    });
    const [juno, rafi] = [await racer('juno'), await racer('rafi')];
    await write(rafi, 'post', `/api/racers/${juno.handle}/follow`).expect(200);
    expect(await unread(juno)).toBe(1);
    await new Promise((resolve) => setImmediate(resolve));
    expect(t.logLines.join('')).toMatch(/notification listener failed/);
  });
});
