import request from 'supertest';
import { apiErrorBodySchema } from '../../shared/types/errors';
import { buildTestApp, type TestApp } from '../support/testApp';

describe('API error shape', () => {
  let t: TestApp;
  beforeAll(() => {
    t = buildTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  it('answers an unknown /api route with a JSON 404', async () => {
    const res = await request(t.app).get('/api/no-such-thing?x=1');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(apiErrorBodySchema.parse(res.body).error).toEqual({
      code: 'not_found',
      message: 'No API route matches GET /api/no-such-thing.',
    });
  });

  it('answers malformed JSON with 400 malformed_json', async () => {
    const res = await request(t.app).post('/api/health').set('Content-Type', 'application/json').send('{"oops": ');
    expect(res.status).toBe(400);
    expect(apiErrorBodySchema.parse(res.body).error.code).toBe('malformed_json');
  });

  it('refuses a JSON body over the size limit with 413', async () => {
    const small = buildTestApp({ jsonBodyLimit: '1kb' });
    try {
      const res = await request(small.app)
        .post('/api/health')
        .set('Content-Type', 'application/json')
        .send(JSON.stringify({ note: 'x'.repeat(4096) }));
      expect(res.status).toBe(413);
      expect(apiErrorBodySchema.parse(res.body).error.code).toBe('payload_too_large');
    } finally {
      await small.close();
    }
  });

  it('answers an unexpected failure with a generic 500 and keeps the detail in the log only', async () => {
    const broken = buildTestApp();
    await broken.db.close(); // every query now throws a connection error nobody planned for
    const res = await request(broken.app).get('/api/kits');
    expect(res.status).toBe(500);
    const body = apiErrorBodySchema.parse(res.body);
    expect(body.error.code).toBe('internal_error');
    expect(JSON.stringify(body)).not.toMatch(/closed|sequelize|stack|at /i);
    expect(broken.logLines.join('\n')).toMatch(/unhandled error/);
  });

  it('sends the security headers and the content security policy', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("script-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('API rate limit', () => {
  it('answers past the limit with 429 and a JSON body saying when to retry', async () => {
    const t = buildTestApp({ apiRateLimit: { max: 3, windowMs: 60_000 } });
    try {
      for (let i = 0; i < 3; i++) expect((await request(t.app).get('/api/kits')).status).toBe(200);
      const res = await request(t.app).get('/api/kits');
      expect(res.status).toBe(429);
      const body = apiErrorBodySchema.parse(res.body);
      expect(body.error.code).toBe('rate_limited');
      expect(body.error.details?.retryAfterSeconds).toBeGreaterThan(0);
      expect(body.error.message).toMatch(/try again in \d+ s/i);
    } finally {
      await t.close();
    }
  });
});
