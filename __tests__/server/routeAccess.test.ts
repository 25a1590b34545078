import type { Express } from 'express';
import request from 'supertest';
import type { Access, RouteSpec, RouteTable } from '../../server/middleware/access';
import { createRacer, csrfAgent, signIn, type SessionAgent } from '../support/accounts';
import { buildTestApp, type TestApp } from '../support/testApp';

/**
 * Who may call every /api route. A route missing here, or listed here but not registered, fails
 * the test: adding a route means deciding its access in this table.
 */
const EXPECTED: Record<string, Access> = {
  'GET /api/health': 'public',
  'GET /api/auth/csrf': 'public',
  'POST /api/auth/sign-up': 'public',
  'POST /api/auth/sign-in': 'public',
  'POST /api/auth/sign-out': 'public',
  'POST /api/auth/verify-email': 'public',
  'POST /api/auth/resend-verification': 'public',
  'POST /api/auth/forgot-password': 'public',
  'POST /api/auth/reset-password': 'public',
  'GET /api/auth/github': 'public',
  'GET /api/auth/github/link': 'signedIn',
  'GET /api/auth/github/callback': 'public',
  'GET /api/me': 'public',
  'PATCH /api/me/profile': 'signedIn',
  'POST /api/me/email': 'signedIn',
  'POST /api/me/password': 'signedIn',
  'POST /api/me/sign-out-everywhere': 'signedIn',
  'DELETE /api/me/github': 'signedIn',
  'GET /api/racers/:handle': 'public',
  'GET /api/admin/users': 'admin',
  'PATCH /api/admin/users/:id/role': 'admin',
  'POST /api/admin/users/:id/suspend': 'admin',
  'POST /api/admin/users/:id/unsuspend': 'admin',
  'POST /api/admin/kits': 'admin',
  'PUT /api/admin/kits/:id/stock': 'admin',
  'GET /api/dev/mailbox': 'public',
  'GET /api/kits': 'public',
  'GET /api/kits/:id/stock': 'public',
  'GET /api/tracks': 'public',
  'GET /api/garage': 'signedIn',
  'POST /api/cars': 'signedIn',
  'PATCH /api/cars/:id': 'signedIn',
  'DELETE /api/cars/:id': 'signedIn',
  'POST /api/setups': 'signedIn',
  'POST /api/setups/import': 'signedIn',
  'GET /api/setups/:id': 'public',
  'PATCH /api/setups/:id': 'signedIn',
  'DELETE /api/setups/:id': 'signedIn',
  'POST /api/setups/:id/revisions': 'signedIn',
  'GET /api/setups/:id/export.json': 'public',
  'GET /api/setups/:id/export.csv': 'public',
  'POST /api/setups/:id/photos': 'signedIn',
  'DELETE /api/setups/:id/photos/:photoId': 'signedIn',
  'GET /api/photos/:key': 'public',
  'POST /api/setups/:id/forks': 'signedIn',
  'GET /api/setups/:id/family': 'public',
  'GET /api/setups/:id/fork-preview': 'signedIn',
  'GET /api/kits/:id/setups': 'public',
  'GET /api/setups/:id/upstream': 'signedIn',
  'POST /api/setups/:id/upstream': 'signedIn',
  'GET /api/setups/:id/history': 'public',
  'GET /api/setups/:id/revisions/:number': 'public',
  'GET /api/setups/:id/comments': 'public',
  'POST /api/setups/:id/comments': 'signedIn',
  'PATCH /api/comments/:id': 'signedIn',
  'DELETE /api/comments/:id': 'signedIn',
  // Follows, feed and notifications
  'GET /api/racers/:handle/follow': 'public',
  'POST /api/racers/:handle/follow': 'signedIn',
  'DELETE /api/racers/:handle/follow': 'signedIn',
  'GET /api/racers/:handle/followers': 'public',
  'GET /api/racers/:handle/following': 'public',
  'GET /api/feed': 'signedIn',
  'GET /api/feed/suggestions': 'signedIn',
  'GET /api/notifications': 'signedIn',
  'GET /api/notifications/unread-count': 'signedIn',
  'POST /api/notifications/read-all': 'signedIn',
  'POST /api/notifications/:id/read': 'signedIn',
  // Votes, discover and search
  'GET /api/setups/:id/votes': 'public',
  'PUT /api/setups/:id/votes/:trackType': 'signedIn',
  'DELETE /api/setups/:id/votes/:trackType': 'signedIn',
  'GET /api/discover': 'public',
  'GET /api/search': 'public',
  // E-mail preferences and unsubscribe
  'GET /api/me/email-preferences': 'signedIn',
  'PUT /api/me/email-preferences': 'signedIn',
  'GET /api/unsubscribe': 'public',
  'POST /api/unsubscribe': 'public',
  // Track days
  'POST /api/tracks': 'signedIn',
  'GET /api/track-days': 'signedIn',
  'POST /api/track-days': 'signedIn',
  'GET /api/track-days/:id': 'signedIn',
  'PATCH /api/track-days/:id': 'signedIn',
  'DELETE /api/track-days/:id': 'signedIn',
  'POST /api/track-days/:id/runs': 'signedIn',
  'PATCH /api/runs/:id': 'signedIn',
  'DELETE /api/runs/:id': 'signedIn',
  'GET /api/runs/compare': 'signedIn',
  'POST /api/markdown/preview': 'signedIn',
  // Moderation: the review queue, actions, appeals and the audit log
  'GET /api/moderation/queue': 'moderator',
  'POST /api/moderation/actions': 'moderator',
  'GET /api/moderation/audit': 'moderator',
  'GET /api/moderation/mine': 'signedIn',
  'POST /api/moderation/appeals/:id/decide': 'moderator',
  'POST /api/appeals': 'signedIn',
  'POST /api/appeals/suspension': 'public',
  // Reports and limits
  'POST /api/reports': 'signedIn',
  'GET /api/reports/mine': 'signedIn',
  'GET /api/me/limits': 'signedIn',
};

