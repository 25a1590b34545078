import request from 'supertest';
import { publicRacerResponseSchema } from '../../shared/types/auth';
import { createRacer, signIn, tokenFromLink, waitForMail } from '../support/accounts';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('public racer page', () => {
  it('renders the bio from markdown with only safe tags, and links marked nofollow ugc noopener', async () => {
    const r = await createRacer(t.db);
    await r.user.update({
      bio: '# Hi\n**Fast** on *clay*. [My notes](https://notes.example/a) <script>alert(1)</script> <img src=x onerror=alert(2)> [bad](javascript:alert(3))',
      homeTrack: 'Old Kiln Indoor',
      classesRaced: ['buggy-1-8-nitro'],
    });
    const res = await request(t.app).get(`/api/racers/${r.handle.toUpperCase()}`).expect(200);
    const { racer } = publicRacerResponseSchema.parse(res.body);
    expect(racer).toMatchObject({ handle: r.handle, homeTrack: 'Old Kiln Indoor', classesRaced: ['buggy-1-8-nitro'] });
    expect(racer.bioHtml).toContain('<h3>Hi</h3>');
    expect(racer.bioHtml).toContain('<strong>Fast</strong>');
    expect(racer.bioHtml).toContain('<a href="https://notes.example/a" rel="nofollow ugc noopener">My notes</a>');
    expect(racer.bioHtml).not.toMatch(/<script|<img|onerror|javascript:/i);
    expect(JSON.stringify(res.body)).not.toContain(r.email);
  });

  it('answers 404 for an unknown handle', async () => {
    const res = await request(t.app).get('/api/racers/no-such-racer').expect(404);
    expect(res.body.error.code).toBe('not_found');
  });
});

describe('settings', () => {
  it('updates display name, bio, home track, classes raced and units', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await signIn(t.app, r.handle, r.password);
    const res = await agent
      .patch('/api/me/profile')
      .set('X-CSRF-Token', csrf)
      .send({ displayName: 'Quick Racer', bio: 'Loose tracks.', homeTrack: 'Hollow Pines', classesRaced: ['truggy-1-8-nitro'], units: { length: 'in', temperature: 'F' } })
      .expect(200);
    expect(res.body.user).toMatchObject({ displayName: 'Quick Racer', bio: 'Loose tracks.', classesRaced: ['truggy-1-8-nitro'], units: { length: 'in', temperature: 'F' } });
  });

  it('refuses an unknown class and explains the field', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await signIn(t.app, r.handle, r.password);
    const res = await agent.patch('/api/me/profile').set('X-CSRF-Token', csrf).send({ classesRaced: ['monster-truck'] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.details)).toEqual(['classesRaced.0']);
  });

  it('changes the e-mail address only once the new address is confirmed', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await signIn(t.app, r.handle, r.password);
    const next = `moved.${r.email}`;
    await agent.post('/api/me/email').set('X-CSRF-Token', csrf).send({ email: next, password: r.password }).expect(202);
    let me = (await agent.get('/api/me')).body.user;
    expect(me).toMatchObject({ email: r.email, pendingEmail: next });
    const token = tokenFromLink((await waitForMail(t.db, next, /confirm/i)).textBody, '/verify-email');
    await agent.post('/api/auth/verify-email').set('X-CSRF-Token', csrf).send({ token }).expect(200);
    me = (await agent.get('/api/me')).body.user;
    expect(me).toMatchObject({ email: next, pendingEmail: null, emailVerified: true });
  });

  it('asks for the current password before an e-mail change', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await signIn(t.app, r.handle, r.password);
    const res = await agent.post('/api/me/email').set('X-CSRF-Token', csrf).send({ email: `x.${r.email}`, password: 'wrong-password-here' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.password).toMatch(/not right/);
  });

  it('changes the password and signs out the other sessions but keeps this one', async () => {
    const r = await createRacer(t.db);
    const here = await signIn(t.app, r.handle, r.password);
    const there = await signIn(t.app, r.handle, r.password);
    await here.agent
      .post('/api/me/password')
      .set('X-CSRF-Token', here.csrf)
      .send({ currentPassword: r.password, newPassword: 'thicker-diff-oil-front' })
      .expect(200);
    expect((await here.agent.get('/api/me')).body.user?.id).toBe(r.user.id);
    expect((await there.agent.get('/api/me')).body.user).toBeNull();
  });

  it('signs out everywhere, this session included', async () => {
    const r = await createRacer(t.db);
    const here = await signIn(t.app, r.handle, r.password);
    const there = await signIn(t.app, r.handle, r.password);
    await here.agent.post('/api/me/sign-out-everywhere').set('X-CSRF-Token', here.csrf).expect(204);
    expect((await here.agent.get('/api/me')).body.user).toBeNull();
    expect((await there.agent.get('/api/me')).body.user).toBeNull();
  });
});

describe('markdown preview', () => {
  it('renders exactly what the server will store: safe tags only, links marked', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await signIn(t.app, r.handle, r.password);
    const res = await agent.post('/api/markdown/preview').set('X-CSRF-Token', csrf).send({ markdown: '**450** [why](https://notes.example) <script>x()</script>' }).expect(200);
    expect(res.body.html.trim()).toBe('<p><strong>450</strong> <a href="https://notes.example" rel="nofollow ugc noopener">why</a> </p>');
    const tooLong = await agent.post('/api/markdown/preview').set('X-CSRF-Token', csrf).send({ markdown: 'x'.repeat(20_001) });
    expect(tooLong.status).toBe(400);
  });
});
