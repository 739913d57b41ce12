// Voids: an interview already sent can be voided with a reason, by the interviewer who
// logged it (through the sync endpoint, as an item of kind "void") or by a supervisor or
// lead of its organisation. The row stays, with who voided it, when and why, and the flag
// "voided" for the supervisor; it stops counting at once (interviews.counted, see
// counted.ts), so the count tables, quota cells and the balance move in the same
// transaction. Voiding again is answered "duplicate" and changes nothing.
import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { VoidItemDto } from './dto/void-item.dto.js';
import { canonicalUuid } from './item-check.js';

export interface CheckedVoid {
  id: string;
  reason: string;
}

export type VoidCheck = { ok: true; item: CheckedVoid } | { ok: false; id: string | null; reason: string };

/** Whether a sync item asks to void an interview rather than store a new one. */
export function isVoidItem(raw: unknown): boolean {
  return typeof raw === 'object' && raw !== null && (raw as { kind?: unknown }).kind === 'void';
}

/** Checks a void item on its own; never throws. */
export function checkVoid(raw: unknown): VoidCheck {
  const sent = (raw as { id?: unknown }).id;
  const id = canonicalUuid(sent) ?? (typeof sent === 'string' ? sent : null);
  try {
    const dto = plainToInstance(VoidItemDto, raw);
    const errors = validateSync(dto, { whitelist: true, forbidNonWhitelisted: true, stopAtFirstError: true });
    if (errors.length) {
      const first = errors[0]!;
      const message = first.constraints?.whitelistValidation ? `${first.property} is not part of a void` : Object.values(first.constraints ?? {})[0];
      return { ok: false, id, reason: message ?? 'this void could not be read' };
    }
    const canonical = canonicalUuid(dto.id);
    if (!canonical) return { ok: false, id, reason: 'id must be a UUID' };
    return { ok: true, item: { id: canonical, reason: dto.reason } };
  } catch {
    return { ok: false, id, reason: 'this void could not be read' };
  }
}

export type VoidOutcome = { status: 'voided' } | { status: 'duplicate' } | { status: 'rejected'; reason: string };

export const NOT_FOUND = 'no interview with this id was sent for this project';
export const NOT_YOURS = 'only the interviewer who logged this interview, or a supervisor, can void it';

/**
 * Voids one interview of the project inside the caller's transaction. An interviewer may void
 * only their own; a supervisor, lead or admin any of the project's (the caller has already
 * checked that they may see the project).
 */
export async function applyVoid(trx: Knex.Transaction, user: AuthUser, projectId: string, item: CheckedVoid): Promise<VoidOutcome> {
  const row = await trx('interviews').where({ id: item.id, project_id: projectId }).forUpdate().first('interviewer_id', 'voided_at');
  if (!row) return { status: 'rejected', reason: NOT_FOUND };
  if (user.role === 'interviewer' && row.interviewer_id !== user.id) return { status: 'rejected', reason: NOT_YOURS };
  if (row.voided_at !== null) return { status: 'duplicate' };
  await trx('interviews')
    .where({ id: item.id })
    .update({
      voided_at: trx.fn.now() as unknown as Date,
      voided_by: user.id,
      void_reason: item.reason,
      flags: trx.raw("array_append(array_remove(flags, 'voided'), 'voided')") as unknown as string[],
    });
  return { status: 'voided' };
}
