import request from 'supertest';
import { QUEUES } from '../../server/jobs';
import { createRacer, csrfAgent, signIn } from '../support/accounts';
import { startServer, type RunningServer } from '../support/server';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/*
 * Nothing that must be shared lives in one process: two real server processes (server/index.ts)
 * on two loopback ports, one database. Each runs its own queue workers and its own fake SMTP
 * server, as two app servers behind a load balancer would.
 */

jest.setTimeout(60_000);

const AUTH_LIMIT = 6;
let a: RunningServer;
let b: RunningServer;
// This process's own handle on the same database, to create racers and read what the servers did.
let t: TestApp;

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  const env = {
    // The API test database (startServer would pick the end-to-end one).
    DATABASE_URL: process.env.DATABASE_URL!,
    AUTH_RATE_LIMIT_MAX: String(AUTH_LIMIT),
    JOB_POLL_INTERVAL_SECONDS: '0.5',
    LOG_LEVEL: 'error',
  };
  [a, b] = await Promise.all([startServer(env), startServer(env)]);
}, 90_000);

afterAll(async () => {
  await Promise.all([a?.stop(), b?.stop()]);
  await t.close();
});

beforeEach(async () => {
  await t.db.pool.query('DELETE FROM rate_limit_hits');
});

async function signInAttempt(server: RunningServer, login: string, password: string): Promise<number> {
  const { agent, csrf } = await csrfAgent(server.baseUrl);
  return (await agent.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login, password })).status;
}

describe('two app servers on one database', () => {
  it('knows a session made on one server on the other, CSRF token included', async () => {
    const r = await createRacer(t.db);
    const onA = await signIn(a.baseUrl, r.handle, r.password);
    expect(onA.cookie).toBeDefined();

    const me = await request(b.baseUrl).get('/api/me').set('Cookie', onA.cookie!).expect(200);
    expect(me.body.user.handle).toBe(r.handle);
    const write = await request(b.baseUrl)
      .put('/api/me/email-preferences')
      .set('Cookie', onA.cookie!)
      .set('X-CSRF-Token', onA.csrf)
      .send({ delivery: 'daily-digest' });
    expect(write.status).toBe(200);
    const back = await request(a.baseUrl).get('/api/me/email-preferences').set('Cookie', onA.cookie!).expect(200);
    expect(back.body.preferences.delivery).toBe('daily-digest');
  });

  it('counts a rate limit across both servers', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < AUTH_LIMIT; i += 1) {
      statuses.push(await signInAttempt(i % 2 === 0 ? a : b, 'nobody-here', 'not-the-password'));
    }
    // Three attempts on each server: alone, neither reached the limit of six.
    expect(statuses).toEqual(Array(AUTH_LIMIT).fill(401));
    expect(await signInAttempt(a, 'nobody-here', 'not-the-password')).toBe(429);
    expect(await signInAttempt(b, 'nobody-here', 'not-the-password')).toBe(429);
  });

  it('sends each queued mail exactly once while both servers run workers', async () => {
    const target = await createRacer(t.db);
    const fans = await Promise.all(Array.from({ length: 5 }, () => createRacer(t.db)));
    const servers = [a, b];
    // The follows alternate between the servers, so both queue jobs; both servers' workers poll.
    for (const [i, fan] of fans.entries()) {
      const s = await signIn(servers[i % 2].baseUrl, fan.handle, fan.password);
      await s.agent.post(`/api/racers/${target.handle}/follow`).set('X-CSRF-Token', s.csrf).send({}).expect(200);
    }

    const jobsDone = async () => {
      const { rows } = await t.db.pool.query<{ state: string }>(
        "SELECT state FROM pgboss.job WHERE name = $1 AND (data->>'userId')::int = $2",
        [QUEUES.notificationMail, target.user.id],
      );
      return rows.length === fans.length && rows.every((r) => r.state === 'completed');
    };
    const deadline = Date.now() + 20_000;
    while (!(await jobsDone())) {
      if (Date.now() > deadline) throw new Error('the mail jobs did not complete');
      await new Promise((r) => setTimeout(r, 200));
    }
    // A few more polling rounds of both workers: nothing is sent a second time.
    await new Promise((r) => setTimeout(r, 1_500));
    const mails = (await t.db.models.MailboxMessage.findAll()).filter((m) => m.toAddress.includes(target.email));
    expect(mails.map((m) => m.subject).sort()).toEqual(fans.map((f) => `${f.displayName} now follows you on Tunefork`).sort());
  });
});
