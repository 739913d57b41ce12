import { describe, expect, it } from 'vitest';
import { apiRequest } from './api-client';
import { ApiError } from './api-error';
import { readReachability } from './reachability';
import { readSession, saveSession } from '../db/session-store';
import { authResponse, installFakeApi, json, problem } from '../test/fake-api';

const projects = [{ id: 'p1', name: 'Vellmoor tram extension' }];

describe('api client', () => {
  it('on a 401 refreshes once, stores the rotated tokens and retries with the new access token', async () => {
    const api = installFakeApi();
    await saveSession(authResponse('lead', 'old'));
    api.on('GET', '/api/projects', ({ headers }) =>
      headers.get('Authorization') === 'Bearer access-lead-new'
        ? json(projects)
        : problem(401, 'Unauthorized', 'Access token expired.'),
    );
    api.on('POST', '/api/auth/refresh', ({ body }) =>
      (body as { refreshToken: string }).refreshToken === 'refresh-lead-old'
        ? json(authResponse('lead', 'new'))
        : problem(401, 'Unauthorized', 'Refresh token reused.'),
    );

    await expect(apiRequest('/projects')).resolves.toEqual(projects);

    const stored = await readSession();
    expect(stored?.accessToken).toBe('access-lead-new');
    expect(stored?.refreshToken).toBe('refresh-lead-new');
    expect(api.calls.filter((c) => c.path === '/api/auth/refresh')).toHaveLength(1);
  });

  it('shares one refresh among requests that fail at the same moment', async () => {
    const api = installFakeApi();
    await saveSession(authResponse('lead', 'old'));
    const ok = ({ headers }: { headers: Headers }) =>
      headers.get('Authorization') === 'Bearer access-lead-new' ? json([]) : problem(401, 'Unauthorized', 'Expired.');
    api.on('GET', '/api/projects', ok);
    api.on('GET', '/api/auth/me', ok);
    api.on('POST', '/api/auth/refresh', ({ body }) =>
      (body as { refreshToken: string }).refreshToken === 'refresh-lead-old'
        ? json(authResponse('lead', 'new'))
        : problem(401, 'Unauthorized', 'Refresh token reused.'),
    );

    await Promise.all([apiRequest('/projects'), apiRequest('/auth/me'), apiRequest('/projects')]);

    expect(api.calls.filter((c) => c.path === '/api/auth/refresh')).toHaveLength(1);
    expect((await readSession())?.refreshToken).toBe('refresh-lead-new');
  });

  it('treats a refused refresh as signed out and forgets the session', async () => {
    const api = installFakeApi();
    await saveSession(authResponse('lead', 'old'));
    api.on('GET', '/api/projects', () => problem(401, 'Unauthorized', 'Expired.'));
    api.on('POST', '/api/auth/refresh', () => problem(401, 'Unauthorized', 'Refresh token reused.'));

    const failure = apiRequest('/projects');
    await expect(failure).rejects.toBeInstanceOf(ApiError);
    await expect(failure).rejects.toMatchObject({ kind: 'signed-out' });
    expect(await readSession()).toBeUndefined();
    expect(api.calls.filter((c) => c.path === '/api/projects')).toHaveLength(1);
  });

  it("carries the server's message and field problems in its errors", async () => {
    const api = installFakeApi();
    api.on('POST', '/api/auth/login', () =>
      json(
        { statusCode: 400, error: 'Bad Request', message: 'email must be an e-mail address', fields: [{ field: 'email', message: 'must be an e-mail address' }] },
        400,
      ),
    );

    await expect(apiRequest('/auth/login', { method: 'POST', body: { email: 'x', password: 'y' }, auth: false })).rejects.toMatchObject({
      kind: 'http',
      status: 400,
      message: 'email must be an e-mail address',
      fields: [{ field: 'email', message: 'must be an e-mail address' }],
    });
  });

  it('keeps the session when the network is down during a refresh', async () => {
    const api = installFakeApi();
    await saveSession(authResponse('lead', 'old'));
    api.on('GET', '/api/projects', () => problem(401, 'Unauthorized', 'Expired.'));
    api.on('POST', '/api/auth/refresh', () => Promise.reject(new TypeError('Failed to fetch')));

    await expect(apiRequest('/projects')).rejects.toMatchObject({ kind: 'offline' });
    expect((await readSession())?.refreshToken).toBe('refresh-lead-old');
  });

  it('keeps the session while the office answers 503 (its database is down) on a request and on the refresh', async () => {
    const api = installFakeApi();
    await saveSession(authResponse('lead', 'old'));
    const down = () => problem(503, 'Service Unavailable', 'The database is not reachable right now.');
    api.on('GET', '/api/projects', down);
    api.on('POST', '/api/auth/refresh', down);

    await expect(apiRequest('/projects')).rejects.toMatchObject({ kind: 'http', status: 503, message: 'The database is not reachable right now.' });
    expect((await readSession())?.refreshToken).toBe('refresh-lead-old');
    // The server answered: the office is reachable, only not ready; the device keeps retrying its work.
    expect(readReachability().reach).toBe('reachable');
  });

  it('counts a request that never gets an answer as the office out of reach, whatever the browser claims', async () => {
    const api = installFakeApi();
    await saveSession(authResponse('lead', 'old'));
    api.on('GET', '/api/projects', () => json(projects));
    api.setNetwork('down');

    await expect(apiRequest('/projects')).rejects.toMatchObject({ kind: 'offline' });
    expect(navigator.onLine).toBe(true);
    expect(readReachability()).toMatchObject({ reach: 'unreachable', since: expect.any(Number) });

    api.setNetwork('up');
    await expect(apiRequest('/projects')).resolves.toEqual(projects);
    expect(readReachability()).toMatchObject({ reach: 'reachable', since: null });
  });
});
