// A new agency: the organisation and its first admin, invited by e-mail to set a password
// (which confirms the address). Used by self-service sign-up and `plumbline org create`.
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { InvitationsService } from '../accounts/invitations.service.js';
import { KNEX } from '../database/database.constants.js';

export interface NewOrganisation {
  name: string;
  adminEmail: string;
  adminName: string;
}

export interface CreatedOrganisation {
  organisation: { id: string; name: string };
  admin: { id: string; email: string; name: string };
}

@Injectable()
export class OrganisationsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly invitations: InvitationsService,
  ) {}

  /** 409 (nothing created) when the admin's e-mail already has an account. */
  async create(input: NewOrganisation): Promise<CreatedOrganisation> {
    const { organisation, invitation } = await this.db.transaction(async (trx) => {
      const [organisation] = await trx('organisations').insert({ name: input.name.trim() }).returning(['id', 'name']);
      const invitation = await this.invitations.createInvited(trx, organisation!.id, {
        email: input.adminEmail,
        name: input.adminName,
        role: 'admin',
      });
      return { organisation: organisation!, invitation };
    });
    await this.invitations.mailInvitation(invitation);
    const { id, email, name } = invitation.user;
    return { organisation, admin: { id, email, name } };
  }
}
