import { QueryTypes } from 'sequelize';
import { AUTO_HIDE_REPORTER_MIN_AGE_DAYS } from '../../shared/types/moderation';
import { seedDemoWorld } from '../../server/seeders';
import { DEMO_REPORTS, DEMO_SPAMMER, SPAM_COMMENTS, SPAM_SETUPS } from '../../server/seeders/demoModeration';
import { signIn } from '../support/accounts';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/*
 * The demo spam account and its reports: seeded once however often the seeder runs, with a real
 * queue for the demo moderator and one setup hidden by the automatic hide through the same code.
 */

let t: TestApp;
const count = async (sql: string, replacements: Record<string, unknown> = {}) =>
  (await t.db.sequelize.query<{ n: number }>(sql, { type: QueryTypes.SELECT, replacements }))[0].n;

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  await seedDemoWorld(t.db, { bcryptCost: 4 });
  await seedDemoWorld(t.db, { bcryptCost: 4 });
}, 60_000);
afterAll(async () => {
  await t.close();
});

it('seeds the spam account and its posts once, however often it runs', async () => {
  const spammer = await t.db.models.User.findAll({ where: { handle: DEMO_SPAMMER.handle } });
  expect(spammer).toHaveLength(1);
  const id = spammer[0].id;
  expect(await count('SELECT count(*)::int AS n FROM setups WHERE owner_id = :id', { id })).toBe(SPAM_SETUPS.length);
  expect(await count("SELECT count(*)::int AS n FROM setups WHERE owner_id = :id AND visibility = 'public'", { id })).toBe(SPAM_SETUPS.length);
  expect(await count('SELECT count(*)::int AS n FROM comments WHERE author_id = :id', { id })).toBe(SPAM_COMMENTS.length);
  expect(await count('SELECT count(*)::int AS n FROM reports')).toBe(DEMO_REPORTS.length);
  expect(await count("SELECT count(*)::int AS n FROM audit_log WHERE action = 'report-filed'")).toBe(DEMO_REPORTS.length);
  // The spam account can sign in (to try appeals with it locally).
  await signIn(t.app, DEMO_SPAMMER.handle, DEMO_SPAMMER.password);
});

it('gives the demo moderator open reports of several kinds and reasons, all on the spam account', async () => {
  const rows = await t.db.sequelize.query<{ target_type: string; reason: string; handle: string }>(
    "SELECT r.target_type, r.reason, u.handle FROM reports r JOIN users u ON u.id = r.target_owner_id WHERE r.status = 'open'",
    { type: QueryTypes.SELECT },
  );
  expect(rows).toHaveLength(DEMO_REPORTS.length);
  expect(new Set(rows.map((r) => r.handle))).toEqual(new Set([DEMO_SPAMMER.handle]));
  expect(new Set(rows.map((r) => r.target_type))).toEqual(new Set(['setup', 'revision', 'comment', 'racer']));
  expect(new Set(rows.map((r) => r.reason))).toEqual(new Set(['spam', 'other', 'stolen', 'unsafe', 'abusive']));
});

it('hides the setup three trusted demo racers reported, once, and tells the spam account', async () => {
  const hidden = await t.db.sequelize.query<{ title: string; auto: boolean }>(
    `SELECT s.title, h.auto FROM content_hides h JOIN setups s ON s.id = h.target_id AND h.target_type = 'setup'`,
    { type: QueryTypes.SELECT },
  );
  expect(hidden).toEqual([{ title: SPAM_SETUPS[0].title, auto: true }]);
  expect(await count("SELECT count(*)::int AS n FROM moderation_actions WHERE action = 'auto-hide'")).toBe(1);
  expect(await count("SELECT count(*)::int AS n FROM setups WHERE hidden_at IS NOT NULL")).toBe(1);
  expect(
    await count(
      "SELECT count(*)::int AS n FROM notifications n JOIN users u ON u.id = n.user_id WHERE u.handle = :handle AND n.type = 'moderation-notice'",
      { handle: DEMO_SPAMMER.handle },
    ),
  ).toBe(1);
  // The reporters who tipped it count: verified and older than a week; the newcomer does not.
  const ages = await t.db.sequelize.query<{ handle: string; days: number; verified: boolean }>(
    `SELECT handle, extract(day FROM now() - created_at)::int AS days, email_verified_at IS NOT NULL AS verified
       FROM users WHERE handle IN ('juno_braithwick', 'pell-strand', 'tamsin_q', 'rafi_new') ORDER BY handle`,
    { type: QueryTypes.SELECT },
  );
  for (const a of ages) {
    expect(a.verified).toBe(true);
    if (a.handle === 'rafi_new') expect(a.days).toBeLessThan(AUTO_HIDE_REPORTER_MIN_AGE_DAYS);
    else expect(a.days).toBeGreaterThan(AUTO_HIDE_REPORTER_MIN_AGE_DAYS);
  }
});
