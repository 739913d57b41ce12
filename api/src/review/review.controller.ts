import { Body, Controller, Get, Header, HttpCode, Param, ParseUUIDPipe, Post, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { ReviewDecisionDto } from './dto/decision.dto.js';
import { DecisionResultResponse, TrailEntryResponse } from './dto/decision-response.dto.js';
import { ReviewQueueQuery } from './dto/review-query.dto.js';
import { ReviewOptionsResponse, ReviewQueueResponse } from './dto/review-response.dto.js';
import { ReviewDecisionsService } from './review-decisions.service.js';
import { ReviewQueueService } from './review-queue.service.js';
import { ReviewTrailService } from './review-trail.service.js';

/** The review queue, decisions on it and their audit trail: supervisors, leads and admins. */
@ApiTags('review')
@ApiBearerAuth()
@Roles('supervisor', 'lead', 'admin')
@Controller('projects/:projectId')
export class ReviewController {
  constructor(
    private readonly access: ProjectAccess,
    private readonly queue: ReviewQueueService,
    private readonly decisions: ReviewDecisionsService,
    private readonly trail: ReviewTrailService,
  ) {}

  /** Interviews to review, flagged first, with their flags in words and figures; filtered and paged. */
  @Get('review')
  @ApiOkResponse({ type: ReviewQueueResponse })
  async page(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Query() query: ReviewQueueQuery) {
    await this.access.find(user, projectId);
    return this.queue.page(projectId, query);
  }

  /** What the queue's filters can choose from: flags, interviewers, field days, cells. */
  @Get('review/options')
  @ApiOkResponse({ type: ReviewOptionsResponse })
  async options(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    await this.access.find(user, projectId);
    return this.queue.options(projectId);
  }

  /** Approve, reject or reinstate interviews with a reason, all in one step, each kept in the audit trail. */
  @Post('review/decisions')
  @HttpCode(200)
  @ApiOkResponse({ type: DecisionResultResponse })
  decide(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Body() dto: ReviewDecisionDto) {
    return this.decisions.decide(user, projectId, dto);
  }

  /** The whole audit trail as CSV, oldest decision first. */
  @Get('review/decisions.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @ApiProduces('text/csv')
  @ApiOkResponse({ schema: { type: 'string' }, description: 'CSV, one row per review decision' })
  async exportTrail(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Res() res: Response) {
    const project = await this.access.find(user, projectId);
    res.setHeader('Content-Disposition', `attachment; filename="${project.name.replace(/[^\w.-]+/g, '-')}-review-decisions.csv"`);
    await this.trail.writeCsv(projectId, res);
  }

  /** One interview's review decisions, oldest first. */
  @Get('interviews/:interviewId/decisions')
  @ApiOkResponse({ type: [TrailEntryResponse] })
  async interviewTrail(
    @CurrentUser() user: AuthUser,
    @Param('projectId', ParseUUIDPipe) projectId: string,
    @Param('interviewId', ParseUUIDPipe) interviewId: string,
  ) {
    await this.access.find(user, projectId);
    return this.trail.ofInterview(projectId, interviewId);
  }
}
