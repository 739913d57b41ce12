import { Body, Controller, Get, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { CreateUserDto } from './dto/create-user.dto.js';
import { UsersService } from './users.service.js';
import { UserResponse } from './dto/user-response.dto.js';

@ApiTags('users')
@ApiBearerAuth()
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @Roles('admin', 'lead')
  @ApiOkResponse({ type: [UserResponse] })
  list(@CurrentUser() user: AuthUser) {
    return this.users.list(user);
  }

  @Get(':id')
  @Roles('admin', 'lead')
  @ApiOkResponse({ type: UserResponse })
  get(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe({ version: '4' })) id: string) {
    return this.users.get(user, id);
  }

  @Post()
  @Roles('admin')
  @ApiCreatedResponse({ type: UserResponse })
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateUserDto) {
    return this.users.create(user, dto);
  }
}
