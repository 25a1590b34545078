import crypto from 'node:crypto';
import request from 'supertest';
import { SESSION_COOKIE } from '../../server/auth/session';
import { sessionUserHandoff } from '../../server/auth/sessionUser';
import { signedInRacer } from '../support/accounts';
import { buildTestApp, type TestApp } from '../support/testApp';

/*
 * A signed-in request reads its session and its racer in one statement (server/auth/session.ts)
 * and passport builds the racer from that row (server/auth/sessionUser.ts). What must not change:
 * who the request is, and that a change to the racer (role, suspension, profile) is seen by the
 * very next request.
 */
let t: TestApp;

/** express-session's signed cookie value (cookie-signature: HMAC-SHA256, base64 without padding). */
const sign = (sid: string, secret: string) => `${sid}.${crypto.createHmac('sha256', secret).update(sid).digest('base64').replace(/=+$/, '')}`;

beforeAll(() => {
  t = buildTestApp();
});
afterAll(async () => {
  await t.close();
});
afterEach(() => {
  jest.restoreAllMocks();
});

describe('the racer of a signed-in request', () => {
  it('comes with the session, without a second read of the racer', async () => {
    const racer = await signedInRacer(t);
    const findByPk = jest.spyOn(t.db.models.User, 'findByPk');
    const me = await racer.agent.get('/api/me').expect(200);
    expect(me.body.user).toMatchObject({ id: racer.id, handle: racer.handle });
    expect(findByPk).not.toHaveBeenCalled();
  });

  it('is read afresh by each request: a profile change, a role change and a suspension show at once', async () => {
    const racer = await signedInRacer(t);
    await t.db.pool.query(`UPDATE users SET display_name = 'Renamed Between Requests', role = 'moderator' WHERE id = $1`, [racer.id]);
    const me = await racer.agent.get('/api/me').expect(200);
    expect(me.body.user).toMatchObject({ displayName: 'Renamed Between Requests', role: 'moderator' });
    expect((await racer.agent.get('/api/moderation/queue')).status).toBe(200);

    await t.db.pool.query(`UPDATE users SET suspended_until = now() + interval '1 day' WHERE id = $1`, [racer.id]);
    expect((await racer.agent.get('/api/me').expect(200)).body.user).toBeNull();
    expect((await racer.agent.get('/api/feed')).status).toBe(401);
  });

  it('gives a model the racer can be saved through, as one read by Sequelize would', async () => {
    const racer = await signedInRacer(t);
    const res = await racer.agent.patch('/api/me/profile').set('X-CSRF-Token', racer.csrf).send({ homeTrack: 'Saltmarsh Flats' });
    expect(res.status).toBe(200);
    const stored = await t.db.models.User.findByPk(racer.id);
    expect(stored!.homeTrack).toBe('Saltmarsh Flats');
    // Nothing else written over: the row handed over carried every column as read.
    expect(stored!.handle).toBe(racer.handle);
    expect(stored!.classesRaced).toEqual((await racer.agent.get('/api/me').expect(200)).body.user.classesRaced);
  });

  it('is nobody when the session names no usable racer, and never a server error', async () => {
    for (const passport of [{ user: 'not-a-number' }, { user: 1.5 }, { user: 99_999_999_999 }, { user: 2_000_000_000 }, {}]) {
      const sid = crypto.randomBytes(18).toString('base64url');
      await t.db.pool.query(`INSERT INTO sessions (sid, sess, expire) VALUES ($1, $2, now() + interval '1 day')`, [
        sid,
        JSON.stringify({ cookie: { originalMaxAge: 86_400_000, httpOnly: true, path: '/' }, passport }),
      ]);
      const cookie = `${SESSION_COOKIE}=${encodeURIComponent(`s:${sign(sid, t.config.sessionSecret)}`)}`;
      const me = await request(t.app).get('/api/me').set('Cookie', cookie);
      expect(me.status).toBe(200);
      expect(me.body.user).toBeNull();
    }
  });
});

describe('anonymous reads', () => {
  // Skipping the session machinery for them must change nothing anyone can see.
  it('answer as before without a session; the CSRF token route still starts one and writes are still checked', async () => {
    const discover = await request(t.app).get('/api/discover').expect(200);
    expect(discover.headers['set-cookie']).toBeUndefined();
    expect((await request(t.app).get('/api/me').expect(200)).body.user).toBeNull();
    expect((await request(t.app).get('/api/feed')).status).toBe(401);

    const csrf = await request(t.app).get('/api/auth/csrf').expect(200);
    expect(String(csrf.headers['set-cookie'])).toContain(`${SESSION_COOKIE}=`);
    // Routes match without regard to case; so does the choice to load the session.
    expect((await request(t.app).get('/api/AUTH/csrf')).status).toBe(200);
    // A write without a session gets the CSRF refusal, as before (its session was looked for).
    expect((await request(t.app).post('/api/auth/sign-out').send({})).status).toBe(403);
  });
});

describe('the hand-off between the session store and passport', () => {
  it('hands a row over once, and never one older than a second', async () => {
    const handoff = sessionUserHandoff(t.db);
    const racer = await signedInRacer(t);
    const [row] = (await t.db.pool.query(`SELECT ${handoff.userColumns} FROM users u WHERE u.id = $1`, [racer.id])).rows;
    handoff.put(row);
    expect(handoff.take(racer.id)?.handle).toBe(racer.handle);
    expect(handoff.take(racer.id)).toBeNull();

    handoff.put(row);
    const now = Date.now();
    jest.spyOn(Date, 'now').mockReturnValue(now + 1_001);
    expect(handoff.take(racer.id)).toBeNull();
  });
});
