import { Module } from '@nestjs/common';
import { AccountsModule } from '../accounts/accounts.module.js';
import { OrganisationsService } from './organisations.service.js';
import { SignUpController } from './sign-up.controller.js';
import { SignUpService } from './sign-up.service.js';

@Module({
  imports: [AccountsModule],
  controllers: [SignUpController],
  providers: [OrganisationsService, SignUpService],
})
export class OrganisationsModule {}
