import request from 'supertest';
import { meResponseSchema } from '../../shared/types/auth';
import { apiErrorBodySchema } from '../../shared/types/errors';
import { csrfAgent, createRacer, signIn } from '../support/accounts';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp({ trustProxy: true });
});
afterAll(async () => {
  await t.close();
});

async function me(agent: ReturnType<typeof request.agent>) {
  return meResponseSchema.parse((await agent.get('/api/me').expect(200)).body).user;
}

describe('password sign-in', () => {
  it('signs in by e-mail or by handle, in any case', async () => {
    const r = await createRacer(t.db);
    expect((await me((await signIn(t.app, r.email.toUpperCase(), r.password)).agent))?.handle).toBe(r.handle);
    expect((await me((await signIn(t.app, r.handle.toUpperCase(), r.password)).agent))?.handle).toBe(r.handle);
  });

  it('gives the same 401 for a wrong password and an unknown account', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await csrfAgent(t.app);
    const wrong = await agent.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login: r.email, password: 'not-the-password' });
    const unknown = await agent.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login: 'nobody@racers.example', password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('gives the session a new id at sign-in (no fixation)', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf, cookie: anonymous } = await csrfAgent(t.app);
    expect(anonymous).toBeDefined();
    const res = await agent.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login: r.handle, password: r.password });
    const signedIn = /tunefork\.sid=[^;]+/.exec(String(res.headers['set-cookie']))?.[0];
    expect(signedIn).toBeDefined();
    expect(signedIn).not.toBe(anonymous);
    // The anonymous session id no longer identifies anyone.
    const old = await request(t.app).get('/api/me').set('Cookie', anonymous!).expect(200);
    expect(old.body.user).toBeNull();
  });

  it('ends the session at sign-out', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await signIn(t.app, r.handle, r.password);
    await agent.post('/api/auth/sign-out').set('X-CSRF-Token', csrf).expect(204);
    expect(await me(agent)).toBeNull();
    const rows = await t.db.pool.query("SELECT count(*)::int AS n FROM sessions WHERE sess -> 'passport' ->> 'user' = $1", [String(r.user.id)]);
    expect(rows.rows[0].n).toBe(0);
  });

  it('slows repeated failures from one address without locking the owner out elsewhere', async () => {
    const r = await createRacer(t.db);
    const attacker = await csrfAgent(t.app);
    const attempt = (agent: typeof attacker, ip: string, password: string) =>
      agent.agent.post('/api/auth/sign-in').set('X-Forwarded-For', ip).set('X-CSRF-Token', agent.csrf).send({ login: r.handle, password });
    for (let i = 0; i < 5; i++) expect((await attempt(attacker, '203.0.113.9', 'guess-number-' + i)).status).toBe(401);
    const slowed = await attempt(attacker, '203.0.113.9', 'guess-number-6');
    expect(slowed.status).toBe(429);
    const body = apiErrorBodySchema.parse(slowed.body);
    expect(body.error.code).toBe('too_many_attempts');
    expect(body.error.details?.retryAfterSeconds).toBeGreaterThan(0);
    // Even the right password waits from that address …
    expect((await attempt(attacker, '203.0.113.9', r.password)).status).toBe(429);
    // … while the owner, from their own address, signs in at once.
    const owner = await csrfAgent(t.app);
    expect((await attempt(owner, '198.51.100.20', r.password)).status).toBe(200);
  });
});

describe('suspension', () => {
  it('refuses a suspended racer with the end date, and their open sessions stop working', async () => {
    const r = await createRacer(t.db);
    const { agent } = await signIn(t.app, r.handle, r.password);
    expect((await me(agent))?.id).toBe(r.user.id);

    await r.user.update({ suspendedUntil: new Date('2099-01-03T00:00:00Z'), suspensionReason: 'Spam setups' });
    expect(await me(agent)).toBeNull();

    const { agent: fresh, csrf } = await csrfAgent(t.app);
    const res = await fresh.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login: r.handle, password: r.password });
    expect(res.status).toBe(403);
    const body = apiErrorBodySchema.parse(res.body);
    expect(body.error.code).toBe('account_suspended');
    expect(body.error.message).toBe('This account is suspended until 3 January 2099.');
    expect(body.error.details).toMatchObject({ until: '2099-01-03T00:00:00.000Z', reason: 'Spam setups' });
  });

  it('says an indefinite suspension lasts until an admin lifts it', async () => {
    const r = await createRacer(t.db);
    await r.user.update({ suspendedIndefinitely: true });
    const { agent, csrf } = await csrfAgent(t.app);
    const res = await agent.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login: r.handle, password: r.password });
    expect(res.body.error.message).toBe('This account is suspended until an admin lifts it.');
  });
});

describe('sessions in PostgreSQL', () => {
  it('survive a server restart: a new app instance on the same store knows the session', async () => {
    const r = await createRacer(t.db);
    const { cookie } = await signIn(t.app, r.handle, r.password);
    expect(cookie).toBeDefined();
    const restarted = buildTestApp();
    try {
      const res = await request(restarted.app).get('/api/me').set('Cookie', cookie!).expect(200);
      expect(res.body.user?.handle).toBe(r.handle);
    } finally {
      await restarted.close();
    }
  });
});

describe('auth rate limit', () => {
  it('answers 429 with when to retry once sign-in attempts from one client pass the limit', async () => {
    const limited = buildTestApp({ authRateLimit: { max: 2, windowMs: 60_000 } });
    try {
      const { agent, csrf } = await csrfAgent(limited.app);
      const send = () => agent.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login: 'someone', password: 'whatever-it-is' });
      expect((await send()).status).toBe(401);
      expect((await send()).status).toBe(401);
      const res = await send();
      expect(res.status).toBe(429);
      expect(res.body.error.code).toBe('rate_limited');
      expect(res.body.error.message).toMatch(/Try again in \d+ s/);
    } finally {
      await limited.close();
    }
  });
});
