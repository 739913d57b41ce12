import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Patch, Post, Put, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { CreateProjectDto } from './dto/create-project.dto.js';
import { SetMembersDto } from './dto/members.dto.js';
import { UpdateProjectDto } from './dto/update-project.dto.js';
import { ProjectsService } from './projects.service.js';
import { ProjectListItemResponse, ProjectMemberResponse, ProjectResponse } from './dto/project-response.dto.js';
import { ListProjectsQuery } from './dto/list-projects.query.js';
import { ProjectArchive } from './project-archive.service.js';

@ApiTags('projects')
@ApiBearerAuth()
@Controller('projects')
export class ProjectsController {
  constructor(
    private readonly projects: ProjectsService,
    private readonly archives: ProjectArchive,
  ) {}

  /** Projects not archived; `?archived=true` lists only the archived ones. */
  @Get()
  @ApiOkResponse({ type: [ProjectListItemResponse] })
  list(@CurrentUser() user: AuthUser, @Query() query: ListProjectsQuery) {
    return this.projects.list(user, query.archived === 'true');
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

  /** A closed project leaves everyday lists and devices, read-only until restored. */
  @Post(':id/archive')
  @HttpCode(200)
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: ProjectResponse })
  archive(@CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.archives.archive(user, id);
  }

  /** Back to the everyday lists, closed. */
  @Post(':id/restore')
  @HttpCode(200)
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: ProjectResponse })
  restore(@CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.archives.restore(user, id);
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
