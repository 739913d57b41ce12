import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiAcceptedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator.js';
import { AccountLinksService } from './account-links.service.js';
import { LinkDetailsResponse } from './dto/link-details-response.dto.js';
import { LinkTokenDto } from './dto/link-token.dto.js';
import { MessageResponse } from './dto/message-response.dto.js';
import { PasswordSetResponse } from './dto/password-set-response.dto.js';
import { RequestResetDto } from './dto/request-reset.dto.js';
import { SetPasswordDto } from './dto/set-password.dto.js';

/** Signed out: one-time links (invitation, password reset) and asking for a reset. */
@ApiTags('account')
@Public()
@Controller('account')
export class AccountLinksController {
  constructor(private readonly links: AccountLinksService) {}

  @Post('password-reset')
  @HttpCode(202)
  @ApiAcceptedResponse({ type: MessageResponse, description: 'The same answer whether or not the address has an account' })
  requestReset(@Body() dto: RequestResetDto): MessageResponse {
    this.links.requestReset(dto.email);
    return { message: 'If that address has an account, a link to choose a new password is on its way' };
  }

  @Post('link')
  @HttpCode(200)
  @ApiOkResponse({ type: LinkDetailsResponse, description: 'What the link is for and whose account it opens; 410 when expired or used' })
  describe(@Body() dto: LinkTokenDto) {
    return this.links.describe(dto.token);
  }

  @Post('password')
  @HttpCode(200)
  @ApiOkResponse({ type: PasswordSetResponse, description: 'The password is set and the link spent; sign in with it' })
  setPassword(@Body() dto: SetPasswordDto) {
    return this.links.setPassword(dto.token, dto.password);
  }
}
