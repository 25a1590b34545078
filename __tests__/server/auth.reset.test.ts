import { csrfAgent, createRacer, signIn, tokenFromLink, waitForMail } from '../support/accounts';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('password reset by e-mail', () => {
  it('answers the same for an address with an account and one without (no enumeration)', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await csrfAgent(t.app);
    const known = await agent.post('/api/auth/forgot-password').set('X-CSRF-Token', csrf).send({ email: r.email });
    const unknown = await agent.post('/api/auth/forgot-password').set('X-CSRF-Token', csrf).send({ email: 'ghost.racer@racers.example' });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
    await waitForMail(t.db, r.email, /new tunefork password/i);
    await t.mailer.idle();
    expect(await t.db.models.MailboxMessage.count({ where: { toAddress: 'ghost.racer@racers.example' } })).toBe(0);
  });

  it('sets a new password once, signs out the other sessions, and refuses the link a second time', async () => {
    const r = await createRacer(t.db);
    const elsewhere = await signIn(t.app, r.handle, r.password);
    const { agent, csrf } = await csrfAgent(t.app);
    await agent.post('/api/auth/forgot-password').set('X-CSRF-Token', csrf).send({ email: r.email }).expect(202);
    const mail = await waitForMail(t.db, r.email, /new tunefork password/i);
    expect(mail.htmlBody).toContain('Choose a new password');
    const token = tokenFromLink(mail.textBody, '/reset-password');

    const newPassword = 'softer-rear-springs-today';
    await agent.post('/api/auth/reset-password').set('X-CSRF-Token', csrf).send({ token, password: newPassword }).expect(200);
    expect((await elsewhere.agent.get('/api/me')).body.user).toBeNull();
    await signIn(t.app, r.handle, newPassword);
    await expect(signIn(t.app, r.handle, r.password)).rejects.toThrow(/401/);

    const again = await agent.post('/api/auth/reset-password').set('X-CSRF-Token', csrf).send({ token, password: 'another-long-password' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('token_invalid');
  });

  it('refuses a reset link after one hour', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await csrfAgent(t.app);
    await agent.post('/api/auth/forgot-password').set('X-CSRF-Token', csrf).send({ email: r.email }).expect(202);
    const token = tokenFromLink((await waitForMail(t.db, r.email, /new tunefork password/i)).textBody, '/reset-password');
    const row = await t.db.models.EmailToken.findOne({ where: { userId: r.user.id, purpose: 'reset' } });
    expect(row!.expiresAt.getTime() - row!.createdAt.getTime()).toBe(3600 * 1000);
    await row!.update({ expiresAt: new Date(Date.now() - 1) });
    const res = await agent.post('/api/auth/reset-password').set('X-CSRF-Token', csrf).send({ token, password: 'another-long-password' });
    expect(res.status).toBe(400);
  });

  it('only the newest reset link works', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await csrfAgent(t.app);
    await agent.post('/api/auth/forgot-password').set('X-CSRF-Token', csrf).send({ email: r.email }).expect(202);
    const first = tokenFromLink((await waitForMail(t.db, r.email, /new tunefork password/i)).textBody, '/reset-password');
    await t.db.models.MailboxMessage.destroy({ where: { toAddress: r.email } });
    await agent.post('/api/auth/forgot-password').set('X-CSRF-Token', csrf).send({ email: r.email }).expect(202);
    const second = tokenFromLink((await waitForMail(t.db, r.email, /new tunefork password/i)).textBody, '/reset-password');
    expect((await agent.post('/api/auth/reset-password').set('X-CSRF-Token', csrf).send({ token: first, password: 'another-long-password' })).status).toBe(400);
    expect((await agent.post('/api/auth/reset-password').set('X-CSRF-Token', csrf).send({ token: second, password: 'another-long-password' })).status).toBe(200);
  });
});

describe('resend verification', () => {
  it('answers the same whether or not the address exists, and mails an unverified racer', async () => {
    const r = await createRacer(t.db, { verified: false });
    const { agent, csrf } = await csrfAgent(t.app);
    const known = await agent.post('/api/auth/resend-verification').set('X-CSRF-Token', csrf).send({ email: r.email });
    const unknown = await agent.post('/api/auth/resend-verification').set('X-CSRF-Token', csrf).send({ email: 'nobody.here@racers.example' });
    expect(known.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
    const token = tokenFromLink((await waitForMail(t.db, r.email, /confirm/i)).textBody, '/verify-email');
    await agent.post('/api/auth/verify-email').set('X-CSRF-Token', csrf).send({ token }).expect(200);
    await r.user.reload();
    expect(r.user.emailVerifiedAt).not.toBeNull();
  });
});
