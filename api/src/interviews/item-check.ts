// Checks one interview from a device on its own, before anything reaches the database:
// every fault becomes that interview's rejection with a reason in plain words, so one bad
// item never fails its batch. Nothing here reads or writes storage.
import { plainToInstance } from 'class-transformer';
import { validateSync, type ValidationError } from 'class-validator';
import type { Disposition, HeadlineAnswer } from '../database/tables.js';
import type { ActiveTargets } from '../quotas/cell-allocator.js';
import { InterviewItemDto } from './dto/sync.dto.js';
import type { FlagCode } from './flags.js';

/** An interview that passed every check that does not depend on the project. */
export interface CheckedItem {
  /** The device's UUID in canonical (lower-case) form. */
  id: string;
  disposition: Disposition;
  categories: Record<string, unknown>;
  headlineAnswer: HeadlineAnswer | undefined;
  /** Non-contacts and 'other' only: someone eligible is known to live there (else unknown, null). */
  eligibilityKnown: boolean | null;
  startedAt: Date;
  endedAt: Date;
  /** Contact-sheet code for a back-check (kept only if the interview is selected). */
  respondentReference?: string;
}

export type ItemCheck = { ok: true; item: CheckedItem } | { ok: false; id: string | null; reason: string };

// Any 128-bit value in the hyphenated hex form, as PostgreSQL's uuid type reads it.
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
/** The nil and max UUIDs (RFC 9562, sections 5.9 and 5.10): placeholders, never a device's own id. */
const PLACEHOLDERS = new Set(['00000000-0000-0000-0000-000000000000', 'ffffffff-ffff-ffff-ffff-ffffffffffff']);

/** A UUID in canonical lower-case form, or null when the value is not a UUID. */
export function canonicalUuid(value: unknown): string | null {
  return typeof value === 'string' && UUID.test(value) ? value.toLowerCase() : null;
}

export const EARLIEST_YEAR = 2000;
export const LATEST_YEAR = 2099;

// RFC 3339 date-time (full date, T, time with seconds, Z or a numeric offset). Wider ISO 8601
// forms (week or ordinal dates, the basic format, comma fractions, hours alone) are refused:
// JavaScript's Date cannot read them.
const MOMENT = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2}):(\d{2})(?:\.(\d{1,9}))?(?:Z|([+-])(\d{2}):(\d{2}))$/i;

export type Moment = { ok: true; at: Date } | { ok: false; reason: string };

/** Reads a device's date and time; `field` names it in the reason when it cannot be read. */
export function parseMoment(field: string, value: unknown): Moment {
  const m = typeof value === 'string' ? MOMENT.exec(value) : null;
  if (!m) return { ok: false, reason: `${field} must be a date and time such as 2026-11-20T10:02:00Z` };
  const [year, month, day, hour, minute, second] = m.slice(1, 7).map(Number) as [number, number, number, number, number, number];
  const millis = Number((m[7] ?? '').padEnd(3, '0').slice(0, 3));
  const [sign, offsetHours, offsetMinutes] = [m[8] === '-' ? -1 : 1, Number(m[9] ?? 0), Number(m[10] ?? 0)];
  if (year < EARLIEST_YEAR || year > LATEST_YEAR) {
    return { ok: false, reason: `${field} is in the year ${year}; check the date on the device` };
  }
  const local = new Date(Date.UTC(year, month - 1, day, hour, minute, second, millis));
  const real =
    local.getUTCFullYear() === year && local.getUTCMonth() === month - 1 && local.getUTCDate() === day &&
    local.getUTCHours() === hour && local.getUTCMinutes() === minute && local.getUTCSeconds() === second &&
    offsetHours <= 23 && offsetMinutes <= 59;
  if (!real) return { ok: false, reason: `${field} is not a real date and time` };
  return { ok: true, at: new Date(local.getTime() - sign * (offsetHours * 60 + offsetMinutes) * 60_000) };
}

/** The outcomes whose eligibility may be unknown (AAPOR's NC or UH, O or UO). */
const ELIGIBILITY_ASKED = new Set<Disposition>(['non_contact', 'other']);

/** Unknown fields are named in the reason only when the name reads as a field name. */
const FIELD_NAME = /^[A-Za-z][A-Za-z0-9_]{0,39}$/;

function reasonsOf(errors: ValidationError[]): string {
  return errors
    .flatMap((e) =>
      Object.entries(e.constraints ?? {}).map(([kind, message]) =>
        kind === 'whitelistValidation' ? `${FIELD_NAME.test(e.property) ? e.property : 'a field'} is not part of an interview` : message,
      ),
    )
    .join('; ');
}