type Layer = { route?: { methods: Record<string, boolean> }; handle?: { stack?: Layer[] } };

/** Counts every (method, route) Express itself has registered, however it was added. */
function countExpressRoutes(stack: Layer[]): number {
  let n = 0;
  for (const layer of stack) {
    if (layer.route) n += Object.keys(layer.route.methods).filter((m) => m !== '_all').length;
    else if (layer.handle?.stack) n += countExpressRoutes(layer.handle.stack);
  }
  return n;
}

const ROLES = ['anonymous', 'racer', 'moderator', 'admin'] as const;
type Caller = (typeof ROLES)[number];

function allowed(access: Access, who: Caller): boolean {
  const rank = { anonymous: -1, racer: 0, moderator: 1, admin: 2 }[who];
  return { public: true, signedIn: rank >= 0, moderator: rank >= 1, admin: rank >= 2 }[access];
}

let t: TestApp;
let accounts: Record<Exclude<Caller, 'anonymous'>, { handle: string; password: string }>;

beforeAll(async () => {
  t = buildTestApp();
  const [racer, moderator, admin] = await Promise.all([
    createRacer(t.db, { role: 'racer' }),
    createRacer(t.db, { role: 'moderator' }),
    createRacer(t.db, { role: 'admin' }),
  ]);
  accounts = { racer, moderator, admin };
});

/** A fresh session per call: some routes (sign-out, sign-out-everywhere) end the caller's session. */
function caller(role: Caller): Promise<SessionAgent> {
  return role === 'anonymous' ? csrfAgent(t.app) : signIn(t.app, accounts[role].handle, accounts[role].password);
}
afterAll(async () => {
  await t.close();
});

function routeTable(app: Express): RouteSpec[] {
  return (app.locals.routeTable as RouteTable).routes;
}

describe('route × role access', () => {
  it('has an access rule in this table for exactly the registered routes', () => {
    const registered = Object.fromEntries(routeTable(t.app).map((r) => [`${r.method} ${r.path}`, r.access]));
    expect(registered).toEqual(EXPECTED);
  });

  it('registers no route outside the declared table (Express sees the same number of routes, bar the fake provider)', () => {
    const stack = (t.app as unknown as { router: { stack: Layer[] } }).router.stack;
    // Outside /api: the fake provider's five endpoints and the web app's deep-link fallback.
    const nonApiRoutes = 5 + 1;
    expect(countExpressRoutes(stack)).toBe(routeTable(t.app).length + nonApiRoutes);
  });

  const cases = Object.entries(EXPECTED).flatMap(([key, access]) => ROLES.map((who) => ({ key, access, who })));
  it.each(cases)('$key as $who: allowed = access "$access"', async ({ key, access, who }) => {
    const [method, path] = key.split(' ');
    const url = path.replace(':handle', 'no-such-racer').replace(':id', '999999');
    const { agent, csrf } = await caller(who);
    const res = await agent[method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete'](url).set('X-CSRF-Token', csrf).send({});
    if (allowed(access, who)) {
      expect([401, 403]).not.toContain(res.status);
    } else {
      expect(res.status).toBe(who === 'anonymous' ? 401 : 403);
      expect(res.body.error.code).toBe(who === 'anonymous' ? 'unauthenticated' : 'forbidden');
    }
  });
});

describe('access responses', () => {
  it('tells an anonymous caller to sign in, and a racer that the action is for admins', async () => {
    const anon = await request(t.app).get('/api/admin/users');
    expect(anon.status).toBe(401);
    expect(anon.body.error.message).toBe('Sign in to do that.');
    const racer = await (await caller('racer')).agent.get('/api/admin/users');
    expect(racer.body.error.message).toBe('Only admins can do that.');
  });
});
