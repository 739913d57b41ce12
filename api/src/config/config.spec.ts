import { describe, expect, it } from 'vitest';
import { loadConfig } from './config.js';

const base = { DATABASE_URL: 'postgres://u:p@127.0.0.1:54329/x', JWT_SECRET: 'x'.repeat(32), SMTP_URL: 'smtp://127.0.0.1:1025' };

describe('loadConfig', () => {
  it('fills defaults: loopback host, port 3000, 15-minute access tokens', () => {
    const config = loadConfig(base);
    expect(config).toMatchObject({ host: '127.0.0.1', port: 3000, accessTokenTtlSeconds: 900, bodyLimit: '1mb' });
  });

  it.each([
    [{ DATABASE_URL: undefined }, 'DATABASE_URL is not set'],
    [{ DATABASE_URL: 'mysql://x' }, 'DATABASE_URL must be a postgres:// URL'],
    [{ JWT_SECRET: 'short' }, 'JWT_SECRET must be at least 32 characters long'],
    [{ PORT: 'eighty' }, 'PORT must be a whole number, got "eighty"'],
    [{ PORT: '70000' }, 'PORT must be between 0 and 65535, got 70000'],
    [{ BODY_LIMIT: 'lots' }, 'BODY_LIMIT must look like 100kb or 1mb, got "lots"'],
  ])('stops with a message naming the variable (%o)', (override, message) => {
    expect(() => loadConfig({ ...base, ...override })).toThrow(message);
  });
});
