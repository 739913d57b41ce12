import { Controller, Get, Param, ParseUUIDPipe } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { ProjectionResponse } from './dto/projection-response.dto.js';
import { ProjectionService } from './projection.service.js';

@ApiTags('projection')
@ApiBearerAuth()
@Controller('projects/:projectId/projection')
export class ProjectionController {
  constructor(
    private readonly access: ProjectAccess,
    private readonly projectionService: ProjectionService,
  ) {}

  /** Where fieldwork will end at the recent pace. Read-only for clients of the project; interviewers do not see it. */
  @Get()
  @Roles('lead', 'admin', 'supervisor', 'client')
  @ApiOkResponse({ type: ProjectionResponse })
  async projection(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    return this.projectionService.projection(await this.access.find(user, projectId));
  }
}
