import { ArgumentsHost, HttpException, HttpStatus } from '@nestjs/common';
import { describe, expect, it } from 'vitest';
import { TooManyRequestsException } from '../exceptions/too-many-requests.exception.js';
import { AllExceptionsFilter } from './http-exception.filter.js';

function answer(exception: unknown) {
  const headers: Record<string, string> = {};
  const reply = { status: 0, body: undefined as unknown, headers };
  const res = {
    setHeader: (name: string, value: string) => (headers[name] = value),
    status: (code: number) => ((reply.status = code), res),
    type: (value: string) => ((headers['Content-Type'] = value), res),
    json: (body: unknown) => (reply.body = body),
  };
  const host = { switchToHttp: () => ({ getResponse: () => res }) } as unknown as ArgumentsHost;
  new AllExceptionsFilter().catch(exception, host);
  return reply;
}

describe('429 answers', () => {
  it('say when to come back in Retry-After (RFC 6585 section 4)', () => {
    const reply = answer(new TooManyRequestsException('Too many failed sign-ins; try again in 2 minutes', 95));
    expect(reply.status).toBe(429);
    expect(reply.headers['Retry-After']).toBe('95');
    expect(reply.body).toEqual({ statusCode: 429, error: 'Too Many Requests', message: 'Too many failed sign-ins; try again in 2 minutes' });
  });

  it('carry Retry-After even when raised without a wait', () => {
    const reply = answer(new HttpException('Slow down', HttpStatus.TOO_MANY_REQUESTS));
    expect(reply.headers['Retry-After']).toBe('60');
  });

  it('are the only refusals that carry it: a 401 does not', () => {
    expect(answer(new HttpException('No', HttpStatus.UNAUTHORIZED)).headers['Retry-After']).toBeUndefined();
  });
});
