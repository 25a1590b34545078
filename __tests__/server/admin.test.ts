import { adminUserListSchema } from '../../shared/types/auth';
import { createRacer, signIn } from '../support/accounts';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

let t: TestApp;
beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
});
afterAll(async () => {
  await t.close();
});

describe('admin: roles and suspensions', () => {
  it('lists and searches racers', async () => {
    const admin = await createRacer(t.db, { role: 'admin' });
    const r = await createRacer(t.db, { prefix: 'findme' });
    const { agent } = await signIn(t.app, admin.handle, admin.password);
    const res = await agent.get('/api/admin/users').query({ query: 'findme' }).expect(200);
    const { users } = adminUserListSchema.parse(res.body);
    expect(users.map((u) => u.handle)).toEqual([r.handle]);
  });

  it('promotes a racer to moderator, who then passes moderator checks', async () => {
    const admin = await createRacer(t.db, { role: 'admin' });
    const r = await createRacer(t.db);
    const { agent, csrf } = await signIn(t.app, admin.handle, admin.password);
    const res = await agent.patch(`/api/admin/users/${r.user.id}/role`).set('X-CSRF-Token', csrf).send({ role: 'moderator' }).expect(200);
    expect(res.body.user.role).toBe('moderator');
    await r.user.reload();
    expect(r.user.role).toBe('moderator');
  });

  it('will not let the last admin demote themself', async () => {
    await resetDatabase(t.db);
    const admin = await createRacer(t.db, { role: 'admin' });
    const { agent, csrf } = await signIn(t.app, admin.handle, admin.password);
    const res = await agent.patch(`/api/admin/users/${admin.user.id}/role`).set('X-CSRF-Token', csrf).send({ role: 'racer' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('last_admin');
    const second = await createRacer(t.db, { role: 'admin' });
    await agent.patch(`/api/admin/users/${second.user.id}/role`).set('X-CSRF-Token', csrf).send({ role: 'admin' }).expect(200);
    await agent.patch(`/api/admin/users/${admin.user.id}/role`).set('X-CSRF-Token', csrf).send({ role: 'racer' }).expect(200);
  });

  it('suspends a racer (ending their sessions) and lifts it again', async () => {
    const admin = await createRacer(t.db, { role: 'admin' });
    const r = await createRacer(t.db);
    const victim = await signIn(t.app, r.handle, r.password);
    const { agent, csrf } = await signIn(t.app, admin.handle, admin.password);
    const until = new Date(Date.now() + 7 * 86_400_000).toISOString();
    const res = await agent.post(`/api/admin/users/${r.user.id}/suspend`).set('X-CSRF-Token', csrf).send({ until, reason: 'Advertising in setup notes' }).expect(200);
    expect(res.body.user).toMatchObject({ suspendedUntil: until, suspendedIndefinitely: false, suspensionReason: 'Advertising in setup notes' });
    expect((await victim.agent.get('/api/me')).body.user).toBeNull();
    await expect(signIn(t.app, r.handle, r.password)).rejects.toThrow(/403/);
    await agent.post(`/api/admin/users/${r.user.id}/unsuspend`).set('X-CSRF-Token', csrf).expect(200);
    await signIn(t.app, r.handle, r.password);
  });

  it('refuses a suspension end date in the past and suspending oneself', async () => {
    const admin = await createRacer(t.db, { role: 'admin' });
    const r = await createRacer(t.db);
    const { agent, csrf } = await signIn(t.app, admin.handle, admin.password);
    const past = await agent.post(`/api/admin/users/${r.user.id}/suspend`).set('X-CSRF-Token', csrf).send({ until: '2001-01-01T00:00:00Z', reason: 'Testing dates' });
    expect(past.status).toBe(400);
    expect(past.body.error.details.until).toBeDefined();
    const self = await agent.post(`/api/admin/users/${admin.user.id}/suspend`).set('X-CSRF-Token', csrf).send({ until: null, reason: 'Testing self' });
    expect(self.status).toBe(409);
  });

  it('answers 404 for an unknown racer id', async () => {
    const admin = await createRacer(t.db, { role: 'admin' });
    const { agent, csrf } = await signIn(t.app, admin.handle, admin.password);
    const res = await agent.post('/api/admin/users/999999/unsuspend').set('X-CSRF-Token', csrf);
    expect(res.status).toBe(404);
  });
});
