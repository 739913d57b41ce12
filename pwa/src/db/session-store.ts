// The signed-in session on this device (table `session`, one row). Read on every API
// request for the bearer token; kept across reloads and offline restarts.
import { useLiveQuery } from 'dexie-react-hooks';
import type { SessionResponse } from '../lib/api-types';
import { db, type StoredSession } from './plumbline-db';

const key = 'current' as const;

export async function readSession(): Promise<StoredSession | undefined> {
  return db.session.get(key);
}

export async function saveSession(tokens: SessionResponse): Promise<StoredSession> {
  const row: StoredSession = {
    id: key,
    accessToken: tokens.accessToken,
    refreshToken: tokens.refreshToken,
    accessExpiresAt: Date.now() + tokens.expiresIn * 1000,
    user: tokens.user,
  };
  await db.session.put(row);
  return row;
}

/** Deletes the session row only: the outbox and meta tables are left alone. */
export async function clearSession(): Promise<void> {
  await db.session.delete(key);
}

/** `undefined` while the device storage is being read, `null` when nobody is signed in. */
export function useStoredSession(): StoredSession | null | undefined {
  return useLiveQuery(async () => (await db.session.get(key)) ?? null, []);
}
