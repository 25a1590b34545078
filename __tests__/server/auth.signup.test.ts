import { authResultSchema, meResponseSchema } from '../../shared/types/auth';
import { apiErrorBodySchema } from '../../shared/types/errors';
import { csrfAgent, GOOD_PASSWORD, tokenFromLink, uniqueRacer, waitForMail } from '../support/accounts';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('sign-up', () => {
  it('creates the account, signs in with an httpOnly SameSite=Lax cookie, and mails a verification link', async () => {
    const { agent, csrf } = await csrfAgent(t.app);
    const r = uniqueRacer('newbie');
    const res = await agent.post('/api/auth/sign-up').set('X-CSRF-Token', csrf).send({ ...r, password: GOOD_PASSWORD });
    expect(res.status).toBe(201);
    const body = authResultSchema.parse(res.body);
    expect(body.user).toMatchObject({ handle: r.handle, email: r.email, emailVerified: false, role: 'racer', hasPassword: true });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/tunefork\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);

    const me = meResponseSchema.parse((await agent.get('/api/me').expect(200)).body);
    expect(me.user?.handle).toBe(r.handle);

    const mail = await waitForMail(t.db, r.email, /confirm your e-mail/i);
    expect(mail.textBody).toContain('/verify-email?token=');
    expect(mail.htmlBody).toContain('Confirm my address');
    const token = tokenFromLink(mail.textBody, '/verify-email');

    await agent.post('/api/auth/verify-email').set('X-CSRF-Token', body.csrfToken).send({ token }).expect(200);
    expect(meResponseSchema.parse((await agent.get('/api/me')).body).user?.emailVerified).toBe(true);

    const reuse = await agent.post('/api/auth/verify-email').set('X-CSRF-Token', body.csrfToken).send({ token });
    expect(reuse.status).toBe(400);
    expect(apiErrorBodySchema.parse(reuse.body).error.code).toBe('token_invalid');
  });

  it('refuses a verification link after 48 hours', async () => {
    const { agent, csrf } = await csrfAgent(t.app);
    const r = uniqueRacer('late');
    const res = await agent.post('/api/auth/sign-up').set('X-CSRF-Token', csrf).send({ ...r, password: GOOD_PASSWORD }).expect(201);
    const token = tokenFromLink((await waitForMail(t.db, r.email, /confirm/i)).textBody, '/verify-email');
    const row = await t.db.models.EmailToken.findOne({ where: { userId: res.body.user.id, purpose: 'verify' } });
    expect(row!.expiresAt.getTime() - row!.createdAt.getTime()).toBe(48 * 3600 * 1000);
    await row!.update({ expiresAt: new Date(Date.now() - 1000) });
    const late = await agent.post('/api/auth/verify-email').set('X-CSRF-Token', res.body.csrfToken).send({ token });
    expect(late.status).toBe(400);
    expect(late.body.error.code).toBe('token_invalid');
  });

  it('explains each bad field', async () => {
    const { agent, csrf } = await csrfAgent(t.app);
    const res = await agent
      .post('/api/auth/sign-up')
      .set('X-CSRF-Token', csrf)
      .send({ handle: 'a b', displayName: '', email: 'not-an-address', password: 'short' });
    expect(res.status).toBe(400);
    const { details } = apiErrorBodySchema.parse(res.body).error;
    expect(Object.keys(details ?? {}).sort()).toEqual(['displayName', 'email', 'handle', 'password']);
    expect(details?.password).toMatch(/at least 10 characters/);
  });

  it('refuses a password from the common-passwords list', async () => {
    const { agent, csrf } = await csrfAgent(t.app);
    const res = await agent.post('/api/auth/sign-up').set('X-CSRF-Token', csrf).send({ ...uniqueRacer(), password: 'Password123' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.password).toMatch(/most common passwords/);
  });

  it('treats handles and addresses as taken regardless of case', async () => {
    const first = await csrfAgent(t.app);
    const r = uniqueRacer('Case');
    await first.agent.post('/api/auth/sign-up').set('X-CSRF-Token', first.csrf).send({ ...r, password: GOOD_PASSWORD }).expect(201);
    const second = await csrfAgent(t.app);
    const res = await second.agent
      .post('/api/auth/sign-up')
      .set('X-CSRF-Token', second.csrf)
      .send({ handle: r.handle.toUpperCase(), displayName: 'Other', email: r.email.toUpperCase(), password: GOOD_PASSWORD });
    expect(res.status).toBe(409);
    expect(Object.keys(res.body.error.details).sort()).toEqual(['email', 'handle']);
  });

  it('refuses a state-changing request without the CSRF token', async () => {
    const { agent } = await csrfAgent(t.app);
    const res = await agent.post('/api/auth/sign-up').send({ ...uniqueRacer(), password: GOOD_PASSWORD });
    expect(res.status).toBe(403);
    expect(apiErrorBodySchema.parse(res.body).error.code).toBe('csrf_invalid');
    const wrong = await agent.post('/api/auth/sign-up').set('X-CSRF-Token', 'forged-token-value').send({ ...uniqueRacer(), password: GOOD_PASSWORD });
    expect(wrong.status).toBe(403);
  });
});
