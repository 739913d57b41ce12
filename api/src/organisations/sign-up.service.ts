// Self-service sign-up answers at once and the same way whether or not the address is
// known; the work (new organisation and invitation, or a note to an existing account)
// happens afterwards, so neither the answer nor its timing tells which addresses exist.
import { ConflictException, Inject, Injectable, Logger } from '@nestjs/common';
import type { Knex } from 'knex';
import { alreadyRegisteredMail } from '../accounts/account-mail.js';
import { InvitationsService } from '../accounts/invitations.service.js';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import { KNEX } from '../database/database.constants.js';
import type { SignUpDto } from './dto/sign-up.dto.js';
import { OrganisationsService } from './organisations.service.js';

@Injectable()
export class SignUpService {
  private readonly logger = new Logger(SignUpService.name);

  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly organisations: OrganisationsService,
    private readonly invitations: InvitationsService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  start(dto: SignUpDto): void {
    void this.run(dto).catch((error: unknown) => this.logger.error(`sign-up failed: ${String(error)}`));
  }

  private async run(dto: SignUpDto): Promise<void> {
    try {
      await this.organisations.create({ name: dto.organisation, adminEmail: dto.email, adminName: dto.name });
    } catch (error) {
      if (!(error instanceof ConflictException)) throw error;
      const user = await this.db('users').whereRaw('lower(email) = lower(?)', [dto.email.trim()]).first();
      if (user) await this.invitations.queue(alreadyRegisteredMail(user, this.config.accounts.appUrl));
    }
  }
}
