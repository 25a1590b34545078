import request from 'supertest';
import type { Express } from 'express';
import type { Role } from '../../shared/types/auth';
import type { Database } from '../../server/db/database';
import type { MailboxMessage } from '../../server/models/MailboxMessage';
import { hashPassword } from '../../server/services/passwords';

export type Agent = ReturnType<typeof request.agent>;
export type SessionAgent = { agent: Agent; csrf: string; /** The session cookie, name=value, when the last response set one. */ cookie?: string };

/** A cookie-keeping client with a CSRF token for its (new) session. */
export async function csrfAgent(app: Express | string): Promise<SessionAgent> {
  const agent = request.agent(app);
  const res = await agent.get('/api/auth/csrf').expect(200);
  return { agent, csrf: res.body.csrfToken as string, cookie: sessionCookie(res.headers['set-cookie']) };
}

function sessionCookie(header: unknown): string | undefined {
  return /tunefork\.sid=[^;]+/.exec(String(header ?? ''))?.[0];
}

let counter = 0;
/** A unique, valid handle and address for one test. */
export function uniqueRacer(prefix = 'racer') {
  counter += 1;
  const stamp = `${Date.now().toString(36)}${counter}`;
  return { handle: `${prefix}-${stamp}`.slice(0, 30), email: `${prefix}.${stamp}@racers.example`, displayName: `Test ${prefix} ${counter}` };
}

export const GOOD_PASSWORD = 'rear-toe-three-degrees';

/**
 * Creates a racer directly in the database (verified unless told otherwise). The account is
 * `ageDays` old (30 unless told otherwise), so the new-account limits stay out of tests not about them.
 */
export async function createRacer(
  db: Database,
  opts: { role?: Role; password?: string | null; verified?: boolean; prefix?: string; ageDays?: number } = {},
) {
  const r = uniqueRacer(opts.prefix ?? opts.role ?? 'racer');
  const password = opts.password === undefined ? GOOD_PASSWORD : opts.password;
  const user = await db.models.User.create({
    ...r,
    role: opts.role ?? 'racer',
    passwordHash: password ? await hashPassword(password, 4) : null,
    emailVerifiedAt: opts.verified === false ? null : new Date(),
    createdAt: new Date(Date.now() - (opts.ageDays ?? 30) * 86_400_000),
  });
  return { user, password: password ?? '', ...r };
}

/** Signs in through the API and returns the agent with the new session's CSRF token. */
/** A racer made by createRacer, signed in; with their id, handle and password for the test. */
export type SignedInRacer = SessionAgent & { id: number; handle: string; password: string };

export async function signedInRacer(
  t: { db: Database; app: Express },
  opts: Parameters<typeof createRacer>[1] = {},
): Promise<SignedInRacer> {
  const r = await createRacer(t.db, opts);
  return { ...(await signIn(t.app, r.handle, r.password)), id: r.user.id, handle: r.handle, password: r.password };
}

export async function signIn(app: Express | string, login: string, password: string): Promise<SessionAgent> {
  const { agent, csrf } = await csrfAgent(app);
  const res = await agent.post('/api/auth/sign-in').set('X-CSRF-Token', csrf).send({ login, password });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, csrf: res.body.csrfToken as string, cookie: sessionCookie(res.headers['set-cookie']) };
}

/** Waits for the fake SMTP server to file a message to `to` whose subject matches. */
export async function waitForMail(db: Database, to: string, subject: RegExp, timeoutMs = 10_000): Promise<MailboxMessage> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const rows = await db.models.MailboxMessage.findAll({ order: [['id', 'DESC']] });
    const hit = rows.find((m) => m.toAddress.includes(to) && subject.test(m.subject));
    if (hit) return hit;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** The token from the first link in `text` whose path is `path`. */
export function tokenFromLink(text: string, path: string): string {
  const match = new RegExp(`${path.replace('/', '\\/')}\\?token=([A-Za-z0-9_-]+)`).exec(text);
  if (!match) throw new Error(`no ${path} link in: ${text}`);
  return match[1];
}
