import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { BackchecksService } from './backchecks.service.js';
import { BackcheckListResponse, BackcheckResponse, BackcheckSummaryResponse } from './dto/backcheck-response.dto.js';
import { RecordOutcomeDto } from './dto/record-outcome.dto.js';

@ApiTags('backchecks')
@ApiBearerAuth()
@Controller('projects/:projectId/backchecks')
@Roles('lead', 'admin', 'supervisor')
export class BackchecksController {
  constructor(private readonly backchecks: BackchecksService) {}

  /** The work list: pending back-checks first, then those done. */
  @Get()
  @ApiOkResponse({ type: BackcheckListResponse })
  list(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    return this.backchecks.list(user, projectId);
  }

  /** Per interviewer: selected, each outcome, pending and the share for completes arriving now. */
  @Get('summary')
  @ApiOkResponse({ type: [BackcheckSummaryResponse] })
  summary(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    return this.backchecks.summary(user, projectId);
  }

  /** Records the outcome; "could not reach" may be replaced later, the others are final (409). */
  @Post(':interviewId/outcome')
  @HttpCode(200)
  @ApiOkResponse({ type: BackcheckResponse })
  record(
    @CurrentUser() user: AuthUser,
    @Param('projectId', ParseUUIDPipe) projectId: string,
    @Param('interviewId', ParseUUIDPipe) interviewId: string,
    @Body() dto: RecordOutcomeDto,
  ) {
    return this.backchecks.recordOutcome(user, projectId, interviewId, dto);
  }
}
