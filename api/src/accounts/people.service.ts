// The admin's people management: invite, change a role, disable and re-enable, send a
// password reset. Everything is scoped to the admin's organisation (another one's id is 404);
// an admin cannot lock themselves out, and the organisation always keeps an active admin.
import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser, Role } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import type { UserRow } from '../database/tables.js';
import { summary, type UserSummary } from '../users/users.repository.js';
import { InvitationsService, type Invitee } from './invitations.service.js';
import { revokeAllSessions } from './sessions-revocation.js';

@Injectable()
export class PeopleService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly invitations: InvitationsService,
  ) {}

  async invite(actor: AuthUser, invitee: Invitee): Promise<UserSummary> {
    return summary(await this.invitations.invite(actor.organisationId, invitee));
  }

  async resendInvitation(actor: AuthUser, id: string): Promise<void> {
    const user = await this.find(actor, id);
    if (user.password_hash !== null) throw new ConflictException(`${user.name} has already accepted the invitation; send a password reset instead`);
    if (!user.active) throw new ConflictException(`${user.name}'s account is disabled; enable it first`);
    await this.invitations.reinvite(user);
  }

  async changeRole(actor: AuthUser, id: string, role: Role): Promise<UserSummary> {
    if (id === actor.id) throw new ConflictException('You cannot change your own role; ask another admin');
    return this.db.transaction(async (trx) => {
      const user = await this.find(actor, id, trx);
      if (user.role === 'admin' && role !== 'admin') await this.keepAnAdmin(trx, actor, user);
      const [row] = await trx('users').where({ id: user.id }).update({ role, updated_at: trx.fn.now() }).returning('*');
      return summary(row!);
    });
  }

  /** Disabling ends every sign-in of the account at once; enabling lets the person sign in again. */
  async setActive(actor: AuthUser, id: string, active: boolean): Promise<UserSummary> {
    if (id === actor.id) throw new ConflictException('You cannot disable your own account; ask another admin');
    return this.db.transaction(async (trx) => {
      const user = await this.find(actor, id, trx);
      if (!active && user.role === 'admin') await this.keepAnAdmin(trx, actor, user);
      const [row] = await trx('users').where({ id: user.id }).update({ active, updated_at: trx.fn.now() }).returning('*');
      if (!active) {
        await revokeAllSessions(trx, user.id);
        await trx('one_time_tokens').where({ user_id: user.id }).whereNull('used_at').update({ used_at: trx.fn.now() });
      }
      return summary(row!);
    });
  }

  async sendPasswordReset(actor: AuthUser, id: string): Promise<void> {
    const user = await this.find(actor, id);
    if (!user.active) throw new ConflictException(`${user.name}'s account is disabled; enable it first`);
    if (user.password_hash === null) throw new ConflictException(`${user.name} has not accepted the invitation yet; send the invitation again`);
    await this.invitations.sendPasswordReset(user);
  }

  private async find(actor: AuthUser, id: string, trx: Knex | Knex.Transaction = this.db): Promise<UserRow> {
    const query = trx('users').where({ id, organisation_id: actor.organisationId });
    const user = await (trx === this.db ? query : query.forUpdate()).first();
    if (!user) throw new NotFoundException('No such user');
    return user;
  }

  /** Refuses to take away the organisation's last active admin (rows locked so two admins cannot race). */
  private async keepAnAdmin(trx: Knex.Transaction, actor: AuthUser, leaving: UserRow): Promise<void> {
    const admins = await trx('users')
      .where({ organisation_id: actor.organisationId, role: 'admin', active: true })
      .whereNot({ id: leaving.id })
      .forUpdate()
      .select('id');
    if (admins.length === 0) throw new ConflictException('The organisation needs at least one active admin');
  }
}
