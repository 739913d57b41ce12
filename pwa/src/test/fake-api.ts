import { vi } from 'vitest';
import type { SessionUser } from '../db/plumbline-db';
import type { Role } from '../config/roles';

type Handler = (request: { method: string; path: string; body: unknown; headers: Headers }) => Response | Promise<Response>;

export interface FakeApi {
  /** Every request the app made, in order. */
  calls: { method: string; path: string; body: unknown; authorization: string | null }[];
  on: (method: string, path: string, handler: Handler) => void;
  /** Cuts or restores the network: while cut, every request fails as a browser's does ("Failed to fetch"). */
  setNetwork: (state: 'up' | 'down') => void;
}

export function json(body: unknown, status = 200): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

export function problem(statusCode: number, error: string, message: string): Response {
  return json({ statusCode, error, message }, statusCode);
}

/** Replaces fetch with a small in-memory server; unknown routes answer 404 in the API's shape. */
export function installFakeApi(): FakeApi {
  const handlers = new Map<string, Handler>();
  const calls: FakeApi['calls'] = [];
  let network: 'up' | 'down' = 'up';
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = new URL(String(input), 'http://localhost');
      const method = (init?.method ?? 'GET').toUpperCase();
      const headers = new Headers(init?.headers);
      const body = typeof init?.body === 'string' ? JSON.parse(init.body) : undefined;
      if (network === 'down') throw new TypeError('Failed to fetch');
      calls.push({ method, path: url.pathname, body, authorization: headers.get('Authorization') });
      const handler = handlers.get(`${method} ${url.pathname}`);
      if (!handler) return problem(404, 'Not Found', `No fake for ${method} ${url.pathname}`);
      return handler({ method, path: url.pathname, body, headers });
    }),
  );
  return {
    calls,
    on: (method, path, handler) => handlers.set(`${method} ${path}`, handler),
    setNetwork: (state) => {
      network = state;
    },
  };
}

export const demoNames: Record<Role, string> = {
  admin: 'Ada Brennock',
  lead: 'Lorna Quist',
  supervisor: 'Sam Odell',
  interviewer: 'Ines Marr',
  client: 'Colm Farrant',
};

export function demoUser(role: Role): SessionUser {
  return {
    id: `user-${role}`,
    email: `${role}@vellmoor.example`,
    name: demoNames[role],
    role,
    organisation: { id: 'org-vellmoor', name: 'Vellmoor Social Research' },
  };
}

export function authResponse(role: Role, tokenSuffix = '1') {
  return {
    accessToken: `access-${role}-${tokenSuffix}`,
    refreshToken: `refresh-${role}-${tokenSuffix}`,
    expiresIn: 900,
    user: demoUser(role),
  };
}
