import type { Options } from 'express-rate-limit';
import { Pool } from 'pg';
import { PostgresRateLimitStore, deleteExpiredRateLimits } from '../../server/middleware/rateLimit';
import { buildTestApp, resetDatabase, type TestApp } from '../support/testApp';

// Fixed-window counting, as express-rate-limit's own MemoryStore does: common practice, no source.

let t: TestApp;
let otherPool: Pool;
beforeAll(async () => {
  t = buildTestApp();
  await resetDatabase(t.db);
  // A second pool stands for a second app server.
  otherPool = new Pool({ connectionString: t.config.databaseUrl, max: 5 });
});
afterAll(async () => {
  await otherPool.end();
  await t.close();
});

function store(pool: Pool, windowMs: number, limit = 10, name?: string): PostgresRateLimitStore {
  const s = new PostgresRateLimitStore(pool, name);
  s.init({ windowMs, limit } as Options);
  return s;
}

describe('the PostgreSQL rate-limit store', () => {
  it('counts concurrent hits from two pools exactly: every count from 1 to n once', async () => {
    const one = store(t.db.pool, 60_000);
    const two = store(otherPool, 60_000);
    const results = await Promise.all(Array.from({ length: 60 }, (_, i) => (i % 2 ? one : two).increment('198.51.100.7')));
    expect(results.map((r) => r.totalHits).sort((x, y) => x - y)).toEqual(Array.from({ length: 60 }, (_, i) => i + 1));
    // One window for everyone: the reset time is the first hit's.
    expect(new Set(results.map((r) => r.resetTime!.getTime())).size).toBe(1);
    expect((await two.get('198.51.100.7'))?.totalHits).toBe(60);
  });

  it('starts again at 1 once the window has passed, and the clean-up job drops ended windows', async () => {
    const short = store(t.db.pool, 300);
    await short.increment('198.51.100.8');
    expect((await short.increment('198.51.100.8')).totalHits).toBe(2);
    await new Promise((r) => setTimeout(r, 400));
    expect(await short.get('198.51.100.8')).toBeUndefined();
    expect(await deleteExpiredRateLimits(t.db.pool)).toBeGreaterThanOrEqual(1);
    expect((await short.increment('198.51.100.8')).totalHits).toBe(1);
  });

  it('keeps limiters apart by their window and limit, or by name', async () => {
    const api = store(t.db.pool, 60_000, 600);
    const auth = store(t.db.pool, 900_000, 20);
    const named = store(t.db.pool, 60_000, 600, 'uploads');
    await api.increment('198.51.100.9');
    await api.increment('198.51.100.9');
    expect((await auth.increment('198.51.100.9')).totalHits).toBe(1);
    expect((await named.increment('198.51.100.9')).totalHits).toBe(1);
    await api.decrement('198.51.100.9');
    expect((await api.get('198.51.100.9'))?.totalHits).toBe(1);
    await api.resetKey('198.51.100.9');
    expect(await api.get('198.51.100.9')).toBeUndefined();
  });

  it('far below the limit counts hits in memory and writes them together; near it, every hit at once', async () => {
    const key = '198.51.100.10';
    const one = store(t.db.pool, 60_000, 100);
    const two = store(otherPool, 60_000, 100);
    const stored = async () =>
      (await t.db.pool.query<{ hits: number }>('SELECT hits FROM rate_limit_hits WHERE key = $1', [`60000/100:${key}`])).rows[0]?.hits ?? 0;
    // The first hit of a key is always written: the server has no view of the count yet.
    expect((await one.increment(key)).totalHits).toBe(1);
    expect(await stored()).toBe(1);
    // The next ones, well under half the limit, wait in memory…
    for (let i = 2; i <= 10; i++) expect((await one.increment(key)).totalHits).toBe(i);
    expect(await stored()).toBe(1);
    // …until the flush writes them in one statement.
    await one.flush();
    expect(await stored()).toBe(10);
    // A second server's first hit reads the shared total.
    expect((await two.increment(key)).totalHits).toBe(11);
    // Reading a count never misses this server's waiting hits.
    await one.increment(key);
    expect((await one.get(key))?.totalHits).toBe(12);
    // Other servers' hits reach this one's view within the sync interval (200 ms)…
    await t.db.pool.query('UPDATE rate_limit_hits SET hits = 60 WHERE key = $1', [`60000/100:${key}`]);
    await new Promise((r) => setTimeout(r, 250));
    // …and past half the limit every hit is written at once, from either server, so the refusal at
    // the limit is exact.
    expect((await two.increment(key)).totalHits).toBe(61);
    expect((await one.increment(key)).totalHits).toBe(62);
    expect(await stored()).toBe(62);
  });

  it('drops hits still waiting in memory when their window ends, so they never count against the next one', async () => {
    const key = '198.51.100.11';
    const short = store(t.db.pool, 300, 100);
    expect((await short.increment(key)).totalHits).toBe(1);
    expect((await short.increment(key)).totalHits).toBe(2); // waiting in memory
    await new Promise((r) => setTimeout(r, 400));
    expect((await short.increment(key)).totalHits).toBe(1);
    await short.flush();
    expect((await short.get(key))?.totalHits).toBe(1);
  });
});
