import { Module } from '@nestjs/common';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import { MailModule } from '../mail/mail.module.js';
import { AccountLinksController } from './account-links.controller.js';
import { AccountLinksService } from './account-links.service.js';
import { LINKS_CONFIG } from './accounts.constants.js';
import { InvitationsService } from './invitations.service.js';
import { OneTimeTokensRepository } from './one-time-tokens.repository.js';
import { PeopleController } from './people.controller.js';
import { PeopleService } from './people.service.js';

/** People management and one-time links; InvitationsService also serves organisations/. */
@Module({
  imports: [MailModule],
  controllers: [PeopleController, AccountLinksController],
  providers: [
    { provide: LINKS_CONFIG, inject: [APP_CONFIG], useFactory: (config: AppConfig) => config.accounts },
    OneTimeTokensRepository,
    InvitationsService,
    PeopleService,
    AccountLinksService,
  ],
  exports: [InvitationsService],
})
export class AccountsModule {}
