import { describe, expect, it } from 'vitest';
import { KnexTimeoutError } from 'knex';
import { isDatabaseUnavailable } from './database-unavailable.js';

const coded = (message: string, code: string) => Object.assign(new Error(message), { code });

describe('isDatabaseUnavailable', () => {
  it('recognises the ways PostgreSQL being away surfaces through pg and Knex', () => {
    expect(isDatabaseUnavailable(coded('connect ECONNREFUSED 127.0.0.1:5432', 'ECONNREFUSED'))).toBe(true);
    expect(isDatabaseUnavailable(coded('terminating connection due to administrator command', '57P01'))).toBe(true);
    expect(isDatabaseUnavailable(coded('the database system is starting up', '57P03'))).toBe(true);
    expect(isDatabaseUnavailable(coded('connection failure', '08006'))).toBe(true);
    expect(isDatabaseUnavailable(new Error('Connection terminated unexpectedly'))).toBe(true);
    expect(isDatabaseUnavailable(new KnexTimeoutError('Knex: Timeout acquiring a connection. The pool is probably full.'))).toBe(true);
    expect(isDatabaseUnavailable(new AggregateError([coded('connect ECONNREFUSED ::1:5432', 'ECONNREFUSED')]))).toBe(true);
    expect(isDatabaseUnavailable(new Error('query failed', { cause: coded('read ECONNRESET', 'ECONNRESET') }))).toBe(true);
  });

  it('leaves ordinary query errors and other failures alone', () => {
    expect(isDatabaseUnavailable(coded('duplicate key value violates unique constraint', '23505'))).toBe(false);
    expect(isDatabaseUnavailable(coded('relation "nope" does not exist', '42P01'))).toBe(false);
    expect(isDatabaseUnavailable(new TypeError('Cannot read properties of undefined'))).toBe(false);
    expect(isDatabaseUnavailable('ECONNREFUSED')).toBe(false);
    expect(isDatabaseUnavailable(undefined)).toBe(false);
  });
});
