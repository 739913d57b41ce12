import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { AssignmentsService } from './assignments.service.js';
import { AssignmentResponse } from './dto/assignment-response.dto.js';
import { SetAssignmentDto } from './dto/set-assignment.dto.js';

@ApiTags('assignments')
@ApiBearerAuth()
@Controller('projects/:projectId/assignments')
@Roles('lead', 'admin', 'supervisor')
export class AssignmentsController {
  constructor(private readonly assignments: AssignmentsService) {}

  @Get()
  @ApiOkResponse({ type: [AssignmentResponse] })
  list(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    return this.assignments.list(user, projectId);
  }

  /** Sets (or replaces) one interviewer's target and cells on the project. */
  @Put(':userId')
  @ApiOkResponse({ type: AssignmentResponse })
  set(
    @CurrentUser() user: AuthUser,
    @Param('projectId', ParseUUIDPipe) projectId: string,
    @Param('userId', ParseUUIDPipe) userId: string,
    @Body() dto: SetAssignmentDto,
  ) {
    return this.assignments.set(user, projectId, userId, dto);
  }

  @Delete(':userId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The assignment is cleared' })
  clear(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Param('userId', ParseUUIDPipe) userId: string) {
    return this.assignments.clear(user, projectId, userId);
  }
}
