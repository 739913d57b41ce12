// The device's own storage: IndexedDB database "plumbline" (Dexie).
//   session  one row ("current"): the signed-in user and their tokens, so a reload or an
//            offline restart keeps the person signed in. Sign-out deletes this row only.
//   outbox   interviews logged on this device and not yet acknowledged by the server, keyed
//            by the client-generated UUID. Survives sign-out, reload and restart; later
//            issues fill and send it.
//   meta     small device facts (e.g. when cell status was last synced).
// Everything here works offline; nothing here is ever sent except by the sync module.
import { Dexie, type EntityTable } from 'dexie';
import type { Role } from '../config/roles';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  organisation: { id: string; name: string };
}

export interface StoredSession {
  id: 'current';
  accessToken: string;
  refreshToken: string;
  /** Epoch milliseconds after which the access token is no longer accepted. */
  accessExpiresAt: number;
  user: SessionUser;
}

export interface OutboxEntry {
  /** Client-generated UUID: the idempotency key for upload. */
  clientId: string;
  /** The interviewer who logged it; the entry is sent only under their sign-in. */
  interviewerId: string;
  projectId: string;
  createdAt: string;
  payload: unknown;
}

export interface MetaEntry {
  key: string;
  value: unknown;
}

export class PlumblineDb extends Dexie {
  session!: EntityTable<StoredSession, 'id'>;
  outbox!: EntityTable<OutboxEntry, 'clientId'>;
  meta!: EntityTable<MetaEntry, 'key'>;

  constructor() {
    super('plumbline');
    this.version(1).stores({
      session: 'id',
      outbox: 'clientId, interviewerId, createdAt',
      meta: 'key',
    });
  }
}

export const db = new PlumblineDb();
