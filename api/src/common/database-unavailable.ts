// Recognises "the database cannot be reached" wherever it surfaces (a query, the pool, the
// JWT strategy's user look-up), so the error filter answers 503 with Retry-After instead of
// a 500 or, worse, a 401 that would tell a device its sign-in is bad.

/** Network errors on the way to PostgreSQL (Node's codes). */
const NETWORK_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ECONNABORTED', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH', 'ENOTFOUND', 'EAI_AGAIN', 'EPIPE']);

/**
 * PostgreSQL SQLSTATEs meaning the server is not there to answer (PostgreSQL 15, Appendix A):
 * class 08 connection exceptions, 57P01 admin_shutdown, 57P02 crash_shutdown,
 * 57P03 cannot_connect_now (starting up or shutting down), 53300 too_many_connections.
 */
const SERVER_CODES = new Set(['57P01', '57P02', '57P03', '53300']);

/** Errors node-postgres raises without a code when a connection drops under a query. */
const DROPPED = /Connection terminated|Connection ended unexpectedly|not queryable|Client was closed|timeout expired/i;

export const RETRY_AFTER_SECONDS = 5;

export function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  if (!(error instanceof Error) || depth > 4) return false;
  const code = (error as { code?: unknown }).code;
  if (typeof code === 'string' && (NETWORK_CODES.has(code) || SERVER_CODES.has(code) || /^08/.test(code))) return true;
  // Knex's pool gave up waiting for a connection (acquireConnectionTimeout).
  if (error.name === 'KnexTimeoutError') return true;
  if (DROPPED.test(error.message)) return true;
  if (error instanceof AggregateError && error.errors.some((e) => isDatabaseUnavailable(e, depth + 1))) return true;
  return isDatabaseUnavailable(error.cause, depth + 1);
}
