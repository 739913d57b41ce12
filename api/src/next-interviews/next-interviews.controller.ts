import { Controller, Get, Param, ParseUUIDPipe, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { NextInterviewsQuery } from './dto/next-interviews-query.dto.js';
import { NextInterviewsResponse } from './dto/next-interviews-response.dto.js';
import { NextInterviewsService } from './next-interviews.service.js';

@ApiTags('balance')
@ApiBearerAuth()
@Controller('projects/:projectId/next-interviews')
export class NextInterviewsController {
  constructor(
    private readonly access: ProjectAccess,
    private readonly service: NextInterviewsService,
  ) {}

  /** Where the next interviews raise the effective sample size most; for the people who steer fieldwork. */
  @Get()
  @Roles('supervisor', 'lead', 'admin')
  @ApiOkResponse({ type: NextInterviewsResponse })
  async next(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Query() query: NextInterviewsQuery) {
    const project = await this.access.find(user, projectId);
    return this.service.nextInterviews(project.id, query.count ?? 50);
  }
}
