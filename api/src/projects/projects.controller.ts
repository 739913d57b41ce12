import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { CreateProjectDto } from './dto/create-project.dto.js';
import { SetMembersDto } from './dto/members.dto.js';
import { UpdateProjectDto } from './dto/update-project.dto.js';
import { ProjectsService } from './projects.service.js';
import { ProjectMemberResponse, ProjectResponse } from './dto/project-response.dto.js';

@ApiTags('projects')
@ApiBearerAuth()
@Controller('projects')
export class ProjectsController {
  constructor(private readonly projects: ProjectsService) {}

  @Get()
  @ApiOkResponse({ type: [ProjectResponse] })
  list(@CurrentUser() user: AuthUser) {
    return this.projects.list(user);
  }

  @Post()
  @Roles('lead', 'admin')
  @ApiCreatedResponse({ type: ProjectResponse })
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateProjectDto) {
    return this.projects.create(user, dto);
  }

  @Get(':id')
  @ApiOkResponse({ type: ProjectResponse })
  get(@CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.projects.get(user, id);
  }

  @Patch(':id')
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: ProjectResponse })
  update(@CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: UpdateProjectDto) {
    return this.projects.update(user, id, dto);
  }

  /** Starts a new wave: the facts, targets and team, in set-up, with no interviews. */
  @Post(':id/duplicate')
  @Roles('lead', 'admin')
  @ApiCreatedResponse({ type: ProjectResponse })
  duplicate(@CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.projects.duplicate(user, id);
  }

  @Get(':id/members')
  @Roles('lead', 'admin', 'supervisor')
  @ApiOkResponse({ type: [ProjectMemberResponse] })
  members(@CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.projects.members(user, id);
  }

  @Put(':id/members')
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: [ProjectMemberResponse] })
  setMembers(@CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: SetMembersDto) {
    return this.projects.setMembers(user, id, dto.userIds);
  }
}
