import { execFileSync } from 'node:child_process';
import request from 'supertest';
import { healthSchema } from '../../shared/types/health';
import { apiErrorBodySchema } from '../../shared/types/errors';
import { buildTestApp, type TestApp } from '../support/testApp';

// A cluster of its own (scripts/test.sh): stopping it must not pull the database from under the
// tests that run beside this one.
const pgData = process.env.TUNEFORK_TEST_PGDATA;
const pgPort = process.env.TUNEFORK_TEST_PGPORT;
const databaseUrl = process.env.TUNEFORK_HEALTH_DATABASE_URL;

function pg(command: 'start' | 'stop'): void {
  if (!pgData || !pgPort) throw new Error('run through npm test: TUNEFORK_TEST_PGDATA/PGPORT are not set');
  execFileSync('bash', ['scripts/pg.sh', command, pgData, ...(command === 'start' ? [pgPort] : [])], {
    stdio: 'pipe',
  });
}

async function waitForHealthy(t: TestApp): Promise<request.Response> {
  let last: request.Response | undefined;
  for (let attempt = 0; attempt < 40; attempt++) {
    last = await request(t.app).get('/api/health');
    if (last.status === 200) return last;
    await new Promise((r) => setTimeout(r, 250));
  }
  return last!;
}

describe('GET /api/health', () => {
  let t: TestApp;
  beforeAll(() => {
    if (!databaseUrl) throw new Error('run through npm test: TUNEFORK_HEALTH_DATABASE_URL is not set');
    t = buildTestApp({ databaseUrl });
  });
  afterAll(async () => {
    await t.close();
  });

  it('answers ok with the database reachable', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-store');
    const body = healthSchema.parse(res.body);
    expect(body).toMatchObject({ status: 'ok', database: 'ok', devTools: true });
  });

  it('answers 503 with a clear body while the database is stopped, and ok again once it is back', async () => {
    pg('stop');
    try {
      const down = await request(t.app).get('/api/health');
      expect(down.status).toBe(503);
      const body = apiErrorBodySchema.parse(down.body);
      expect(body.error.code).toBe('database_unavailable');
      expect(body.error.message).toMatch(/database is not reachable/i);
    } finally {
      pg('start');
    }
    const up = await waitForHealthy(t);
    expect(up.status).toBe(200);
  }, 60_000);
});
