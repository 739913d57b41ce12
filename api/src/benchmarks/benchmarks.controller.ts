import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { BenchmarksService } from './benchmarks.service.js';
import { BenchmarkPollDto, ReconciliationSettingsDto } from './dto/benchmark-poll.dto.js';
import { BenchmarkListResponse, BenchmarkPollResponse, ReconciliationResponse } from './dto/benchmark-responses.dto.js';
import { ReconciliationService } from './reconciliation.service.js';

@ApiTags('benchmarks')
@ApiBearerAuth()
@Controller('projects/:projectId')
export class BenchmarksController {
  constructor(
    private readonly access: ProjectAccess,
    private readonly benchmarks: BenchmarksService,
    private readonly reconciliations: ReconciliationService,
  ) {}

  @Get('benchmarks')
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: BenchmarkListResponse })
  async list(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    await this.access.find(user, projectId);
    return { polls: await this.benchmarks.list(projectId) };
  }

  @Post('benchmarks')
  @Roles('lead', 'admin')
  @ApiCreatedResponse({ type: BenchmarkPollResponse })
  async create(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Body() dto: BenchmarkPollDto) {
    await this.access.findEditable(user, projectId);
    return this.benchmarks.create(projectId, dto);
  }

  @Put('benchmarks/:pollId')
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: BenchmarkPollResponse })
  async update(
    @CurrentUser() user: AuthUser,
    @Param('projectId', ParseUUIDPipe) projectId: string,
    @Param('pollId', ParseUUIDPipe) pollId: string,
    @Body() dto: BenchmarkPollDto,
  ) {
    await this.access.findEditable(user, projectId);
    return this.benchmarks.update(projectId, pollId, dto);
  }

  @Delete('benchmarks/:pollId')
  @Roles('lead', 'admin')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The poll is removed' })
  async remove(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Param('pollId', ParseUUIDPipe) pollId: string) {
    await this.access.findEditable(user, projectId);
    await this.benchmarks.remove(projectId, pollId);
  }

  /** Read-only for supervisors and clients of the project. */
  @Get('reconciliation')
  @Roles('lead', 'admin', 'supervisor', 'client')
  @ApiOkResponse({ type: ReconciliationResponse })
  async reconciliation(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    return this.reconciliations.reconciliation(await this.access.find(user, projectId));
  }

  /** The spread prior of unknown method-group biases, kept per project. */
  @Put('reconciliation/settings')
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: ReconciliationResponse })
  async settings(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Body() dto: ReconciliationSettingsDto) {
    const project = await this.access.findEditable(user, projectId);
    await this.benchmarks.setSpread(projectId, dto.spread);
    return this.reconciliations.reconciliation(project);
  }
}
