import http from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { FAKE_GITHUB_PRESETS } from '../../server/auth/fakeGithub';
import { createRacer, signIn } from '../support/accounts';
import { buildTestApp, type TestApp } from '../support/testApp';

/**
 * The whole OAuth dance over real HTTP on loopback: the strategy's token and profile requests go
 * from the server to the fake provider through the network stack, as they would to the real one.
 */
let t: TestApp;
let server: http.Server;
let base: string;

beforeAll(async () => {
  server = http.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  t = buildTestApp({ publicUrl: base });
  server.on('request', t.app);
});
afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await t.close();
});

type Agent = ReturnType<typeof request.agent>;

/** Follows the dance: start → consent page → consent form → callback. Returns where it lands. */
async function dance(agent: Agent, startPath: string, consent: Record<string, string>): Promise<string> {
  const start = await agent.get(startPath).expect(302);
  const authorize = new URL(start.headers.location);
  expect(authorize.pathname).toBe('/fake-github/login/oauth/authorize');
  expect(authorize.searchParams.get('state')).toBeTruthy();
  const page = await agent.get(authorize.pathname + authorize.search).expect(200);
  expect(page.text).toContain('Authorize Tunefork');
  const form = await agent
    .post('/fake-github/login/oauth/authorize')
    .type('form')
    .send({
      client_id: authorize.searchParams.get('client_id')!,
      redirect_uri: authorize.searchParams.get('redirect_uri')!,
      state: authorize.searchParams.get('state')!,
      ...consent,
    })
    .expect(303);
  const callback = new URL(form.headers.location);
  expect(callback.pathname).toBe('/api/auth/github/callback');
  const landed = await agent.get(callback.pathname + callback.search).expect(303);
  return landed.headers.location as string;
}

describe('Continue with GitHub through the local fake provider', () => {
  it('creates an account from a new provider login and signs it in', async () => {
    const agent = request.agent(base);
    const landed = await dance(agent, '/api/auth/github?next=/garage', { preset: '0', decision: 'allow' });
    expect(landed).toBe('/garage');
    const me = (await agent.get('/api/me').expect(200)).body.user;
    expect(me).toMatchObject({ handle: FAKE_GITHUB_PRESETS[0].login, githubLogin: FAKE_GITHUB_PRESETS[0].login, emailVerified: true, hasPassword: false });
  });

  it('signs the same provider account into the same Tunefork account next time', async () => {
    const agent = request.agent(base);
    await dance(agent, '/api/auth/github', { preset: '0', decision: 'allow' });
    const first = (await agent.get('/api/me')).body.user.id;
    const again = request.agent(base);
    await dance(again, '/api/auth/github', { preset: '0', decision: 'allow' });
    expect((await again.get('/api/me')).body.user.id).toBe(first);
  });

  it('links to an existing account with the same verified address', async () => {
    const r = await createRacer(t.db);
    const agent = request.agent(base);
    await dance(agent, '/api/auth/github', { preset: 'custom', login: 'pit-crew-77', name: 'Pit Crew', email: r.email, verified: 'yes', decision: 'allow' });
    const me = (await agent.get('/api/me')).body.user;
    expect(me.id).toBe(r.user.id);
    expect(me.githubLogin).toBe('pit-crew-77');
  });

  it('does not link on an unverified address: it makes a new account with a unique handle instead', async () => {
    const r = await createRacer(t.db);
    const agent = request.agent(base);
    await dance(agent, '/api/auth/github', { preset: 'custom', login: r.handle, name: 'Someone', email: r.email, decision: 'allow' });
    const me = (await agent.get('/api/me')).body.user;
    expect(me.id).not.toBe(r.user.id);
    expect(me.handle).toMatch(/-2$/);
    expect(me.handle.toLowerCase()).not.toBe(r.handle.toLowerCase());
    expect(me.email).toBeNull();
  });

  it('comes back to sign-in with a message when the racer cancels', async () => {
    const agent = request.agent(base);
    const landed = await dance(agent, '/api/auth/github', { preset: '0', decision: 'deny' });
    expect(landed).toMatch(/^\/sign-in\?error=/);
    expect((await agent.get('/api/me')).body.user).toBeNull();
  });

  it('never redirects to another site after sign-in', async () => {
    const agent = request.agent(base);
    expect(await dance(agent, '/api/auth/github?next=//elsewhere.example/x', { preset: '0', decision: 'allow' })).toBe('/');
  });

  it('refuses a callback whose state does not match the session', async () => {
    const agent = request.agent(base);
    await agent.get('/api/auth/github').expect(302);
    const res = await agent.get('/api/auth/github/callback?code=made-up&state=forged').expect(303);
    expect(res.headers.location).toMatch(/^\/sign-in\?error=/);
    expect((await agent.get('/api/me')).body.user).toBeNull();
  });

  it('lets a signed-in racer link GitHub from settings, and unlink it while a password remains', async () => {
    const r = await createRacer(t.db);
    const { agent } = await signIn(base, r.handle, r.password);
    expect(await dance(agent, '/api/auth/github/link', { preset: 'custom', login: 'linker-9', name: 'Linker', email: '', decision: 'allow' })).toBe('/settings?linked=github');
    expect((await agent.get('/api/me')).body.user).toMatchObject({ id: r.user.id, githubLogin: 'linker-9' });
    // Linking renews the session (and so its CSRF token), as any sign-in does.
    const csrf = (await agent.get('/api/auth/csrf')).body.csrfToken;
    const unlinked = await agent.delete('/api/me/github').set('X-CSRF-Token', csrf).expect(200);
    expect(unlinked.body.user.githubLogin).toBeNull();
  });

  it('refuses to unlink GitHub when it is the only way to sign in', async () => {
    const agent = request.agent(base);
    await dance(agent, '/api/auth/github', { preset: 'custom', login: 'only-github-1', name: 'Only', email: '', decision: 'allow' });
    const csrf = (await agent.get('/api/auth/csrf')).body.csrfToken;
    const res = await agent.delete('/api/me/github').set('X-CSRF-Token', csrf);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('last_sign_in_method');
  });
});
