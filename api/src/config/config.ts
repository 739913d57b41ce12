// Configuration is read from the environment once, at start-up, and validated here.
// A missing or malformed value stops the server with a message naming the variable.
import { loadAccountsConfig, type AccountsConfig } from './accounts-config.js';
import { ConfigError } from './config-error.js';
import { parseTrustProxy, type TrustProxy } from './trust-proxy.js';

export { ConfigError };

export interface AppConfig {
  host: string;
  port: number;
  databaseUrl: string;
  jwtSecret: string;
  accessTokenTtlSeconds: number;
  refreshTokenTtlSeconds: number;
  /** Failed sign-ins in a row on one account before the delays start. */
  signInFreeFailures: number;
  /** Failed sign-ins from one address, across accounts, per window. */
  signInAddressLimit: number;
  signInAddressWindowSeconds: number;
  trustProxy: TrustProxy;
  /** TLS ends in front of the API (a proxy or load balancer): send HSTS on every answer. */
  tlsInFront: boolean;
  /** Serve the OpenAPI page and document at /api/docs. */
  apiDocs: boolean;
  bodyLimit: string;
  pwaDist: string | null;
  logLevel: string;
  /** Mail, one-time links and sign-up (accounts-config.ts). */
  accounts: AccountsConfig;
}

type Env = Record<string, string | undefined>;

function integer(env: Env, name: string, fallback: number, min: number, max: number): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  if (!/^\d+$/.test(raw)) throw new ConfigError(`${name} must be a whole number, got "${raw}"`);
  const value = Number(raw);
  if (value < min || value > max) throw new ConfigError(`${name} must be between ${min} and ${max}, got ${value}`);
  return value;
}

function flag(env: Env, name: string, fallback: boolean): boolean {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  if (raw === 'true') return true;
  if (raw === 'false') return false;
  throw new ConfigError(`${name} must be true or false, got "${raw}"`);
}

function required(env: Env, name: string): string {
  const value = env[name];
  if (!value) throw new ConfigError(`${name} is not set`);
  return value;
}

const LOG_LEVELS = ['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'];

export function loadConfig(env: Env = process.env): AppConfig {
  const databaseUrl = required(env, 'DATABASE_URL');
  if (!/^postgres(ql)?:\/\//.test(databaseUrl)) {
    throw new ConfigError('DATABASE_URL must be a postgres:// URL');
  }
  const jwtSecret = required(env, 'JWT_SECRET');
  if (jwtSecret.length < 32) throw new ConfigError('JWT_SECRET must be at least 32 characters long');
  const bodyLimit = env.BODY_LIMIT || '1mb';
  if (!/^\d+(b|kb|mb)$/i.test(bodyLimit)) throw new ConfigError(`BODY_LIMIT must look like 100kb or 1mb, got "${bodyLimit}"`);
  const logLevel = env.LOG_LEVEL || 'info';
  if (!LOG_LEVELS.includes(logLevel)) throw new ConfigError(`LOG_LEVEL must be one of ${LOG_LEVELS.join(', ')}`);
  const host = env.HOST || '127.0.0.1';
  const port = integer(env, 'PORT', 3000, 0, 65535);
  return {
    host,
    port,
    databaseUrl,
    jwtSecret,
    accessTokenTtlSeconds: integer(env, 'ACCESS_TOKEN_TTL', 900, 10, 86_400),
    refreshTokenTtlSeconds: integer(env, 'REFRESH_TOKEN_TTL', 30 * 86_400, 60, 365 * 86_400),
    signInFreeFailures: integer(env, 'SIGNIN_FREE_FAILURES', 5, 1, 100),
    signInAddressLimit: integer(env, 'SIGNIN_ADDRESS_LIMIT', 100, 1, 100_000),
    signInAddressWindowSeconds: integer(env, 'SIGNIN_ADDRESS_WINDOW', 900, 60, 86_400),
    trustProxy: parseTrustProxy(env.TRUST_PROXY),
    tlsInFront: flag(env, 'TLS_IN_FRONT', false),
    apiDocs: flag(env, 'API_DOCS', true),
    bodyLimit,
    pwaDist: env.PWA_DIST || null,
    logLevel,
    accounts: loadAccountsConfig(env, host, port),
  };
}
