import { auditPageSchema, type AuditEntry } from '../../shared/types/moderation';
import { AUDIT_PAGE_SIZE } from '../../server/services/moderation/auditLog';
import { recordAudit } from '../../server/services/moderation/audit';
import { type SessionAgent, signedInRacer, type SignedInRacer } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { act, sql } from '../support/moderationQueue';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

/*
 * The audit log: every moderation and role action appends a row; the database refuses to change
 * or remove rows (a trigger on UPDATE, DELETE and TRUNCATE); moderators read it newest first.
 */

let t: TestApp;
type Session = SignedInRacer;
let mod: Session;
let admin: Session;
let racer: Session;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  [mod, admin, racer] = await Promise.all([signedInRacer(t, { role: 'moderator', prefix: 'auditmod' }), signedInRacer(t, { role: 'admin', prefix: 'auditadmin' }), signedInRacer(t, { role: 'racer', prefix: 'auditracer' })]);
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(60_000);

const page = async (s: SessionAgent, query: Record<string, string> = {}) => auditPageSchema.parse((await s.agent.get('/api/moderation/audit').query(query).expect(200)).body);

describe('the audit log is append-only in the database', () => {
  it('refuses UPDATE, DELETE and TRUNCATE, leaving the rows as they were', async () => {
    const id = await recordAudit(t.db, { actor: null, action: 'auto-hide', targetType: 'setup', targetId: 1, reason: 'kept for ever' });
    const rowsBefore = await sql(t.db, 'SELECT * FROM audit_log ORDER BY id');
    await expect(t.db.sequelize.query('UPDATE audit_log SET reason = :r WHERE id = :id', { replacements: { r: 'changed', id } })).rejects.toThrow(/append-only \(UPDATE refused\)/);
    await expect(t.db.sequelize.query('DELETE FROM audit_log WHERE id = :id', { replacements: { id } })).rejects.toThrow(/append-only \(DELETE refused\)/);
    await expect(t.db.sequelize.query('TRUNCATE audit_log')).rejects.toThrow(/append-only \(TRUNCATE refused\)/);
    await expect(t.db.pool.query('DELETE FROM audit_log')).rejects.toThrow(/append-only/);
    expect(await sql(t.db, 'SELECT * FROM audit_log ORDER BY id')).toEqual(rowsBefore);
  });
});

describe('what is recorded', () => {
  it('records every queue action with who, what, the target, the reason and the state before and after', async () => {
    const { setup } = await carWithStockSetup(racer, stoat8n, { visibility: 'public', title: 'Audited sheet' });
    const steps = [
      { action: 'warn', reason: 'First warning.' },
      { action: 'hide', reason: 'Advert.' },
      { action: 'restore', reason: 'Not an advert.' },
    ] as const;
    for (const step of steps) await act(mod, { targetType: 'setup', targetId: setup.id, ...step }).expect(200);
    const { entries } = await page(mod, { targetType: 'setup' });
    const mine = entries.filter((e) => e.targetId === setup.id);
    expect(mine.map((e) => [e.action, e.reason])).toEqual([
      ['restore', 'Not an advert.'],
      ['hide', 'Advert.'],
      ['warn', 'First warning.'],
    ]);
    expect(mine[0]).toMatchObject({ actorHandle: mod.handle, actorRole: 'moderator', subjectHandle: racer.handle, previousState: { hidden: true }, newState: { hidden: false } });
  });

  it('records admins’ role changes, suspensions and lifting them', async () => {
    const target = await signedInRacer(t, { role: 'racer', prefix: 'promoted' });
    await admin.agent.patch(`/api/admin/users/${target.id}/role`).set('X-CSRF-Token', admin.csrf).send({ role: 'moderator' }).expect(200);
    const until = new Date(Date.now() + 3 * 86_400_000).toISOString();
    await admin.agent.post(`/api/admin/users/${target.id}/suspend`).set('X-CSRF-Token', admin.csrf).send({ until, reason: 'Cooling off.' }).expect(200);
    await admin.agent.post(`/api/admin/users/${target.id}/unsuspend`).set('X-CSRF-Token', admin.csrf).expect(200);
    const rows = (await page(admin, { actor: `@${admin.handle.toUpperCase()}` })).entries.filter((e) => e.targetId === target.id);
    expect(rows.map((e) => e.action)).toEqual(['admin-unsuspend', 'admin-suspend', 'role-change']);
    expect(rows[2]).toMatchObject({ targetType: 'racer', subjectHandle: target.handle, previousState: { role: 'racer' }, newState: { role: 'moderator' } });
    expect(rows[1]).toMatchObject({ reason: 'Cooling off.', previousState: { suspendedUntil: null }, newState: { suspendedUntil: until, suspendedIndefinitely: false } });
    expect(rows[0]).toMatchObject({ previousState: { suspendedUntil: until }, newState: { suspendedUntil: null, suspensionReason: null } });
    // The admin's suspension is a moderation action too, so the racer could appeal it.
    const actions = await sql<{ action: string; actor_id: number }>(t.db, 'SELECT action, actor_id FROM moderation_actions WHERE subject_user_id = :id ORDER BY id', { id: target.id });
    expect(actions).toEqual([
      { action: 'suspend', actor_id: admin.id },
      { action: 'unsuspend', actor_id: admin.id },
    ]);
  });
});

describe('reading the audit log', () => {
  it('pages newest first with a cursor and filters by actor, action and target type', async () => {
    for (let i = 0; i < AUDIT_PAGE_SIZE + 5; i += 1) {
      await recordAudit(t.db, { actor: { id: mod.id, handle: mod.handle, role: 'moderator' }, action: 'dismiss', targetType: 'comment', targetId: i + 1, reason: `Batch ${i}` });
    }
    const first = await page(mod, { action: 'dismiss', targetType: 'comment' });
    expect(first.entries).toHaveLength(AUDIT_PAGE_SIZE);
    expect(first.entries[0].reason).toBe(`Batch ${AUDIT_PAGE_SIZE + 4}`);
    expect(first.nextCursor).not.toBeNull();
    const second = await page(mod, { action: 'dismiss', targetType: 'comment', cursor: first.nextCursor! });
    expect(second.entries.map((e) => e.reason)).toEqual([4, 3, 2, 1, 0].map((i) => `Batch ${i}`));
    expect(second.nextCursor).toBeNull();
    const idsDescending = (list: AuditEntry[]) => list.every((e, i) => i === 0 || list[i - 1].id > e.id);
    expect(idsDescending([...first.entries, ...second.entries])).toBe(true);

    expect((await page(mod, { actor: 'nobody-by-this-name' })).entries).toEqual([]);
    const racerRows = (await page(mod, { targetType: 'racer' })).entries;
    expect(racerRows.length).toBeGreaterThan(0);
    expect(new Set(racerRows.map((e) => e.targetType))).toEqual(new Set(['racer']));
    expect((await page(mod, { action: 'dismiss', targetType: 'setup' })).entries).toEqual([]);
    const damaged = await mod.agent.get('/api/moderation/audit').query({ cursor: 'not-a-cursor' }).expect(400);
    expect(damaged.body.error.details).toHaveProperty('cursor');
    await racer.agent.get('/api/moderation/audit').expect(403);
  });
});
