// The only module that talks HTTP. Base path /api on the same origin; the bearer token
// comes from the device session (db/session-store). On a 401 it refreshes once (one
// refresh shared by all concurrent requests), stores the rotated tokens and retries once.
// Every request is really tried, whatever the browser's online flag says, and its outcome
// is reported to lib/reachability: an answer from the API means the office is reachable
// (a 503 while its database is down is an answer: the session is kept, work is retried);
// a network failure, a time-out or a gateway saying it cannot reach the API (502, 504)
// means it is not, and the request fails with an ApiError of kind 'offline'. Nothing is
// lost offline: the device's own data lives in Dexie, not here.
import { clearSession, readSession, saveSession } from '../db/session-store';
import { ApiError, offlineMessage, signedOutMessage, type FieldProblem } from './api-error';
import type { SessionResponse } from './api-types';
import { reportReached, reportUnreachable } from './reachability';

const basePath = '/api';

/** The answer to sign-in and refresh: tokens and the signed-in person. */
export type AuthResponse = SessionResponse;

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  /** Send the bearer token and refresh it on 401 (default true). */
  auth?: boolean;
  signal?: AbortSignal;
  /** Give up (as unreachable) after this many milliseconds; default 30 s. */
  timeoutMs?: number;
}

const DEFAULT_TIMEOUT_MS = 30_000;
/** Gateway statuses: something between the device and the API could not reach the API. */
const GATEWAY_FAILED = new Set([502, 504]);

let refreshInFlight: Promise<string> | null = null;

export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const useAuth = options.auth ?? true;
  if (!useAuth) return parse<T>(await send(path, options));
  return parse<T>(await sendSignedIn(path, options));
}

/** A file the API sends (a CSV export), signed in like apiRequest; a refusal is an ApiError. */
export async function apiFile(path: string, options: RequestOptions = {}): Promise<Blob> {
  const response = await sendSignedIn(path, options);
  if (!response.ok) throw await toApiError(response);
  return response.blob();
}

async function sendSignedIn(path: string, options: RequestOptions): Promise<Response> {
  const session = await readSession();
  if (!session) throw new ApiError(signedOutMessage, 'signed-out', 401);
  let response = await send(path, options, session.accessToken);
  if (response.status === 401) {
    const freshToken = await refreshAccessToken(session.accessToken);
    response = await send(path, options, freshToken);
  }
  return response;
}

/**
 * Exchanges the stored refresh token for new tokens, once for all callers waiting at the
 * same moment. The server rotates the refresh token, so the new one is stored before anyone
 * retries; a 401 from the server means the sign-in is over and the session row is removed.
 */
export function refreshAccessToken(staleAccessToken: string): Promise<string> {
  refreshInFlight ??= runRefresh(staleAccessToken).finally(() => {
    refreshInFlight = null;
  });
  return refreshInFlight;
}

async function runRefresh(staleAccessToken: string): Promise<string> {
  const session = await readSession();
  if (!session) throw new ApiError(signedOutMessage, 'signed-out', 401);
  // Another refresh finished while this request was on the wire: use its token.
  if (session.accessToken !== staleAccessToken) return session.accessToken;

  const response = await send('/auth/refresh', { method: 'POST', body: { refreshToken: session.refreshToken } });
  if (response.status === 401 || response.status === 400) {
    await clearSession();
    throw new ApiError(signedOutMessage, 'signed-out', 401);
  }
  const tokens = await parse<AuthResponse>(response);
  await saveSession(tokens);
  return tokens.accessToken;
}

async function send(path: string, options: RequestOptions, accessToken?: string): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  // A FormData body (a file upload) goes as multipart; the browser sets its boundary.
  const multipart = typeof FormData !== 'undefined' && options.body instanceof FormData;
  if (options.body !== undefined && !multipart) headers['Content-Type'] = 'application/json';
  if (accessToken) headers.Authorization = `Bearer ${accessToken}`;
  const timeout = AbortSignal.timeout(options.timeoutMs ?? DEFAULT_TIMEOUT_MS);
  let response: Response;
  try {
    response = await fetch(`${basePath}${path}`, {
      method: options.method ?? 'GET',
      headers,
      body: options.body === undefined ? undefined : multipart ? (options.body as FormData) : JSON.stringify(options.body),
      signal: options.signal ? AbortSignal.any([options.signal, timeout]) : timeout,
      credentials: 'same-origin',
    });
  } catch (error) {
    // The caller gave up: that says nothing about the network.
    if (options.signal?.aborted) throw error;
    reportUnreachable();
    throw new ApiError(offlineMessage, 'offline');
  }
  if (GATEWAY_FAILED.has(response.status)) {
    reportUnreachable();
    throw new ApiError(offlineMessage, 'offline', response.status);
  }
  reportReached();
  return response;
}

/** One cheap request (GET /api/health): whether the office answers and is ready for work; never throws. */
export async function probeOffice(timeoutMs = 8_000): Promise<boolean> {
  try {
    return (await send('/health', { timeoutMs })).ok;
  } catch {
    return false;
  }
}

async function parse<T>(response: Response): Promise<T> {
  if (response.ok) {
    if (response.status === 204) return undefined as T;
    return (await response.json()) as T;
  }
  throw await toApiError(response);
}

interface ServerErrorBody {
  statusCode?: number;
  error?: string;
  message?: string | string[];
  fields?: FieldProblem[];
}

async function toApiError(response: Response): Promise<ApiError> {
  let body: ServerErrorBody = {};
  try {
    body = (await response.json()) as ServerErrorBody;
  } catch {
    // Not JSON (e.g. a proxy's error page): fall back to the status line.
  }
  const message = Array.isArray(body.message) ? body.message.join('; ') : body.message;
  return new ApiError(
    message || body.error || fallbackMessage(response),
    'http',
    response.status,
    Array.isArray(body.fields) ? body.fields : [],
  );
}

/** A wait from a Retry-After header in seconds (RFC 9110 section 10.2.3), in words. */
function waitFromRetryAfter(header: string | null): string | null {
  if (!header || !/^\d+$/.test(header.trim())) return null;
  const seconds = Number(header);
  if (seconds < 60) return `${seconds} second${seconds === 1 ? '' : 's'}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? '' : 's'}`;
}

function fallbackMessage(response: Response): string {
  const status = response.status;
  if (status === 429) {
    const wait = waitFromRetryAfter(response.headers.get('Retry-After'));
    return wait ? `Too many attempts. Please try again in ${wait}.` : 'Too many attempts. Please wait a moment and try again.';
  }
  if (status >= 500) return 'The server ran into a problem. Please try again shortly.';
  if (status === 404) return 'Not found.';
  if (status === 403) return 'You do not have access to this.';
  return `The request failed (${status}).`;
}
