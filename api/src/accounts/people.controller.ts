import { Body, Controller, HttpCode, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { ApiAcceptedResponse, ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { ChangeRoleDto } from './dto/change-role.dto.js';
import { InvitePersonDto } from './dto/invite-person.dto.js';
import { MessageResponse } from './dto/message-response.dto.js';
import { PersonResponse } from './dto/person-response.dto.js';
import { PeopleService } from './people.service.js';

const uuid = new ParseUUIDPipe({ version: '4' });

/** The admin's people management, beside the plain account list of users.controller. */
@ApiTags('users')
@ApiBearerAuth()
@Roles('admin')
@Controller('users')
export class PeopleController {
  constructor(private readonly people: PeopleService) {}

  @Post('invitations')
  @ApiCreatedResponse({ type: PersonResponse, description: 'The invited account (status "invited"); the invitation e-mail is queued' })
  invite(@CurrentUser() user: AuthUser, @Body() dto: InvitePersonDto) {
    return this.people.invite(user, dto);
  }

  @Post(':id/invitation')
  @HttpCode(202)
  @ApiAcceptedResponse({ type: MessageResponse, description: 'A new invitation link is queued; the old one stops working' })
  async reinvite(@CurrentUser() user: AuthUser, @Param('id', uuid) id: string): Promise<MessageResponse> {
    await this.people.resendInvitation(user, id);
    return { message: 'A new invitation is on its way' };
  }

  @Patch(':id/role')
  @ApiOkResponse({ type: PersonResponse, description: 'The account with its new role, in force at its next request' })
  changeRole(@CurrentUser() user: AuthUser, @Param('id', uuid) id: string, @Body() dto: ChangeRoleDto) {
    return this.people.changeRole(user, id, dto.role);
  }

  @Post(':id/disable')
  @HttpCode(200)
  @ApiOkResponse({ type: PersonResponse, description: 'The disabled account; its sign-ins have ended' })
  disable(@CurrentUser() user: AuthUser, @Param('id', uuid) id: string) {
    return this.people.setActive(user, id, false);
  }

  @Post(':id/enable')
  @HttpCode(200)
  @ApiOkResponse({ type: PersonResponse, description: 'The account, able to sign in again' })
  enable(@CurrentUser() user: AuthUser, @Param('id', uuid) id: string) {
    return this.people.setActive(user, id, true);
  }

  @Post(':id/password-reset')
  @HttpCode(202)
  @ApiAcceptedResponse({ type: MessageResponse, description: 'A password-reset link is queued to the person' })
  async sendReset(@CurrentUser() user: AuthUser, @Param('id', uuid) id: string): Promise<MessageResponse> {
    await this.people.sendPasswordReset(user, id);
    return { message: 'A link to choose a new password is on its way' };
  }
}
