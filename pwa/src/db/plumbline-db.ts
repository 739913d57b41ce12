// The device's own storage: IndexedDB database "plumbline" (Dexie).
//   session       one row ("current"): the signed-in user and their tokens, so a reload or an
//                 offline restart keeps the person signed in. Sign-out deletes this row only.
//   outbox        contacts logged on this device and not yet acknowledged by the server, keyed
//                 by the client-generated UUID. Survives sign-out, reload and restart. An entry
//                 the server refused keeps its reason here until the interviewer discards it.
//   meta          small device facts (e.g. when this interviewer last synced).
//   projectCache  (v2) each interviewer's assigned projects as last seen online.
//   cellCache     (v2) each project's quota variables and cell counts from the last sync.
//   drafts        (v3) the contact each interviewer is in the middle of logging, saved after
//                 every step, so a reload, a crash or a closed tab returns to the same step
//                 with the same answers. Saving the contact moves it to the outbox and
//                 deletes the draft in one transaction.
//   sent          (v4) contacts the server acknowledged in the last two weeks, so the
//                 interviewer can still void one logged by mistake (a void goes through the
//                 outbox like any contact: a VoidRecord).
// Everything here works offline; nothing here is ever sent except by the sync module.
import { Dexie, type EntityTable, type Table } from 'dexie';
import type { UserProfileResponse } from '../lib/api-types';
import type { CellStatus, QuotaCell, QuotaVariable } from '../lib/cells';
import type { ProjectListItem } from '../lib/projects/get-projects';

/** The signed-in person as the server gave them at sign-in. */
export type SessionUser = UserProfileResponse;

export interface StoredSession {
  id: 'current';
  accessToken: string;
  refreshToken: string;
  /** Epoch milliseconds after which the access token is no longer accepted. */
  accessExpiresAt: number;
  user: SessionUser;
}

/** 'quota_full' is "turned away: cell full", logged from the cell check of a complete. */
export type Disposition = 'complete' | 'partial' | 'refusal' | 'non_contact' | 'other' | 'not_eligible' | 'quota_full';

/** Answers to the headline question; the headline share is over yes and no. */
export type HeadlineAnswer = 'yes' | 'no' | 'dont_know' | 'no_answer';

/** One contact exactly as the sync API takes it: categories, answer and paradata only. */
export interface InterviewRecord {
  id: string;
  disposition: Disposition;
  /** Quota variable id → category id (every variable for a complete). */
  categories?: Record<string, string>;
  /** true and false are what an older app stored; the server reads them as yes and no. */
  headlineAnswer?: HeadlineAnswer | boolean;
  /** Non-contacts and 'other' only: true when someone eligible is known to live there, false when not known. */
  eligibilityKnown?: boolean;
  startedAt: string;
  endedAt: string;
  /** A code from the agency's contact sheet (complete only); the server keeps it only for a back-check. */
  respondentReference?: string;
}

/** A request to void a contact the server already has, sent through the outbox like a contact. */
export interface VoidRecord {
  kind: 'void';
  /** The voided contact's UUID. */
  id: string;
  reason: string;
}

export function isVoidRecord(payload: unknown): payload is VoidRecord {
  return typeof payload === 'object' && payload !== null && (payload as { kind?: unknown }).kind === 'void';
}

/** A contact the server acknowledged, kept a while so it can still be voided. */
export interface SentEntry {
  clientId: string;
  interviewerId: string;
  projectId: string;
  sentAt: string;
  record: InterviewRecord;
  /** Set once the interviewer voided it (the void itself waits in the outbox until sent). */
  voidReason?: string;
}

export interface OutboxEntry {
  /** Client-generated UUID: the idempotency key for upload. */
  clientId: string;
  /** The interviewer who logged it; the entry is sent only under their sign-in. */
  interviewerId: string;
  projectId: string;
  createdAt: string;
  /** An InterviewRecord; typed loosely because rows written by an older app may differ. */
  payload: unknown;
  /** Set when the server refused the entry: it stays here, is not sent again, and shows its reason. */
  rejectedReason?: string;
  rejectedAt?: string;
}

/** Where a contact being logged had got to. */
export type DraftStep = 'outcome' | 'confirm' | 'categories' | 'check' | 'answer';

export interface ContactDraft {
  /** One draft per interviewer on the device. */
  interviewerId: string;
  projectId: string;
  step: DraftStep;
  disposition: Disposition;
  categories: Record<string, string>;
  /** true and false are what an older app stored (yes and no). */
  headlineAnswer?: HeadlineAnswer | boolean;
  eligibilityKnown?: boolean;
  /** When the contact was started (becomes the interview's startedAt). */
  startedAt: string;
  updatedAt: string;
}

export interface MetaEntry {
  key: string;
  value: unknown;
}

/**
 * A project as GET /api/projects lists it, kept on the device for offline use, with the
 * interviewer's own progress and assignment (`mine`) as of that sync; missing in copies
 * saved by an older app until the next sync.
 */
export type FieldProject = Omit<ProjectListItem, 'mine'> & { mine?: ProjectListItem['mine'] };

export interface CachedProject {
  userId: string;
  projectId: string;
  /** Order in the server's list. */
  position: number;
  project: FieldProject;
  savedAt: string;
}

export type { CellStatus, QuotaCell, QuotaVariable };

export interface CachedCells {
  projectId: string;
  variables: QuotaVariable[];
  cells: QuotaCell[];
  /** When the server gave these counts. */
  syncedAt: string;
}

export class PlumblineDb extends Dexie {
  session!: EntityTable<StoredSession, 'id'>;
  outbox!: EntityTable<OutboxEntry, 'clientId'>;
  meta!: EntityTable<MetaEntry, 'key'>;
  projectCache!: Table<CachedProject, [string, string]>;
  cellCache!: EntityTable<CachedCells, 'projectId'>;
  drafts!: EntityTable<ContactDraft, 'interviewerId'>;
  sent!: EntityTable<SentEntry, 'clientId'>;

  constructor() {
    super('plumbline');
    this.version(1).stores({
      session: 'id',
      outbox: 'clientId, interviewerId, createdAt',
      meta: 'key',
    });
    // v2 adds the offline caches; existing sessions and outbox entries are kept as they are.
    this.version(2).stores({
      session: 'id',
      outbox: 'clientId, interviewerId, projectId, createdAt',
      meta: 'key',
      projectCache: '[userId+projectId], userId',
      cellCache: 'projectId',
    });
    // v3 adds drafts of contacts being logged.
    this.version(3).stores({ drafts: 'interviewerId' });
    // v4 keeps acknowledged contacts for a while, so they can be voided.
    this.version(4).stores({ sent: 'clientId, interviewerId, sentAt' });
  }
}

export const db = new PlumblineDb();
