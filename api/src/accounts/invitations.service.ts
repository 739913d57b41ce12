// Invitations and password-reset links: creates the invited account (no password yet),
// issues the one-time token and queues the e-mail. Used by the admin's People page, by
// self-service sign-up and by `plumbline org create`, which builds it without Nest.
import { ConflictException, Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { Role } from '../common/roles.js';
import type { LinksConfig } from '../config/accounts-config.js';
import { KNEX } from '../database/database.constants.js';
import type { UserRow } from '../database/tables.js';
import type { MailMessage } from '../mail/mail-message.js';
import { MailService } from '../mail/mail.service.js';
import { invitationMail, passwordResetMail, setPasswordLink } from './account-mail.js';
import { LINKS_CONFIG } from './accounts.constants.js';
import { OneTimeTokensRepository } from './one-time-tokens.repository.js';

export interface Invitation {
  user: UserRow;
  token: string;
}

export interface Invitee {
  email: string;
  name: string;
  role: Role;
}

/** Postgres' unique_violation: the e-mail index (lower(email)) refused a second account. */
const isUniqueViolation = (error: unknown): boolean => (error as { code?: string })?.code === '23505';

export const emailTaken = () =>
  new ConflictException({ message: 'That e-mail address already has an account', fields: [{ field: 'email', message: 'already in use' }] });

@Injectable()
export class InvitationsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly tokens: OneTimeTokensRepository,
    private readonly mail: MailService,
    @Inject(LINKS_CONFIG) private readonly links: LinksConfig,
  ) {}

  /** Creates the account without a password and mails its invitation; 409 when the e-mail is taken. */
  async invite(organisationId: string, invitee: Invitee): Promise<UserRow> {
    const created = await this.db.transaction((trx) => this.createInvited(trx, organisationId, invitee));
    await this.mailInvitation(created);
    return created.user;
  }

  /**
   * The invited account and its token, inside the caller's transaction; the caller mails the
   * invitation after the commit (mailInvitation), so no mail names an account that was rolled back.
   */
  async createInvited(trx: Knex.Transaction, organisationId: string, invitee: Invitee): Promise<Invitation> {
    try {
      const [user] = await trx('users')
        .insert({ organisation_id: organisationId, email: invitee.email.trim(), name: invitee.name.trim(), role: invitee.role, password_hash: null })
        .returning('*');
      const token = await this.tokens.issue(user!.id, 'invitation', this.links.invitationTtlHours, trx);
      return { user: user!, token };
    } catch (error) {
      if (isUniqueViolation(error)) throw emailTaken();
      throw error;
    }
  }

  async mailInvitation({ user, token }: Invitation): Promise<void> {
    const organisation = await this.db('organisations').where({ id: user.organisation_id }).first('name');
    const link = setPasswordLink(this.links.appUrl, token);
    await this.mail.queue(invitationMail(user, organisation?.name ?? 'your organisation', link, this.links.invitationTtlHours));
  }

  /** A fresh invitation link for someone who has not set a password yet (the old link stops working). */
  async reinvite(user: UserRow): Promise<void> {
    const token = await this.tokens.issue(user.id, 'invitation', this.links.invitationTtlHours);
    await this.mailInvitation({ user, token });
  }

  async sendPasswordReset(user: UserRow): Promise<void> {
    const token = await this.tokens.issue(user.id, 'password_reset', this.links.passwordResetTtlHours);
    await this.mail.queue(passwordResetMail(user, setPasswordLink(this.links.appUrl, token), this.links.passwordResetTtlHours));
  }

  queue(message: MailMessage): Promise<string> {
    return this.mail.queue(message);
  }
}