/** Everything about one item that does not depend on the project. Never throws. */
export function checkItem(raw: unknown): ItemCheck {
  const sentId = typeof (raw as { id?: unknown } | null)?.id === 'string' ? (raw as { id: string }).id : null;
  const id = canonicalUuid(sentId) ?? sentId;
  try {
    if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) return { ok: false, id, reason: 'not an interview' };
    const dto = plainToInstance(InterviewItemDto, raw);
    const errors = validateSync(dto, { whitelist: true, forbidNonWhitelisted: true });
    if (errors.length) return { ok: false, id, reason: reasonsOf(errors) };
    const canonical = canonicalUuid(dto.id);
    if (!canonical) return { ok: false, id, reason: 'id must be a UUID' };
    if (PLACEHOLDERS.has(canonical)) return { ok: false, id, reason: 'id is a placeholder UUID, not one made for this interview' };
    const started = parseMoment('startedAt', dto.startedAt);
    if (!started.ok) return { ok: false, id, reason: started.reason };
    const ended = parseMoment('endedAt', dto.endedAt);
    if (!ended.ok) return { ok: false, id, reason: ended.reason };
    if (ended.at < started.at) return { ok: false, id, reason: 'endedAt is before startedAt' };
    const eligibility = dto.eligibilityKnown ?? null;
    if (eligibility !== null && !ELIGIBILITY_ASKED.has(dto.disposition)) {
      return { ok: false, id, reason: 'eligibilityKnown is only for a non-contact or an other outcome' };
    }
    const categories: Record<string, unknown> = {};
    for (const [key, value] of Object.entries(dto.categories ?? {})) {
      if (Object.hasOwn(categories, key.toLowerCase())) return { ok: false, id, reason: 'names one quota variable twice' };
      categories[key.toLowerCase()] = value;
    }
    const item: CheckedItem = {
      id: canonical,
      disposition: dto.disposition,
      categories,
      headlineAnswer: typeof dto.headlineAnswer === 'boolean' ? (dto.headlineAnswer ? 'yes' : 'no') : (dto.headlineAnswer ?? undefined),
      eligibilityKnown: eligibility,
      startedAt: started.at,
      endedAt: ended.at,
      ...(dto.respondentReference === undefined ? {} : { respondentReference: dto.respondentReference }),
    };
    return { ok: true, item };
  } catch {
    return { ok: false, id, reason: 'this interview could not be read' };
  }
}

/** The categories an interview is stored with, and the flags its retired ones earn. */
export interface CheckedCategories {
  ids: string[];
  flags: FlagCode[];
}

/**
 * The project-dependent check: category ids of the interview, one per variable it names
 * (a complete without one of the active variables is kept and flagged), or the reason it cannot be stored.
 * `targets` holds every variable and category the project ever had (loadAllTargets): an id
 * the office retired while the device was out is accepted and flagged, never refused; only an
 * id that was never part of the project is.
 */
export function checkCategories(item: CheckedItem, targets: ActiveTargets): CheckedCategories | { reason: string } {
  const complete = item.disposition === 'complete';
  const active = targets.variables.filter((v) => !v.retired);
  if (complete && active.length === 0) {
    return { reason: 'the project has no quota targets yet, so a complete cannot be counted' };
  }
  const known = new Set(targets.variables.map((v) => v.id));
  if (Object.keys(item.categories).some((k) => !known.has(k))) return { reason: 'names a quota variable this project does not have' };
  const ids: string[] = [];
  const flags = new Set<FlagCode>();
  for (const v of targets.variables) {
    const value = Object.hasOwn(item.categories, v.id) ? item.categories[v.id] : undefined;
    if (value === undefined || value === null) {
      // A variable added after the phone last synced: kept and flagged, never refused.
      if (complete && !v.retired) flags.add('missing_variable');
      continue;
    }
    const category = typeof value === 'string' ? v.categories.find((c) => c.id === value.toLowerCase()) : undefined;
    if (!category) return { reason: `${v.name}: unknown category` };
    if (v.retired) flags.add('retired_variable');
    else if (category.retired) flags.add('retired_category');
    ids.push(category.id);
  }
  if (complete && item.headlineAnswer === undefined) return { reason: 'headlineAnswer is missing' };
  return { ids, flags: [...flags] };
}
