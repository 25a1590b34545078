import { ConfigError, loadConfig } from '../../server/config';

const base = { DATABASE_URL: 'postgres://tunefork@127.0.0.1:5999/x' };

describe('loadConfig', () => {
  it('fills embedded defaults', () => {
    const c = loadConfig(base);
    expect(c).toMatchObject({ port: 8080, host: '127.0.0.1', nodeEnv: 'development', jsonBodyLimit: '100kb' });
  });

  it('names the variable that is wrong', () => {
    expect(() => loadConfig({ ...base, PORT: 'eighty' })).toThrow(ConfigError);
    expect(() => loadConfig({ ...base, PORT: 'eighty' })).toThrow(/PORT/);
    expect(() => loadConfig({ DATABASE_URL: 'mysql://nope' })).toThrow(/DATABASE_URL/);
    expect(() => loadConfig({})).toThrow(/DATABASE_URL/);
  });

  it('keeps logs quiet in tests unless asked', () => {
    expect(loadConfig({ ...base, NODE_ENV: 'test' }).logLevel).toBe('silent');
    expect(loadConfig({ ...base, NODE_ENV: 'test', LOG_LEVEL: 'debug' }).logLevel).toBe('debug');
  });
});
