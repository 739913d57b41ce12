import { Body, Controller, Get, HttpCode, Inject, NotFoundException, Post } from '@nestjs/common';
import { ApiAcceptedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator.js';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import { SignUpResponse } from './dto/sign-up-response.dto.js';
import { SignUpSettingsResponse } from './dto/sign-up-settings-response.dto.js';
import { SignUpDto } from './dto/sign-up.dto.js';
import { SignUpService } from './sign-up.service.js';

/** Self-service sign-up of a new organisation, when SIGNUP_ENABLED is on (404 otherwise). */
@ApiTags('sign-up')
@Public()
@Controller('sign-up')
export class SignUpController {
  constructor(
    private readonly signUps: SignUpService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  @Get()
  @ApiOkResponse({ type: SignUpSettingsResponse, description: 'Whether the sign-up page should be offered' })
  settings(): SignUpSettingsResponse {
    return { enabled: this.config.accounts.signUpEnabled };
  }

  @Post()
  @HttpCode(202)
  @ApiAcceptedResponse({ type: SignUpResponse, description: 'The same answer whether or not the address already has an account' })
  signUp(@Body() dto: SignUpDto): SignUpResponse {
    if (!this.config.accounts.signUpEnabled) throw new NotFoundException('Sign-up is not open here; ask Plumbline\'s operator for an organisation');
    this.signUps.start(dto);
    return { message: 'Check your e-mail: the link in it confirms your address and lets you choose a password' };
  }
}
