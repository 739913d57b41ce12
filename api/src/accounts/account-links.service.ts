// What a person does with a one-time link, signed out: see what the link is for, set a
// password with it (which also confirms the e-mail address of an invitation), or ask for
// a password-reset link, which answers the same whether or not the address has an account.
import { BadRequestException, GoneException, Inject, Injectable, Logger } from '@nestjs/common';
import type { Knex } from 'knex';
import { hashPassword } from '../auth/password.js';
import { KNEX } from '../database/database.constants.js';
import type { OneTimeTokenPurpose } from '../database/tables.js';
import { InvitationsService } from './invitations.service.js';
import { OneTimeTokensRepository, type TokenCheck } from './one-time-tokens.repository.js';
import { revokeAllSessions } from './sessions-revocation.js';

export interface LinkDetails {
  purpose: OneTimeTokenPurpose;
  email: string;
  name: string;
  organisation: string;
}

/** At most one reset mail a minute per account, so the public form cannot flood an inbox. */
const RESET_MAIL_INTERVAL_MS = 60_000;

function refusal(check: Exclude<TokenCheck, { kind: 'ok' }>): Error {
  if (check.kind === 'expired') return new GoneException('This link has expired; ask for a new one');
  if (check.kind === 'used') return new GoneException('This link has already been used; ask for a new one if you still need it');
  return new BadRequestException('This link is not valid; check that it was copied whole');
}

@Injectable()
export class AccountLinksService {
  private readonly logger = new Logger(AccountLinksService.name);

  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly tokens: OneTimeTokensRepository,
    private readonly invitations: InvitationsService,
  ) {}

  async describe(token: string): Promise<LinkDetails> {
    const check = await this.tokens.check(token);
    if (check.kind !== 'ok') throw refusal(check);
    const user = await this.db('users')
      .join('organisations', 'organisations.id', 'users.organisation_id')
      .where('users.id', check.row.user_id)
      .first<{ email: string; name: string; active: boolean; organisation: string }>('users.email', 'users.name', 'users.active', 'organisations.name as organisation');
    if (!user?.active) throw new GoneException('This account is disabled; ask your administrator');
    return { purpose: check.row.purpose, email: user.email, name: user.name, organisation: user.organisation };
  }

  /** Sets the password and spends the link (and every other open link of the person); ends their other sign-ins. */
  async setPassword(token: string, password: string): Promise<{ email: string }> {
    const passwordHash = await hashPassword(password);
    return this.db.transaction(async (trx) => {
      const check = await this.tokens.check(token, trx, true);
      if (check.kind !== 'ok') throw refusal(check);
      const [user] = await trx('users')
        .where({ id: check.row.user_id, active: true })
        .update({ password_hash: passwordHash, updated_at: trx.fn.now() })
        .returning(['email']);
      if (!user) throw new GoneException('This account is disabled; ask your administrator');
      await this.tokens.spendAll(check.row.user_id, null, trx);
      await revokeAllSessions(trx, check.row.user_id);
      return { email: user.email };
    });
  }

  /**
   * Answers at once and the same way for any address; the mail (if the address has an active
   * account with a password) is queued afterwards, so timing does not tell either.
   */
  requestReset(email: string): void {
    void this.sendResetIfKnown(email.trim()).catch((error: unknown) => this.logger.error(`password reset request failed: ${String(error)}`));
  }

  private async sendResetIfKnown(email: string): Promise<void> {
    const user = await this.db('users').whereRaw('lower(email) = lower(?)', [email]).where({ active: true }).whereNotNull('password_hash').first();
    if (!user) return;
    const last = await this.tokens.lastIssued(user.id, 'password_reset');
    if (last && Date.now() - last.getTime() < RESET_MAIL_INTERVAL_MS) return;
    await this.invitations.sendPasswordReset(user);
  }
}
