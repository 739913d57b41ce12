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
    [{ TRUST_PROXY: 'true' }, 'TRUST_PROXY=true would let any client choose its own address'],
    [{ TRUST_PROXY: '10.0.0.0/33' }, '"10.0.0.0/33" is none of these'],
    [{ TRUST_PROXY: 'loopback, proxy.example' }, '"proxy.example" is none of these'],
    [{ TRUST_PROXY: '0' }, 'TRUST_PROXY as a number of proxy hops must be between 1 and 10, got 0'],
    [{ TLS_IN_FRONT: 'yes' }, 'TLS_IN_FRONT must be true or false, got "yes"'],
    [{ API_DOCS: 'off' }, 'API_DOCS must be true or false, got "off"'],
  ])('stops with a message naming the variable (%o)', (override, message) => {
    expect(() => loadConfig({ ...base, ...override })).toThrow(message);
  });

  it('trusts no proxy, assumes no TLS in front and serves the docs unless told otherwise', () => {
    expect(loadConfig(base)).toMatchObject({ trustProxy: false, tlsInFront: false, apiDocs: true });
  });

  it('reads TRUST_PROXY as hops or as addresses, ranges and named ranges', () => {
    expect(loadConfig({ ...base, TRUST_PROXY: '2' }).trustProxy).toBe(2);
    expect(loadConfig({ ...base, TRUST_PROXY: 'loopback, 10.0.0.0/8,fd00::1' }).trustProxy).toEqual(['loopback', '10.0.0.0/8', 'fd00::1']);
    expect(loadConfig({ ...base, TRUST_PROXY: 'false' }).trustProxy).toBe(false);
  });
});
