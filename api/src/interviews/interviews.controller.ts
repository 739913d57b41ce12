import { Body, Controller, Get, Header, HttpCode, Param, ParseUUIDPipe, Post, Res } from '@nestjs/common';
import type { Response } from 'express';
import { ApiBearerAuth, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { SyncBatchDto } from './dto/sync.dto.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { ExportService } from './export.service.js';
import { FlagCountsService } from './flag-counts.service.js';
import { SyncService } from './sync.service.js';
import { FlaggedInterviewsResponse } from './dto/flags-response.dto.js';
import { SyncReplyResponse, VoidResultResponse } from './dto/sync-response.dto.js';
import { VoidInterviewDto } from './dto/void-item.dto.js';
import { VoidService } from './void.service.js';

@ApiTags('interviews')
@ApiBearerAuth()
@Controller('projects/:projectId/interviews')
export class InterviewsController {
  constructor(
    private readonly syncService: SyncService,
    private readonly exportService: ExportService,
    private readonly access: ProjectAccess,
    private readonly flagCounts: FlagCountsService,
    private readonly voids: VoidService,
  ) {}

  /** Idempotent upload: each interview is answered accepted, duplicate or rejected with a reason. */
  @Post('sync')
  @HttpCode(200)
  @Roles('interviewer')
  @ApiOkResponse({ type: SyncReplyResponse })
  sync(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Body() dto: SyncBatchDto) {
    return this.syncService.sync(user, projectId, dto.interviews);
  }

  /** A supervisor's void of one interview, with a reason; it stops counting at once. Again: duplicate. */
  @Post(':interviewId/void')
  @HttpCode(200)
  @Roles('supervisor', 'lead', 'admin')
  @ApiOkResponse({ type: VoidResultResponse })
  void(
    @CurrentUser() user: AuthUser,
    @Param('projectId', ParseUUIDPipe) projectId: string,
    @Param('interviewId', ParseUUIDPipe) interviewId: string,
    @Body() dto: VoidInterviewDto,
  ) {
    return this.voids.voidOne(user, projectId, interviewId, dto.reason);
  }

  /** Kept-and-flagged interviews counted by reason, for the quota board. */
  @Get('flags')
  @Roles('supervisor', 'lead', 'admin')
  @ApiOkResponse({ type: FlaggedInterviewsResponse })
  async flags(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    await this.access.find(user, projectId);
    return this.flagCounts.counts(projectId);
  }

  /** Counted completes as CSV, one row per interview (for weighting elsewhere or checking). */
  @Get('export.csv')
  @Roles('lead', 'admin')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @ApiProduces('text/csv')
  @ApiOkResponse({ schema: { type: 'string' }, description: 'CSV, one row per counted complete' })
  async export(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Res() res: Response) {
    const project = await this.access.find(user, projectId);
    res.setHeader('Content-Disposition', `attachment; filename="${project.name.replace(/[^\w.-]+/g, '-')}-interviews.csv"`);
    await this.exportService.writeCsv(projectId, res);
  }
}
